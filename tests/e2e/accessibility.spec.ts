import { readdirSync } from "node:fs";
import { resolve } from "node:path";
import { expect, test, type APIRequestContext, type Browser, type BrowserContext, type Page } from "@playwright/test";
import { DISTRICT_TOPICS } from "../../lib/content/district-topics";
import { SCHOOL_TOPICS } from "../../lib/content/topics";
import { cutOffContent, expectErrorsAnnounced, expectNoAxeViolations, focusedElement, sidewaysScroll, tabTo } from "./support/a11y";
import { DEMO_ACCOUNTS, signInThroughApi } from "./support/staff";

// WCAG 2.1 A/AA, route by route: axe, page structure, reflow and visible focus; then the forms'
// error announcements and a keyboard-only walk from the home page to a sent question.

type StaffRole = keyof typeof DEMO_ACCOUNTS;

export interface CheckedRoute {
  /** A path; a part in square brackets is looked up at run time (see PATH_PARTS), e.g. /staff/rooms/[room]. */
  path: string;
  /** The role that opens it; no role for a public page, opened signed out. */
  role?: StaffRole;
  /** The status the page answers; 200 unless said. */
  status?: number;
}

const SCHOOLS = readdirSync(resolve(__dirname, "../../content/schools")).sort();

// Add new pages here: public pages in the first list, staff pages with the role that opens them in the second.
export const PUBLIC_ROUTES: CheckedRoute[] = [
  { path: "/answers" },
  { path: "/" },
  { path: "/schools" },
  ...SCHOOLS.flatMap((school) => [{ path: `/schools/${school}` }, ...SCHOOL_TOPICS.map((t) => ({ path: `/schools/${school}/${t.slug}` }))]),
  ...DISTRICT_TOPICS.map((t) => ({ path: `/district/${t.slug}` })),
  { path: "/ask" },
  { path: "/ask/sent?ref=[reference]" },
  { path: "/ask/status/[status-token]" },
  { path: "/answers/[answer]" },
  { path: "/signin" },
  { path: "/no-such-page", status: 404 },
];

export const STAFF_ROUTES: CheckedRoute[] = [
  { path: "/staff/check", role: "facilities" },
  { path: "/staff/snippets", role: "communications" },
  { path: "/staff/settings", role: "admin" },
  { path: "/staff/desk/[question]", role: "communications" },
  { path: "/staff", role: "communications" },
  { path: "/staff", role: "facilities" },
  { path: "/staff/desk", role: "communications" },
  { path: "/staff/rooms", role: "facilities" },
  { path: "/staff/rooms/new", role: "facilities" },
  { path: "/staff/rooms/[room]", role: "facilities" },
  { path: "/staff/readings", role: "facilities" },
  // The administrator sees the district's air settings as a form.
  { path: "/staff/readings", role: "admin" },
  { path: "/staff/projects", role: "facilities" },
  { path: "/staff/users", role: "admin" },
  { path: "/staff/not-allowed", role: "communications" },
];

export const ROUTES: CheckedRoute[] = [...PUBLIC_ROUTES, ...STAFF_ROUTES];

// Documentation addresses (RFC 5737), so these questions never use up another spec's rate limit.
const ASKER_ADDRESS = "198.51.100.71";
const WALKER_ADDRESS = "198.51.100.72";

/** A question sent through the public API, once per run: its reference and private status path. */
let asked: Promise<{ reference: string; statusPath: string }> | undefined;
function askOnce(request: APIRequestContext) {
  asked ??= (async () => {
    const response = await request.post("/api/questions", {
      headers: { "x-forwarded-for": ASKER_ADDRESS },
      data: {
        school: "eastmere",
        topic: "air",
        question: "Are the air cleaners in the science rooms at Eastmere switched on during lessons?",
        email: `a11y.check.${Date.now()}@example.net`,
      },
    });
    expect(response.status(), "the question for the status page was accepted").toBe(201);
    const body = (await response.json()) as { reference: string; statusUrl: string };
    return { reference: body.reference, statusPath: new URL(body.statusUrl).pathname };
  })();
  return asked;
}

/** How each bracketed part of a path is found, with the request context of the route's own role. */
const PATH_PARTS: Record<string, (request: APIRequestContext) => Promise<string>> = {
  reference: async (request) => (await askOnce(request)).reference,
  "status-token": async (request) => (await askOnce(request)).statusPath.split("/").pop()!,
  answer: async (request) => {
    const { answers } = (await (await request.get("/api/answers/suggestions")).json()) as { answers: { id: number }[] };
    expect(answers.length, "the demo data has published answers").toBeGreaterThan(0);
    return String(answers[0]!.id);
  },
  room: async (request) => {
    const html = await (await request.get("/staff/rooms")).text();
    const id = /href="\/staff\/rooms\/(\d+)"/.exec(html)?.[1];
    expect(id, "the rooms list links to a room").toBeTruthy();
    return id!;
  },
  // The first question the desk links to; question 1 of the demo data while the desk links to none.
  question: async (request) => /href="\/staff\/desk\/(\d+)"/.exec(await (await request.get("/staff/desk")).text())?.[1] ?? "1",
};

async function resolvePath(path: string, request: APIRequestContext): Promise<string> {
  let out = path;
  for (const [, part] of path.matchAll(/\[([a-z-]+)\]/g)) {
    const find = PATH_PARTS[part!];
    if (!find) throw new Error(`no way to find [${part}] in ${path}: add it to PATH_PARTS`);
    out = out.replace(`[${part}]`, await find(request));
  }
  return out;
}

const title = (r: CheckedRoute) => `${r.path}${r.role ? ` as ${r.role}` : ""}`;

/** A fresh context (axe needs one from browser.newContext()), signed in as the route's role. */
async function openRoute(browser: Browser, route: CheckedRoute, viewport = { width: 1280, height: 900 }): Promise<{ context: BrowserContext; page: Page; path: string }> {
  const context = await browser.newContext({ viewport });
  if (route.role) expect(await signInThroughApi(context.request, DEMO_ACCOUNTS[route.role]), `sign-in as ${route.role}`).toBe(200);
  const path = await resolvePath(route.path, context.request);
  const page = await context.newPage();
  const response = await page.goto(path);
  const status = response?.status();
  expect(status, `${path} answers ${route.status ?? 200}`).toBe(route.status ?? 200);
  if (route.role) expect(new URL(page.url()).pathname, `${route.role} stays on ${path}`).toBe(path.split("?")[0]);
  return { context, page, path };
}

for (const route of ROUTES) {
  test(`${title(route)}: no WCAG 2.1 A/AA violations; lang, one h1, a main landmark and a skip link to it`, async ({ browser }) => {
    const { context, page, path } = await openRoute(browser, route);
    await expectNoAxeViolations(page, path);

    await expect(page.locator("html"), "lang on <html>").toHaveAttribute("lang", /^[a-z]{2,3}(-[A-Za-z0-9]+)*$/);
    await expect(page.locator("h1"), "exactly one h1").toHaveCount(1);
    await expect(page.getByRole("main"), "one main landmark").toHaveCount(1);

    await page.keyboard.press("Tab");
    const skip = page.getByRole("link", { name: "Skip to main content" });
    await expect(skip, "the first Tab stop is the skip link").toBeFocused();
    await expect(skip).toBeInViewport();
    await page.keyboard.press("Enter");
    const focusInMain = await page.getByRole("main").evaluate((main) => main === document.activeElement || main.contains(document.activeElement));
    expect(focusInMain, "the skip link moves focus to main").toBe(true);
    await context.close();
  });
}

// WCAG 1.4.10 Reflow: content fits 320 CSS px without scrolling sideways (1280 px at 400% zoom).
// 200% zoom is emulated the same way, as a 640 CSS px viewport (1280 / 2): browser zoom enlarges the
// CSS pixel, so the layout sees a narrower viewport. A deviceScaleFactor of 2 is not zoom: it only
// makes the screen denser and leaves the CSS viewport as wide as before.
const REFLOW_WIDTHS = [320, 640];
for (const route of ROUTES) {
  test(`${title(route)}: reflows at 320 px and at 200% zoom (640 px) with nothing cut off`, async ({ browser }) => {
    for (const width of REFLOW_WIDTHS) {
      const { context, page, path } = await openRoute(browser, route, { width, height: 640 });
      expect(await sidewaysScroll(page), `${path} at ${width} px scrolls sideways by`).toBeLessThanOrEqual(1);
      // Data tables may scroll inside their own region (WCAG 1.4.10 allows it); the page itself may not.
      expect(await cutOffContent(page), `${path} at ${width} px: content outside the viewport or clipped`).toEqual([]);
      await context.close();
    }
  });
}

for (const route of ROUTES) {
  test(`${title(route)}: each of the first 15 Tab stops shows a visible focus indicator`, async ({ browser }) => {
    const { context, page, path } = await openRoute(browser, route);
    const seen: string[] = [];
    for (let i = 0; i < 15; i += 1) {
      await page.keyboard.press("Tab");
      const focused = await focusedElement(page);
      if (!focused) break;
      seen.push(focused.description);
      expect(focused.visibleBox, `${path}: Tab stop ${i + 1}, ${focused.description}, is on screen when focused`).toBe(true);
      expect(focused.indicator, `${path}: Tab stop ${i + 1}, ${focused.description}, has a focus outline or ring`).not.toBeNull();
    }
    expect(seen.length, `${path} has Tab stops`).toBeGreaterThan(1);
    await context.close();
  });
}

test.describe("forms announce their errors", () => {
  test("the ask form: each field names its error, focus goes to the summary, and the summary is an alert", async ({ browser }) => {
    const context = await browser.newContext();
    const page = await context.newPage();
    await page.goto("/ask");
    await page.getByRole("button", { name: "Send my question" }).click();
    const form = page.locator("form").filter({ has: page.getByRole("button", { name: "Send my question" }) });
    await expectErrorsAnnounced(page, form, [
      { id: "ask-school", message: "Choose your child's school, or the whole district." },
      { id: "ask-topic", message: "Choose what your question is about." },
      { id: "ask-question", message: /at least 10 characters/ },
      { id: "ask-email", message: "Enter your e-mail address, so we can send you the reply." },
      { id: "ask-consent", message: /Tick the box/ },
    ]);
    await expect(page.locator("#ask-summary")).toHaveAttribute("role", "alert");
    await expectNoAxeViolations(page, "/ask with errors");
    await context.close();
  });

  test("the sign-in form: empty and malformed e-mail, then a wrong password, are announced", async ({ browser }) => {
    const context = await browser.newContext();
    const page = await context.newPage();
    await page.goto("/signin");
    const form = page.locator("form").filter({ has: page.getByRole("button", { name: "Sign in" }) });
    await page.getByRole("button", { name: "Sign in" }).click();
    await expectErrorsAnnounced(page, form, [
      { id: "email", message: "Enter the e-mail address of your staff account." },
      { id: "password", message: "Enter your password." },
    ]);
    await expectNoAxeViolations(page, "/signin with errors");

    await page.getByLabel("E-mail").fill("not-an-address");
    await page.getByLabel("Password").fill("something");
    await page.getByRole("button", { name: "Sign in" }).click();
    await expectErrorsAnnounced(page, form, [{ id: "email", message: "Enter the e-mail address of your staff account." }]);
    await expect(page.getByLabel("Password")).not.toHaveAttribute("aria-invalid", "true");

    await page.getByLabel("E-mail").fill(DEMO_ACCOUNTS.communications);
    await page.getByLabel("Password").fill("not-the-password");
    await page.getByRole("button", { name: "Sign in" }).click();
    await expect(page.getByRole("alert").filter({ hasText: "do not match an active staff account" })).toBeVisible();
    await context.close();
  });

  test("the staff room form: empty and impossible values are announced and nothing is saved", async ({ browser }) => {
    const context = await browser.newContext();
    expect(await signInThroughApi(context.request, DEMO_ACCOUNTS.facilities)).toBe(200);
    const page = await context.newPage();
    await page.goto("/staff/rooms/new");
    const form = page.getByRole("form", { name: "Add a room" });
    await form.getByRole("button", { name: "Add room" }).click();
    await expectErrorsAnnounced(page, form, [
      { id: "room-name", message: "Enter the room's name." },
      { id: "room-length", message: "Enter the floor length." },
      { id: "room-width", message: "Enter the floor width." },
      { id: "room-ceiling", message: "Enter the ceiling height." },
      { id: "room-occupancy", message: "Enter the design occupancy." },
    ]);
    await expectNoAxeViolations(page, "/staff/rooms/new with errors");

    await form.getByLabel("Room name").fill("Room A11Y");
    await form.getByLabel("Floor length (ft)").fill("30");
    await form.getByLabel("Floor width (ft)").fill("-2");
    await form.getByLabel("Ceiling height (ft)").fill("9");
    await form.getByLabel("Design occupancy").fill("20");
    await form.getByLabel("Outdoor air (cfm)").fill("400");
    await form.getByRole("button", { name: "Add room" }).click();
    await expectErrorsAnnounced(page, form, [{ id: "room-width", message: "Enter a number greater than 0." }]);
    await expect(page).toHaveURL(/\/staff\/rooms\/new$/);
    const html = await (await context.request.get("/staff/rooms")).text();
    expect(html).not.toContain("Room A11Y");
    await context.close();
  });
});

test("keyboard only: from the home page to a sent question with Tab, Shift+Tab, Enter, Space and the arrow keys", async ({ browser }) => {
  const context = await browser.newContext({ extraHTTPHeaders: { "x-forwarded-for": WALKER_ADDRESS } });
  const page = await context.newPage();
  await page.goto("/");

  // The main navigation's "Ask a question" link.
  await tabTo(page, page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Ask a question" }));
  await page.keyboard.press("Enter");
  await expect(page).toHaveURL(/\/ask$/);
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("Ask us a question");

  const school = page.locator("#ask-school");
  await tabTo(page, school);
  // Arrow keys step through a closed select's options: 1 the whole district, then the schools.
  for (let i = 0; i < 10 && (await school.inputValue()) !== "eastmere"; i += 1) await page.keyboard.press("ArrowDown");
  await expect(school).toHaveValue("eastmere");

  await page.keyboard.press("Tab");
  const topic = page.locator("#ask-topic");
  await expect(topic).toBeFocused();
  for (let i = 0; i < 10 && (await topic.inputValue()) !== "building"; i += 1) await page.keyboard.press("ArrowDown");
  await expect(topic).toHaveValue("building");

  await page.keyboard.press("Tab");
  await expect(page.locator("#ask-room")).toBeFocused();
  await page.keyboard.type("Gym");
  await page.keyboard.press("Tab");
  await expect(page.locator("#ask-question")).toBeFocused();
  await page.keyboard.type("Will the new roof over the Eastmere gym be finished before the basketball season starts?");

  // Suggested answers may add links between the question and the name: Tab past them.
  await tabTo(page, page.locator("#ask-name"));
  await page.keyboard.type("Walk Through");
  await page.keyboard.press("Tab");
  await expect(page.locator("#ask-email")).toBeFocused();
  await page.keyboard.type(`keyboard.walk.${Date.now()}@example.net`);

  // Back one field to check the name, and on again.
  await page.keyboard.press("Shift+Tab");
  await expect(page.locator("#ask-name")).toBeFocused();
  await expect(page.locator("#ask-name")).toHaveValue("Walk Through");
  await page.keyboard.press("Tab");
  await page.keyboard.press("Tab");
  const language = page.locator("#ask-language");
  await expect(language).toBeFocused();
  await page.keyboard.press("ArrowDown");
  await expect(language).not.toHaveValue("en");
  await page.keyboard.press("ArrowUp");
  await expect(language).toHaveValue("en");

  await page.keyboard.press("Tab");
  await expect(page.locator("#ask-consent")).toBeFocused();
  await page.keyboard.press("Space");
  await expect(page.locator("#ask-consent")).toBeChecked();
  await page.keyboard.press("Tab");
  await expect(page.getByRole("button", { name: "Send my question" })).toBeFocused();
  await page.keyboard.press("Enter");

  await expect(page).toHaveURL(/\/ask\/sent\?ref=Q-\d{4}-\d{4,}$/);
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("Thank you, your question has reached us");
  await context.close();
});
