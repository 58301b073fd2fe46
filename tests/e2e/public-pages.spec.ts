import AxeBuilder from "@axe-core/playwright";
import { expect, test } from "@playwright/test";
import { DEMO_ACCOUNTS, signInThroughApi } from "./support/staff";

const SCHOOLS = ["tamsin-creek", "corrow-ridge", "eastmere"];
const TOPICS = ["cleaning", "air", "building"];
const DISTRICT = ["first-day-back", "cleaning-and-disinfection", "signs-and-routes", "when-a-case-is-reported"];

const PUBLIC_PAGES = [
  ...DISTRICT.map((p) => `/district/${p}`),
  ...SCHOOLS.flatMap((s) => [`/schools/${s}`, ...TOPICS.map((t) => `/schools/${s}/${t}`)]),
];

for (const path of PUBLIC_PAGES) {
  test(`${path} answers 200 and has no WCAG 2.1 A/AA violations`, async ({ browser }) => {
    const context = await browser.newContext();
    const page = await context.newPage();
    const response = await page.goto(path);
    expect(response?.status()).toBe(200);
    await expect(page.getByRole("heading", { level: 1 })).toBeVisible();
    const results = await new AxeBuilder({ page }).withTags(["wcag2a", "wcag2aa", "wcag21a", "wcag21aa"]).analyze();
    expect(results.violations.map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(" ")).join(", ")}`)).toEqual([]);
    await context.close();
  });
}

for (const path of ["/schools/no-such-school", "/schools/eastmere/roof", "/district/no-such-page", "/schools/no-such-school/air"]) {
  test(`${path} gets our 404 page`, async ({ page }) => {
    const response = await page.goto(path);
    expect(response?.status()).toBe(404);
    await expect(page.getByRole("heading", { level: 1 })).toHaveText("We could not find that page");
  });
}

test("pages come from the prerender cache, cacheable by a proxy, and a reload with their ETag costs a 304", async ({ request }) => {
  for (const path of ["/", "/schools/tamsin-creek", "/schools/eastmere/air"]) {
    const response = await request.get(path);
    expect(response.status(), path).toBe(200);
    expect(response.headers()["cache-control"], path).toMatch(/s-maxage=\d+/);
    const etag = response.headers()["etag"];
    expect(etag, path).toBeTruthy();
    const again = await request.get(path, { headers: { "if-none-match": etag! } });
    expect(again.status(), path).toBe(304);
    expect(await again.body(), path).toHaveLength(0);
  }
});

test("chemical and air pages carry the cautions and send families to the health department", async ({ page }) => {
  await page.goto("/district/cleaning-and-disinfection");
  await expect(page.getByRole("complementary", { name: /^Caution/ }).first()).toBeVisible();
  await expect(page.locator("main")).toContainText(/ammonia/i);
  for (const school of SCHOOLS) {
    await page.goto(`/schools/${school}/air`);
    await expect(page.getByRole("complementary", { name: /^Caution/ }).first()).toBeVisible();
    await expect(page.getByRole("table", { name: "Rooms and the outdoor air they need" })).toBeVisible();
  }
});

test("the ask link on a page pre-fills its school and topic", async ({ page }) => {
  await page.goto("/schools/corrow-ridge/air");
  const href = await page.getByRole("link", { name: "Ask us about this page" }).getAttribute("href");
  expect(href).toBe("/ask?school=corrow-ridge&topic=air");
});

test("a project's new status shows on the Building work page without a rebuild", async ({ page, playwright, baseURL }) => {
  const staff = await playwright.request.newContext({ baseURL });
  expect(await signInThroughApi(staff, DEMO_ACCOUNTS.facilities)).toBe(200);
  await page.goto("/schools/eastmere/building");
  const entrance = page.getByTestId("project-entrance");
  await expect(entrance).toContainText("Planned");

  // The entrance project is the last of the twelve seeded projects.
  const update = await staff.patch("/api/staff/projects/12", { data: { status: "finished", statusDate: "2026-11-30" } });
  expect(update.status()).toBe(200);
  expect((await update.json()).project).toMatchObject({ key: "entrance", status: "finished" });

  await page.reload();
  await expect(entrance).toContainText("Finished");
  await expect(entrance).toContainText("November 30, 2026");
  await staff.dispose();
});

test("screenshots of the public pages at phone and desktop widths", async ({ browser }, testInfo) => {
  for (const width of [375, 1280]) {
    const context = await browser.newContext({ viewport: { width, height: 900 } });
    const page = await context.newPage();
    for (const path of ["/", "/schools/tamsin-creek", "/schools/tamsin-creek/air", "/district/signs-and-routes"]) {
      await page.goto(path);
      // Nothing may scroll sideways on a phone.
      const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
      expect(overflow, `${path} at ${width}px`).toBeLessThanOrEqual(0);
      await page.screenshot({ path: testInfo.outputPath(`${width}${path.replace(/\//g, "_") || "_home"}.png`), fullPage: true });
    }
    await context.close();
  }
});
