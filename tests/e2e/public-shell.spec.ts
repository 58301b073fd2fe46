import AxeBuilder from "@axe-core/playwright";
import { expect, test } from "@playwright/test";

test("the home page names the district, lists the schools and has a working skip link", async ({ page }) => {
  await page.goto("/");
  await expect(page.locator("html")).toHaveAttribute("lang", "en");
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("Our school buildings are open again");
  for (const name of ["Tamsin Creek Elementary School", "Corrow Ridge Middle School", "Eastmere High School"]) {
    await expect(page.getByRole("link", { name })).toBeVisible();
  }
  await page.keyboard.press("Tab");
  const skip = page.getByRole("link", { name: "Skip to main content" });
  await expect(skip).toBeFocused();
  await page.keyboard.press("Enter");
  await expect(page.locator("#main")).toBeFocused();
});

test("the main navigation leads to every public section, the answers list among them", async ({ page }) => {
  await page.goto("/");
  const nav = page.getByRole("navigation", { name: "Main" });
  expect(await nav.getByRole("link").evaluateAll((links) => links.map((a) => [a.textContent, a.getAttribute("href")]))).toEqual([
    ["Home", "/"],
    ["Schools", "/schools"],
    ["Cleaning", "/district/cleaning-and-disinfection"],
    ["If a case is reported", "/district/when-a-case-is-reported"],
    ["Answers", "/answers"],
    ["Ask a question", "/ask"],
  ]);
  await nav.getByRole("link", { name: "Answers" }).click();
  await expect(page).toHaveURL(/\/answers$/);
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("Answers to families’ questions");
});

test("the school picker works without JavaScript", async ({ browser }) => {
  const context = await browser.newContext({ javaScriptEnabled: false });
  const page = await context.newPage();
  await page.goto("/");
  await page.getByRole("combobox", { name: "Your school" }).first().selectOption("corrow-ridge");
  await page.getByRole("button", { name: "Go" }).first().click();
  await expect(page).toHaveURL(/\/schools\/corrow-ridge$/);
  await context.close();
});

test("an unknown address gets our own not-found page with status 404", async ({ page }) => {
  const response = await page.goto("/no-such-page");
  expect(response?.status()).toBe(404);
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("We could not find that page");
});

for (const path of ["/", "/schools", "/signin", "/no-such-page"]) {
  test(`${path} has no WCAG 2.1 A/AA violations`, async ({ browser }) => {
    const context = await browser.newContext();
    const page = await context.newPage();
    await page.goto(path);
    const results = await new AxeBuilder({ page }).withTags(["wcag2a", "wcag2aa", "wcag21a", "wcag21aa"]).analyze();
    expect(results.violations.map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(" ")).join(", ")}`)).toEqual([]);
    await context.close();
  });
}
