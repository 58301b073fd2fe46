import { expect, test } from "@playwright/test";

for (const path of ["/", "/schools/eastmere/air", "/signin", "/api/staff/me"]) {
  test(`${path} sends the security headers`, async ({ request }) => {
    const response = await request.get(path, { maxRedirects: 0 });
    const headers = response.headers();
    expect(headers["content-security-policy"]).toContain("frame-ancestors 'none'");
    expect(headers["content-security-policy"]).toContain("object-src 'none'");
    expect(headers["x-content-type-options"]).toBe("nosniff");
    expect(headers["referrer-policy"]).toBe("strict-origin-when-cross-origin");
    expect(headers["x-frame-options"]).toBe("DENY");
    expect(headers["x-powered-by"]).toBeUndefined();
  });
}

test("the pages work under the Content-Security-Policy: no violations, and client code runs", async ({ page }) => {
  const violations: string[] = [];
  page.on("console", (message) => {
    if (/Content Security Policy/i.test(message.text())) violations.push(message.text());
  });
  await page.goto("/signin");
  // The sign-in form's validation is client code: it only answers if scripts ran.
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByText("Enter the e-mail address of your staff account.")).toBeVisible();
  await page.goto("/district/signs-and-routes");
  const sign = page.locator('img[src="/signs/one-way.svg"]');
  await expect(sign).toBeVisible();
  expect(await sign.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth > 0)).toBe(true);
  expect(violations).toEqual([]);
});
