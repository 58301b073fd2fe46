import AxeBuilder from "@axe-core/playwright";
import { expect, test, type APIRequestContext, type Page } from "@playwright/test";
import { mailTo, waitForMailTo } from "./support/mail";

// Each test asks from its own address (documentation ranges, RFC 5737); the e2e server runs with
// TRUST_PROXY=1, so X-Forwarded-For is the asker's address and the rate limit is per test.
const from = (ip: string) => ({ "x-forwarded-for": ip });

const A11Y_TAGS = ["wcag2a", "wcag2aa", "wcag21a", "wcag21aa"];

async function axeViolations(page: Page): Promise<string[]> {
  const results = await new AxeBuilder({ page }).withTags(A11Y_TAGS).analyze();
  return results.violations.map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(" ")).join(", ")}`);
}

/** Presses Tab until the element is focused: the keyboard is the only way in. */
async function tabTo(page: Page, selector: string, maxPresses = 80): Promise<void> {
  for (let i = 0; i < maxPresses; i += 1) {
    if (await page.locator(selector).evaluate((el) => el === document.activeElement)) return;
    await page.keyboard.press("Tab");
  }
  throw new Error(`could not reach ${selector} with the Tab key`);
}

function question(email: string, extra: Record<string, unknown> = {}) {
  return {
    school: "corrow-ridge",
    topic: "distancing",
    question: "How far apart are the desks in the maths rooms this term?",
    email,
    ...extra,
  };
}

async function post(request: APIRequestContext, ip: string, data: unknown) {
  return request.post("/api/questions", { headers: from(ip), data });
}

function sequence(reference: string): number {
  return Number(reference.split("-")[2]);
}

test("a parent asks with the keyboard only, sees a matching published answer, and opens the status link from the e-mail", async ({ browser }) => {
  const email = `keyboard.parent.${Date.now()}@example.net`;
  const context = await browser.newContext({ extraHTTPHeaders: from("203.0.113.21") });
  const page = await context.newPage();
  // The school's air page links here with its school and topic filled in.
  await page.goto("/ask?school=tamsin-creek&topic=air");
  await expect(page.getByLabel("School", { exact: true })).toHaveValue("tamsin-creek");
  await expect(page.getByLabel("Topic", { exact: true })).toHaveValue("air");

  await tabTo(page, "#ask-room");
  await page.keyboard.type("Room 104");
  await page.keyboard.press("Tab");
  await expect(page.locator("#ask-question")).toBeFocused();
  await page.keyboard.type("Does my son's classroom get fresh air from outside, or is the same air just going round?");

  const suggestions = page.getByRole("region", { name: "Already answered?" });
  await expect(suggestions).toBeVisible();
  const match = suggestions.getByRole("link", { name: /Does my child's classroom at Tamsin Creek get fresh air from outside/ });
  await expect(match).toBeVisible();
  await expect(match).toHaveAttribute("href", /^\/answers\/\d+$/);
  await expect(page.getByText(/published answers? looks? like your question\. They are listed/)).toBeAttached();

  // The parent reads the suggestion and still sends their own question.
  await tabTo(page, "#ask-name");
  await page.keyboard.type("Keyboard Parent");
  await page.keyboard.press("Tab");
  await expect(page.locator("#ask-email")).toBeFocused();
  await page.keyboard.type(email);
  await page.keyboard.press("Tab");
  await expect(page.locator("#ask-language")).toBeFocused();
  await page.keyboard.press("ArrowDown");
  await expect(page.locator("#ask-language")).toHaveValue("es");
  await page.keyboard.press("Tab");
  await expect(page.locator("#ask-consent")).toBeFocused();
  await page.keyboard.press("Space");
  await expect(page.locator("#ask-consent")).toBeChecked();
  await page.keyboard.press("Tab");
  await expect(page.getByRole("button", { name: "Send my question" })).toBeFocused();
  await page.keyboard.press("Enter");

  await expect(page).toHaveURL(/\/ask\/sent\?ref=Q-\d{4}-\d{4,}$/);
  const reference = new URL(page.url()).searchParams.get("ref")!;
  await expect(page.getByText(`Your reference is ${reference}`)).toBeVisible();
  await expect(page.getByText(/spam or junk folder/)).toBeVisible();
  // The status link only ever travels by e-mail.
  expect(await page.content()).not.toContain("/ask/status/");
  expect(await axeViolations(page)).toEqual([]);

  const mail = await waitForMailTo(email);
  expect(mail.subject).toBe(`We received your question (${reference})`);
  expect(mail.text).toContain("Does my son's classroom get fresh air from outside");
  expect(mail.text).toMatch(/We aim to reply within 3 school days, by \w+day, \w+ \d+, \d{4}\./);
  const link = /https?:\/\/\S+\/ask\/status\/[A-Za-z0-9_-]{43}/.exec(mail.text)?.[0];
  expect(link, "status link in the e-mail").toBeTruthy();
  expect(mail.html).toContain(`href="${link}"`);

  const status = await page.goto(link!);
  expect(status?.status()).toBe(200);
  await expect(page.getByRole("heading", { level: 1 })).toHaveText(`Your question ${reference}`);
  await expect(page.getByRole("heading", { name: "Status: Received" })).toBeVisible();
  await expect(page.getByText("Does my son's classroom get fresh air from outside")).toBeVisible();
  await expect(page.locator('meta[name="robots"]')).toHaveAttribute("content", /noindex/);
  await expect(page.locator('meta[name="referrer"]')).toHaveAttribute("content", "no-referrer");
  const html = await page.content();
  expect(html).not.toContain(email);
  expect(html).not.toContain("Keyboard Parent");
  expect(await axeViolations(page)).toEqual([]);
  await context.close();
});

test("the form shows errors next to each field and in a summary, and has no WCAG 2.1 A/AA violations", async ({ browser }) => {
  const context = await browser.newContext({ extraHTTPHeaders: from("203.0.113.22") });
  const page = await context.newPage();
  await page.goto("/ask");
  expect(await axeViolations(page)).toEqual([]);
  await page.getByRole("button", { name: "Send my question" }).click();
  const summary = page.locator("#ask-summary");
  await expect(summary).toBeFocused();
  await expect(summary).toContainText("5 things to fix");
  for (const [id, message] of [
    ["ask-school", "Choose your child's school, or the whole district."],
    ["ask-topic", "Choose what your question is about."],
    ["ask-question", "Write your question in at least 10 characters"],
    ["ask-email", "Enter your e-mail address, so we can send you the reply."],
    ["ask-consent", "Tick the box to agree"],
  ] as const) {
    await expect(page.locator(`#${id}-error`)).toContainText(message);
    await expect(page.locator(`#${id}`)).toHaveAttribute("aria-invalid", "true");
    await expect(page.locator(`#${id}`)).toHaveAttribute("aria-describedby", new RegExp(`${id}-error`));
    await expect(summary.locator(`a[href="#${id}"]`)).toContainText(message);
  }
  expect(await axeViolations(page)).toEqual([]);

  // Fixing a field clears its error as the parent types.
  await page.getByLabel("Your e-mail address").fill("fixing.parent@example.net");
  await expect(page.locator("#ask-email-error")).toHaveCount(0);
  await context.close();
});

test("the form works without JavaScript: errors come back with what was typed, then it sends", async ({ browser }) => {
  const email = `no.script.${Date.now()}@example.net`;
  const context = await browser.newContext({ javaScriptEnabled: false, extraHTTPHeaders: from("203.0.113.23") });
  const page = await context.newPage();
  await page.goto("/ask?school=eastmere&topic=building");
  await page.getByLabel("Your question").fill("Generator");
  await page.getByLabel("Your e-mail address").fill(email);
  await page.getByRole("button", { name: "Send my question" }).click();

  await expect(page.locator("#ask-summary")).toContainText("Not sent yet: 2 things to fix");
  await expect(page.locator("#ask-question-error")).toContainText("at least 10 characters");
  await expect(page.locator("#ask-consent-error")).toContainText("Tick the box");
  await expect(page.getByLabel("Your e-mail address")).toHaveValue(email);
  await expect(page.getByLabel("School", { exact: true })).toHaveValue("eastmere");
  await expect(page.getByLabel("Topic", { exact: true })).toHaveValue("building");
  expect(await mailTo(email)).toEqual([]);

  await page.getByLabel("Your question").fill("What does the generator at Eastmere keep running in a storm?");
  await page.getByLabel(/I agree that the district keeps my question/).check();
  await page.getByRole("button", { name: "Send my question" }).click();
  await expect(page).toHaveURL(/\/ask\/sent\?ref=Q-\d{4}-\d{4,}$/);
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("Thank you, your question has reached us");
  const mail = await waitForMailTo(email);
  expect(mail.text).toContain("What does the generator at Eastmere keep running in a storm?");
  await context.close();
});

test("POST /api/questions answers 201 with the reference and the asker's own link, and nothing personal", async ({ request }) => {
  const email = `api.parent.${Date.now()}@example.net`;
  const response = await post(request, "203.0.113.31", question(email, { name: "Api Parentname", room: "Room 203", language: "vi" }));
  expect(response.status()).toBe(201);
  expect(response.headers()["cache-control"]).toContain("no-store");
  const text = await response.text();
  const body = JSON.parse(text) as { reference: string; state: string; statusUrl: string };
  expect(Object.keys(body).sort()).toEqual(["reference", "state", "statusUrl"]);
  expect(body.reference).toMatch(/^Q-\d{4}-\d{4,}$/);
  expect(body.state).toBe("received");
  expect(body.statusUrl).toMatch(/\/ask\/status\/[A-Za-z0-9_-]{43}$/);
  expect(text).not.toContain(email);
  expect(text).not.toContain("Api Parentname");

  const mail = await waitForMailTo(email);
  expect(mail.text).toContain(body.statusUrl);
  const status = await request.get(new URL(body.statusUrl).pathname);
  expect(status.status()).toBe(200);
  const page = await status.text();
  expect(page).toContain(body.reference);
  expect(page).not.toContain(email);
  expect(page).not.toContain("Api Parentname");
});

test("each kind of bad input gets its status code and stores nothing", async ({ request }) => {
  const ip = "203.0.113.32";
  const stamp = Date.now();
  const first = await post(request, ip, question(`before.${stamp}@example.net`));
  expect(first.status()).toBe(201);
  const before = sequence(((await first.json()) as { reference: string }).reference);

  const missingEmail = await post(request, ip, { ...question(""), email: undefined });
  expect(missingEmail.status()).toBe(400);
  expect(await missingEmail.json()).toEqual({ errors: { email: "Enter your e-mail address, so we can send you the reply." } });

  const short = await post(request, ip, question(`short.${stamp}@example.net`, { question: "Desks" }));
  expect(short.status()).toBe(400);
  expect(((await short.json()) as { errors: Record<string, string> }).errors).toEqual({ question: expect.stringMatching(/at least 10 characters/) });

  const huge = await request.post("/api/questions", {
    headers: { ...from(ip), "content-type": "application/json" },
    data: JSON.stringify(question(`huge.${stamp}@example.net`, { question: "x".repeat(100 * 1024) })),
  });
  expect(huge.status()).toBe(413);

  const wrongType = await request.post("/api/questions", {
    headers: { ...from(ip), "content-type": "text/plain" },
    data: JSON.stringify(question(`plain.${stamp}@example.net`)),
  });
  expect(wrongType.status()).toBe(415);

  const honeypot = await post(request, ip, question(`bot.${stamp}@example.net`, { website: "https://spam.example.com" }));
  expect(honeypot.status()).toBe(400);
  expect(((await honeypot.json()) as { errors: Record<string, string> }).errors).toHaveProperty("website");

  const broken = await request.post("/api/questions", { headers: { ...from(ip), "content-type": "application/json" }, data: "{not json" });
  expect(broken.status()).toBe(400);

  // References are numbered in the same transaction as the insert: the next one proves none of the above was stored.
  const after = await post(request, ip, question(`after.${stamp}@example.net`));
  expect(after.status()).toBe(201);
  expect(sequence(((await after.json()) as { reference: string }).reference)).toBe(before + 1);

  // Mail goes out oldest first, so once the last good one has arrived, none of the refused ones can follow.
  await waitForMailTo(`after.${stamp}@example.net`);
  for (const refused of ["short", "huge", "plain", "bot"]) expect(await mailTo(`${refused}.${stamp}@example.net`)).toEqual([]);
});

test("the sixth question from one address in ten minutes gets 429 and stores nothing; the form keeps the words", async ({ request, browser }) => {
  const ip = "203.0.113.33";
  const stamp = Date.now();
  const references: number[] = [];
  for (let i = 1; i <= 5; i += 1) {
    const ok = await post(request, ip, question(`limit${i}.${stamp}@example.net`));
    expect(ok.status()).toBe(201);
    references.push(sequence(((await ok.json()) as { reference: string }).reference));
  }
  const sixth = await post(request, ip, question(`limit6.${stamp}@example.net`));
  expect(sixth.status()).toBe(429);
  expect(Number(sixth.headers()["retry-after"])).toBeGreaterThan(0);
  expect(((await sixth.json()) as { error: string }).error).toMatch(/several questions in a short time/);

  // The same address through the form: a clear message, and nothing typed is lost.
  const context = await browser.newContext({ extraHTTPHeaders: from(ip) });
  const page = await context.newPage();
  await page.goto("/ask?school=district&topic=other");
  await page.getByLabel("Your question").fill("Is there a new bus timetable for the first day back?");
  await page.getByLabel("Your e-mail address").fill(`limit7.${stamp}@example.net`);
  await page.getByLabel(/I agree that the district keeps my question/).check();
  await page.getByRole("button", { name: "Send my question" }).click();
  await expect(page.locator("#ask-summary")).toContainText("several questions in a short time");
  await expect(page.getByLabel("Your question")).toHaveValue("Is there a new bus timetable for the first day back?");
  await expect(page).toHaveURL(/\/ask\?/);
  await context.close();

  // Another address is not held back, and its reference follows the fifth: nothing was stored in between.
  const other = await post(request, "203.0.113.34", question(`other.${stamp}@example.net`));
  expect(other.status()).toBe(201);
  expect(sequence(((await other.json()) as { reference: string }).reference)).toBe(references[4]! + 1);
  await waitForMailTo(`other.${stamp}@example.net`);
  expect(await mailTo(`limit6.${stamp}@example.net`)).toEqual([]);
  expect(await mailTo(`limit7.${stamp}@example.net`)).toEqual([]);
});

test("a wrong or made-up status link gets the ordinary 404 page, revealing nothing", async ({ page }) => {
  const made = "A".repeat(43);
  for (const path of [`/ask/status/${made}`, "/ask/status/short", "/ask/status/Zm9vYmFy", `/ask/status/${made}.json`]) {
    const response = await page.goto(path);
    expect(response?.status(), path).toBe(404);
    await expect(page.getByRole("heading", { level: 1 })).toHaveText("We could not find that page");
  }
});

test("a published answer has its own page; the suggestion list holds public words only", async ({ page, request }) => {
  const list = await request.get("/api/answers/suggestions");
  expect(list.status()).toBe(200);
  expect(list.headers()["cache-control"]).toContain("public");
  const { answers } = (await list.json()) as { answers: Record<string, unknown>[] };
  expect(answers.length).toBeGreaterThanOrEqual(12);
  for (const a of answers) expect(Object.keys(a).sort()).toEqual(["excerpt", "id", "question", "school", "schoolName", "topic", "topicLabel", "url"]);
  expect(JSON.stringify(answers)).not.toContain("@");

  const generator = answers.find((a) => String(a.question).startsWith("What will the emergency generator at Eastmere"))!;
  const response = await page.goto(String(generator.url));
  expect(response?.status()).toBe(200);
  await expect(page.getByRole("heading", { level: 1 })).toHaveText(String(generator.question));
  await expect(page.locator("main")).toContainText("Eastmere High School · Building work · Published");
  await expect(page.locator("main li").filter({ hasText: "refrigeration in the kitchen" })).toBeVisible();
  await expect(page.getByRole("complementary", { name: /^Caution/ })).toBeVisible();
  await expect(page.getByRole("link", { name: "Ask a follow-up question" })).toHaveAttribute("href", "/ask?school=eastmere&topic=building");
  expect(await axeViolations(page)).toEqual([]);

  for (const path of ["/answers/99999", "/answers/abc", "/answers/0"]) {
    expect((await page.goto(path))?.status(), path).toBe(404);
  }
});

test("screenshots of the ask page at phone and desktop widths, empty, with errors and with a suggestion", async ({ browser }, testInfo) => {
  for (const width of [375, 1280]) {
    const context = await browser.newContext({ viewport: { width, height: 900 }, extraHTTPHeaders: from(`203.0.113.${40 + (width % 7)}`) });
    const page = await context.newPage();
    await page.goto("/ask?school=tamsin-creek&topic=air");
    await expect(page.getByRole("heading", { level: 1 })).toHaveText("Ask us a question");
    const overflow = () => page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
    expect(await overflow(), `/ask at ${width}px`).toBeLessThanOrEqual(0);
    await page.screenshot({ path: testInfo.outputPath(`ask-${width}.png`), fullPage: true });

    await page.getByRole("button", { name: "Send my question" }).click();
    await expect(page.locator("#ask-summary")).toContainText("Not sent yet");
    await page.screenshot({ path: testInfo.outputPath(`ask-${width}-errors.png`), fullPage: true });

    await page.getByLabel("Your question").fill("Is there air conditioning in the classrooms? It gets so hot in June.");
    await expect(page.getByRole("region", { name: "Already answered?" })).toBeVisible();
    expect(await overflow(), `/ask with a suggestion at ${width}px`).toBeLessThanOrEqual(0);
    expect(await axeViolations(page)).toEqual([]);
    await page.screenshot({ path: testInfo.outputPath(`ask-${width}-suggestion.png`), fullPage: true });
    await context.close();
  }
});
