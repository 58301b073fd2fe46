import AxeBuilder from "@axe-core/playwright";
import { expect, test, type Browser, type Page } from "@playwright/test";
import Database from "better-sqlite3";

const A11Y_TAGS = ["wcag2a", "wcag2aa", "wcag21a", "wcag21aa"];

// The e2e runner seeds this file and serves it; the tests change it the way the desk does.
function openDb() {
  const path = process.env.DATABASE_URL;
  if (!path) throw new Error("DATABASE_URL is not set: run this through `npm test -- e2e`");
  const db = new Database(path);
  db.pragma("busy_timeout = 5000");
  return db;
}

async function axeViolations(page: Page): Promise<string[]> {
  const results = await new AxeBuilder({ page }).withTags(A11Y_TAGS).analyze();
  return results.violations.map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(" ")).join(", ")}`);
}

async function tabTo(page: Page, selector: string, maxPresses = 60): Promise<void> {
  for (let i = 0; i < maxPresses; i += 1) {
    if (await page.locator(selector).evaluate((el) => el === document.activeElement)) return;
    await page.keyboard.press("Tab");
  }
  throw new Error(`could not reach ${selector} with the Tab key`);
}

/**
 * Opens /answers, turns to the search (focus, which is what makes the page fetch the engine and
 * its index) and waits until the browser has them, so typing searches in the page.
 */
async function openWithIndex(page: Page, path = "/answers"): Promise<void> {
  const index = page.waitForResponse((r) => r.url().includes("/api/answers/search-index") && r.status() === 200);
  await page.goto(path);
  await page.getByRole("searchbox", { name: "Search the answers" }).focus();
  await index;
  // One more frame, so the engine is in React state before the test types.
  await page.evaluate(() => new Promise((resolve) => requestAnimationFrame(() => resolve(null))));
}

/** What a result list shows: each answer's and each page part's link and words, and the count line. */
async function listed(page: Page) {
  const links = (testId: string) =>
    page.locator(`[data-testid="${testId}"] h3 a`).evaluateAll((els) => els.map((e) => [e.getAttribute("href"), e.textContent, e.querySelectorAll("mark").length]));
  return { count: await page.getByTestId("answers-count").textContent(), answers: await links("answer-results"), sections: await links("section-results") };
}

async function withoutJs<T>(browser: Browser, run: (page: Page) => Promise<T>): Promise<T> {
  const context = await browser.newContext({ javaScriptEnabled: false });
  try {
    return await run(await context.newPage());
  } finally {
    await context.close();
  }
}

test("the page lists every published answer, newest first", async ({ page }) => {
  await page.goto("/answers");
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("Answers to families’ questions");
  const days = await page.locator('[data-testid="answer-results"] time').evaluateAll((els) => els.map((e) => e.getAttribute("datetime") ?? ""));
  const db = openDb();
  const live = db.prepare("select count(*) as n from published_answers where unpublished_at is null and published_at <= ?").get(new Date().toISOString()) as { n: number };
  db.close();
  expect(days.length).toBe(Math.min(50, live.n));
  expect(days.length).toBeGreaterThanOrEqual(12);
  expect([...days].sort().reverse()).toEqual(days);
  await expect(page.getByTestId("answers-count")).toHaveText(`${live.n} answers.`);
});

test("the search engine and its index are fetched only when the visitor turns to the search", async ({ page }) => {
  const fetched: string[] = [];
  page.on("request", (r) => {
    if (r.url().includes("/api/answers/search-index")) fetched.push(r.url());
  });
  await page.goto("/answers");
  await page.waitForLoadState("networkidle");
  // Reading the list costs nothing more than the page itself.
  expect(fetched).toEqual([]);
  await expect(page.getByTestId("answers-count")).toHaveText(/^\d+ answers\.$/);

  const index = page.waitForResponse((r) => r.url().includes("/api/answers/search-index") && r.status() === 200);
  await page.getByRole("searchbox", { name: "Search the answers" }).pressSequentially("generator", { delay: 20 });
  await index;
  // What was typed while the engine arrived is searched once it is there, in the page.
  await expect(page.getByTestId("answers-count")).toContainText("matching “generator”");
  await expect(page).toHaveURL(/\/answers\?q=generator$/);
  expect(fetched).toHaveLength(1);
});

test("typing searches as you type and puts the search in the address, without loading a new page", async ({ page }) => {
  await openWithIndex(page);
  await page.evaluate(() => {
    (window as unknown as { sameDocument: boolean }).sameDocument = true;
  });
  await page.getByRole("searchbox", { name: "Search the answers" }).pressSequentially("ventilaton", { delay: 30 });
  await expect(page).toHaveURL(/\/answers\?q=ventilaton$/);
  const firstAnswer = page.locator('[data-testid="answer-results"] h3 a').first();
  await expect(firstAnswer).toHaveText("What was done to the ventilation at Corrow Ridge, and how do you know it works?");
  await expect(firstAnswer.locator("mark")).toHaveText("ventilation");
  await expect(page.getByTestId("answers-count")).toContainText("matching “ventilaton”");

  await page.getByLabel("School", { exact: true }).selectOption("corrow-ridge");
  await page.getByLabel("Topic", { exact: true }).selectOption("air");
  await expect(page).toHaveURL(/\/answers\?q=ventilaton&school=corrow-ridge&topic=air$/);
  await expect(firstAnswer).toHaveText("What was done to the ventilation at Corrow Ridge, and how do you know it works?");
  // The count reaches screen readers once typing stops, through a polite live region.
  await expect(page.getByRole("status").filter({ hasText: "matching “ventilaton”" })).toHaveAttribute("aria-live", "polite");
  expect(await page.evaluate(() => (window as unknown as { sameDocument?: boolean }).sameDocument)).toBe(true);
});

test("without JavaScript the same address lists the same results as the page with JavaScript", async ({ page, browser }) => {
  test.setTimeout(120_000);
  const searches: { q: string; school?: string; topic?: string }[] = [
    { q: "generator" },
    { q: "AC" },
    { q: "face covering", school: "eastmere" },
    { q: "disinfectant", topic: "cleaning" },
    { q: "genera" },
    { q: "generator unicorns" },
    { q: "", school: "tamsin-creek", topic: "air" },
  ];
  await openWithIndex(page);
  for (const s of searches) {
    const box = page.getByRole("searchbox", { name: "Search the answers" });
    await box.fill("");
    await page.getByLabel("School", { exact: true }).selectOption(s.school ?? "");
    await page.getByLabel("Topic", { exact: true }).selectOption(s.topic ?? "");
    if (s.q) await box.fill(s.q);
    await expect(page).toHaveURL(s.q ? new RegExp(`q=${encodeURIComponent(s.q).replace(/%20/g, "\\+")}`) : /\/answers/);
    await expect(page.getByTestId("answers-count")).toContainText(s.q ? `“${s.q}”` : "answers");
    const withJs = await listed(page);
    const address = new URL(page.url()).pathname + new URL(page.url()).search;
    const noJs = await withoutJs(browser, async (plain) => {
      await plain.goto(address);
      return listed(plain);
    });
    expect(noJs, address).toEqual(withJs);
    expect(withJs.answers.length, address).toBeGreaterThan(0);
  }

  // And the GET form itself works without JavaScript.
  await withoutJs(browser, async (plain) => {
    await plain.goto("/answers");
    await plain.getByRole("searchbox", { name: "Search the answers" }).fill("HVAC");
    await plain.getByRole("button", { name: "Search" }).click();
    await expect(plain).toHaveURL(/\/answers\?q=HVAC&school=&topic=$/);
    await expect(plain.locator('[data-testid="answer-results"] h3 a').first()).toHaveText(
      "What was done to the ventilation at Corrow Ridge, and how do you know it works?",
    );
  });
});

test("the API answers the contract's fields only, in the page's order, with no personal data", async ({ request, page }) => {
  const response = await request.get("/api/answers?q=generator&school=eastmere");
  expect(response.status()).toBe(200);
  const body = (await response.json()) as { results: Record<string, unknown>[] };
  expect(Object.keys(body)).toEqual(["results"]);
  for (const r of body.results) expect(Object.keys(r).sort()).toEqual(["answer", "id", "publishedAt", "question", "school", "topic", "url"]);

  await page.goto("/answers?q=generator&school=eastmere");
  const hrefs = await page.locator('[data-testid="answer-results"] h3 a').evaluateAll((els) => els.map((e) => e.getAttribute("href")));
  expect(body.results.map((r) => r.url)).toEqual(hrefs);

  const db = openDb();
  const people = db.prepare("select asker_email as email, asker_name as name from questions").all() as { email: string; name: string | null }[];
  db.close();
  expect(people.length).toBeGreaterThan(0);
  const everything = JSON.stringify([await (await request.get("/api/answers")).json(), await (await request.get("/api/answers/search-index")).json()]);
  for (const p of people) {
    expect(everything).not.toContain(p.email);
    if (p.name) expect(everything).not.toContain(p.name);
  }
  expect(everything).not.toMatch(/@/);
});

test("a helpful vote counts once per browser, with and without JavaScript", async ({ browser }) => {
  const db = openDb();
  const id = (db.prepare("select id from published_answers where question_text like '%desks in classrooms%'").get() as { id: number }).id;
  db.close();
  const counted = async (page: Page) => Number(/^(\d+) of/.exec((await page.getByTestId("helpful-count").textContent()) ?? "")?.[1] ?? 0);

  const context = await browser.newContext();
  const page = await context.newPage();
  await page.goto(`/answers/${id}`);
  const before = await counted(page);
  await page.getByRole("button", { name: "Yes, it helped" }).click();
  await expect(page.getByRole("status").filter({ hasText: "Thank you" })).toBeVisible();
  await expect(page.getByTestId("helpful-count")).toContainText(`${before + 1} of`);
  await page.getByRole("button", { name: "Yes, it helped" }).click();
  await page.reload();
  await expect(page.getByTestId("your-vote")).toHaveText("You said this answer helped. You can change your answer.");
  expect(await counted(page)).toBe(before + 1);
  await expect(page.getByRole("button", { name: "Yes, it helped" })).toHaveAttribute("aria-pressed", "true");
  await context.close();

  await withoutJs(browser, async (plain) => {
    await plain.goto(`/answers/${id}`);
    await plain.getByRole("button", { name: "Yes, it helped" }).click();
    await expect(plain).toHaveURL(new RegExp(`/answers/${id}#helpful$`));
    expect(await counted(plain)).toBe(before + 2);
    await plain.getByRole("button", { name: "Yes, it helped" }).click();
    await expect(plain.getByTestId("your-vote")).toBeVisible();
    expect(await counted(plain)).toBe(before + 2);
  });
});

test("an answer taken down disappears from the page, its own page, the API and the index", async ({ page, request }) => {
  const question = `Will the gym at Eastmere stay open for evening events this winter? (${Date.now()})`;
  const db = openDb();
  const now = new Date().toISOString();
  // As the desk publishes: a new row.
  const id = Number(
    db
      .prepare("insert into published_answers (school_id, topic, question_text, answer_markdown, published_at, updated_at) values ((select id from schools where slug = 'eastmere'), 'building', ?, ?, ?, ?)")
      .run(question, "Yes. The gym stays open for evening events while the roof work goes on next door.", now, now).lastInsertRowid,
  );
  const inIndex = async () => ((await (await request.get("/api/answers/search-index")).json()) as { answers: [number][] }).answers.some((a) => a[0] === id);
  const inApi = async () => ((await (await request.get("/api/answers?q=evening+events")).json()) as { results: { id: number }[] }).results.some((r) => r.id === id);

  await page.goto("/answers?q=evening+events");
  await expect(page.locator('[data-testid="answer-results"] h3 a').first()).toHaveText(question);
  expect((await page.goto(`/answers/${id}`))?.status()).toBe(200);
  expect(await inApi()).toBe(true);
  expect(await inIndex()).toBe(true);

  // As the desk takes it down: unpublished_at and updated_at, and nothing else.
  const later = new Date().toISOString();
  db.prepare("update published_answers set unpublished_at = ?, updated_at = ? where id = ?").run(later, later, id);
  db.close();

  await page.goto("/answers?q=evening+events");
  await expect(page.getByText(question)).toHaveCount(0);
  await page.goto("/answers");
  await expect(page.getByText(question)).toHaveCount(0);
  expect((await page.goto(`/answers/${id}`))?.status()).toBe(404);
  expect(await inApi()).toBe(false);
  expect(await inIndex()).toBe(false);
});

test("a page section in the results opens at its heading", async ({ page }) => {
  await page.goto("/answers?q=generator&school=eastmere");
  const section = page.locator('[data-testid="section-results"] h3 a', { hasText: "An emergency generator" });
  await expect(section).toHaveAttribute("href", "/schools/eastmere/building#an-emergency-generator");
  await section.click();
  await expect(page).toHaveURL(/\/schools\/eastmere\/building#an-emergency-generator$/);
  await expect(page.locator("h2#an-emergency-generator")).toHaveText("An emergency generator");
});

test("a keyboard-only search: Tab to the box, type, Tab to a result, Enter opens it", async ({ page }) => {
  await page.goto("/answers");
  // Reaching the box with the Tab key is what fetches the search engine.
  const index = page.waitForResponse((r) => r.url().includes("/api/answers/search-index") && r.status() === 200);
  await tabTo(page, "#answers-q");
  await index;
  await page.keyboard.type("sanitiser");
  await expect(page).toHaveURL(/q=sanitiser/);
  const first = page.locator('[data-testid="answer-results"] h3 a').first();
  await expect(first).toHaveText("Is there hand sanitizer in the classrooms, and is it safe for young children?");
  await tabTo(page, '[data-testid="answer-results"] h3 a >> nth=0');
  await expect(first).toBeFocused();
  await page.keyboard.press("Enter");
  await expect(page).toHaveURL(/\/answers\/\d+$/);
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("Is there hand sanitizer in the classrooms, and is it safe for young children?");
});

for (const path of ["/answers", "/answers?q=generator"]) {
  test(`${path} has no WCAG 2.1 A/AA violations`, async ({ browser }) => {
    const context = await browser.newContext();
    const page = await context.newPage();
    await openWithIndex(page, path);
    expect(await axeViolations(page)).toEqual([]);
    await context.close();
  });
}

test("an answer's own page has no WCAG 2.1 A/AA violations, and shows its school, topic, date, vote and related answers", async ({ browser }) => {
  const context = await browser.newContext();
  const page = await context.newPage();
  await page.goto("/answers?q=eastmere+generator");
  await page.locator('[data-testid="answer-results"] h3 a').first().click();
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("What will the emergency generator at Eastmere keep running if the power goes out?");
  await expect(page.getByRole("link", { name: "Eastmere High School" })).toHaveAttribute("href", "/answers?school=eastmere");
  await expect(page.getByRole("link", { name: "Building work" }).first()).toHaveAttribute("href", "/answers?topic=building");
  await expect(page.locator("main time").first()).toHaveText("November 24, 2026");
  await expect(page.getByRole("region", { name: "Was this answer helpful?" })).toBeVisible();
  await expect(page.getByRole("region", { name: "Related answers" }).getByRole("link").first()).toHaveText(/generator|power/i);
  await expect(page.getByRole("link", { name: "Ask a follow-up question" })).toHaveAttribute("href", "/ask?school=eastmere&topic=building");
  expect(await axeViolations(page)).toEqual([]);
  await context.close();
});

test("screenshots of the answers pages at phone and desktop widths", async ({ browser }, testInfo) => {
  for (const width of [375, 1280]) {
    const context = await browser.newContext({ viewport: { width, height: 900 } });
    const page = await context.newPage();
    for (const path of ["/answers", "/answers?q=generator", "/answers/5"]) {
      await page.goto(path);
      const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
      expect(overflow, `${path} at ${width}px`).toBeLessThanOrEqual(0);
      await page.screenshot({ path: testInfo.outputPath(`${width}${path.replace(/[/?=]/g, "_")}.png`), fullPage: true });
    }
    await context.close();
  }
});
