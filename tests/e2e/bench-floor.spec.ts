import { expect, test } from "@playwright/test";
import { expectNoAxeViolations } from "./support/a11y";

// The empty page `npm run bench` measures the framework against (scripts/bench/lib/app-server.ts):
// static, kept out of search engines and the sitemap, and still an accessible page.
test("the benchmarks' empty page is static, not indexed, not in the sitemap, and accessible", async ({ browser, request }) => {
  const response = await request.get("/bench/empty");
  expect(response.status()).toBe(200);
  // Served from the prerendered file, like any static page.
  expect(response.headers()["x-nextjs-cache"] ?? response.headers()["x-nextjs-prerender"]).toBeTruthy();

  const sitemap = await (await request.get("/sitemap.xml")).text();
  expect(sitemap).not.toContain("/bench/");

  const context = await browser.newContext();
  const page = await context.newPage();
  await page.goto("/bench/empty");
  await expect(page.locator('meta[name="robots"]')).toHaveAttribute("content", /noindex/);
  await expect(page.locator("h1")).toHaveCount(1);
  await expect(page.getByRole("main")).toHaveCount(1);
  await expectNoAxeViolations(page, "/bench/empty");
  await page.keyboard.press("Tab");
  await expect(page.getByRole("link", { name: "Skip to main content" })).toBeFocused();
  await page.keyboard.press("Enter");
  await expect(page.getByRole("main")).toBeFocused();
  await context.close();
});
