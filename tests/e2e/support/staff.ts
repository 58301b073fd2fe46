import { expect, type APIRequestContext, type Page } from "@playwright/test";

export const DEMO_PASSWORD = "clearhall-demo";
export const DEMO_ACCOUNTS = {
  communications: "comms@example.org",
  facilities: "facilities@example.org",
  admin: "admin@example.org",
} as const;

/** Signs in through the real sign-in page, as a person would. */
export async function signInThroughPage(page: Page, email: string, password = DEMO_PASSWORD): Promise<void> {
  await page.goto("/signin");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page).toHaveURL(/\/staff$/);
}

/** Signs in with next-auth's own routes (csrf, then callback/credentials), as any HTTP client can. */
export async function signInThroughApi(request: APIRequestContext, email: string, password = DEMO_PASSWORD): Promise<number> {
  const { csrfToken } = (await (await request.get("/api/auth/csrf")).json()) as { csrfToken: string };
  const response = await request.post("/api/auth/callback/credentials", {
    form: { csrfToken, email, password, json: "true" },
    maxRedirects: 0,
  });
  return response.status();
}

export async function sessionRole(request: APIRequestContext): Promise<string | null> {
  const response = await request.get("/api/staff/me");
  if (!response.ok()) return null;
  return ((await response.json()) as { user: { role: string } }).user.role;
}
