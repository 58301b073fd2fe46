import { expect, test, type Page } from "@playwright/test";
import { DEMO_ACCOUNTS, DEMO_PASSWORD, signInThroughPage } from "./support/staff";

function expectSecurityHeaders(headers: Record<string, string>, what: string): void {
  const csp = headers["content-security-policy"] ?? "";
  expect(csp, what).toContain("default-src 'self'");
  expect(csp, what).toContain("frame-ancestors 'none'");
  expect(csp, what).toContain("object-src 'none'");
  expect(csp, what).toContain("base-uri 'self'");
  expect(csp, what).toContain("form-action 'self'");
  expect(headers["x-content-type-options"], what).toBe("nosniff");
  expect(headers["referrer-policy"], what).toBe("strict-origin-when-cross-origin");
  expect(headers["x-frame-options"], what).toBe("DENY");
  expect(headers["permissions-policy"], what).toContain("camera=()");
  expect(headers["x-powered-by"], what).toBeUndefined();
}

for (const path of ["/", "/schools/eastmere/air", "/ask", "/signin", "/api/staff/me", "/api/answers/suggestions", "/no-such-page", "/ask/status/not-a-token"]) {
  test(`${path} sends the security headers`, async ({ request }) => {
    const response = await request.get(path, { maxRedirects: 0 });
    expectSecurityHeaders(response.headers(), path);
  });
}

test("error answers and static files carry the headers too", async ({ request, page }) => {
  const refused = await request.post("/api/questions", { headers: { "x-forwarded-for": "203.0.113.120" }, data: { school: "nowhere" } });
  expect(refused.status()).toBe(400);
  expectSecurityHeaders(refused.headers(), "POST /api/questions 400");

  await page.goto("/");
  const stylesheet = await page.locator('link[rel="stylesheet"]').first().getAttribute("href");
  expect(stylesheet).toMatch(/^\/_next\/static\//);
  const css = await request.get(stylesheet!);
  expect(css.ok()).toBe(true);
  expectSecurityHeaders(css.headers(), stylesheet!);
});

test("the private status page keeps its address out of Referer headers and search engines", async ({ request }) => {
  const created = await request.post("/api/questions", {
    headers: { "x-forwarded-for": "203.0.113.121" },
    data: { school: "eastmere", topic: "air", question: "Is the gym ventilated during indoor practice?", email: `referrer.${Date.now()}@example.net` },
  });
  expect(created.status()).toBe(201);
  const { statusUrl } = (await created.json()) as { statusUrl: string };
  const html = await (await request.get(new URL(statusUrl).pathname)).text();
  expect(html).toMatch(/<meta name="referrer" content="no-referrer"/);
  expect(html).toMatch(/<meta name="robots" content="[^"]*noindex/);
});

/** Collects Content-Security-Policy violations the page reports, from the first script on. */
async function watchCspViolations(page: Page): Promise<string[]> {
  const violations: string[] = [];
  await page.exposeFunction("reportCspViolation", (text: string) => violations.push(text));
  await page.addInitScript(() => {
    document.addEventListener("securitypolicyviolation", (event) => {
      (window as unknown as { reportCspViolation: (t: string) => void }).reportCspViolation(`${event.violatedDirective} blocked ${event.blockedURI} on ${location.pathname}`);
    });
  });
  page.on("console", (message) => {
    if (/Content Security Policy/i.test(message.text())) violations.push(message.text());
  });
  return violations;
}

test("the public pages work under the Content-Security-Policy: no violations, and client code runs", async ({ page }) => {
  const violations = await watchCspViolations(page);
  await page.goto("/signin");
  // The sign-in form's validation is client code: it only answers if scripts ran.
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByText("Enter the e-mail address of your staff account.")).toBeVisible();
  await page.goto("/district/signs-and-routes");
  const sign = page.locator('img[src="/signs/one-way.svg"]');
  await expect(sign).toBeVisible();
  expect(await sign.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth > 0)).toBe(true);
  // Fonts are self-hosted and allowed by font-src 'self'.
  await page.goto("/schools/eastmere/air");
  expect(await page.evaluate(async () => (await document.fonts.ready, [...document.fonts].some((f) => f.status === "loaded")))).toBe(true);
  // The ask page fetches published answers to suggest while the parent types (connect-src 'self').
  const suggestions = page.waitForResponse((r) => r.url().includes("/api/answers/suggestions"));
  await page.goto("/ask");
  await page.getByLabel("Your question", { exact: true }).fill("When is the roof work at Eastmere finished?");
  expect((await suggestions).status()).toBe(200);
  expect(violations).toEqual([]);
});

test("the staff pages work under the Content-Security-Policy: the desk loads its questions through the API", async ({ page }) => {
  const violations = await watchCspViolations(page);
  await signInThroughPage(page, DEMO_ACCOUNTS.admin);
  const queue = page.waitForResponse((r) => new URL(r.url()).pathname === "/api/staff/questions");
  await page.goto("/staff/desk");
  expect((await queue).status()).toBe(200);
  for (const path of ["/staff/rooms", "/staff/readings", "/staff/users"]) {
    await page.goto(path);
    await expect(page.getByRole("heading", { level: 1 })).toBeVisible();
  }
  expect(violations).toEqual([]);
});

test("a real sign-in over http sets the session cookie httpOnly and SameSite=Lax, and not Secure", async ({ request }) => {
  const csrf = await request.get("/api/auth/csrf");
  const { csrfToken } = (await csrf.json()) as { csrfToken: string };
  const csrfCookie = csrf.headersArray().find((h) => h.name.toLowerCase() === "set-cookie" && h.value.startsWith("next-auth.csrf-token="));
  expect(csrfCookie?.value).toMatch(/;\s*HttpOnly/i);
  expect(csrfCookie?.value).toMatch(/;\s*SameSite=Lax/i);

  const response = await request.post("/api/auth/callback/credentials", {
    form: { csrfToken, email: DEMO_ACCOUNTS.facilities, password: DEMO_PASSWORD, json: "true" },
    maxRedirects: 0,
  });
  expect(response.status()).toBe(200);
  const session = response.headersArray().find((h) => h.name.toLowerCase() === "set-cookie" && h.value.startsWith("next-auth.session-token="));
  expect(session, "a session cookie is set").toBeDefined();
  const attributes = session!.value.split(";").map((a) => a.trim().toLowerCase());
  expect(attributes).toContain("httponly");
  expect(attributes).toContain("samesite=lax");
  expect(attributes).toContain("path=/");
  // APP_URL is http in the tests; with an https APP_URL the cookie is Secure (tests/unit/session-cookie.test.ts).
  expect(attributes).not.toContain("secure");
  expect((await request.get("/api/staff/me")).status()).toBe(200);
});

test("page scripts cannot read the session cookie", async ({ page }) => {
  await signInThroughPage(page, DEMO_ACCOUNTS.communications);
  const cookies = await page.context().cookies();
  expect(cookies.find((c) => c.name === "next-auth.session-token")).toMatchObject({ httpOnly: true, sameSite: "Lax" });
  expect(await page.evaluate(() => document.cookie)).not.toContain("next-auth.session-token");
});
