import { expect, test } from "@playwright/test";
import { DEMO_ACCOUNTS, signInThroughApi, signInThroughPage } from "./support/staff";

const NAV_BY_ROLE = {
  communications: ["Overview", "Questions", "Reply snippets"],
  facilities: ["Overview", "Facilities check", "Rooms", "CO2 readings", "Building work"],
  admin: ["Overview", "Questions", "Facilities check", "Reply snippets", "Rooms", "CO2 readings", "Building work", "Staff accounts", "Settings"],
} as const;

test("an anonymous visitor sent to /staff lands on sign-in", async ({ page }) => {
  await page.goto("/staff");
  await expect(page).toHaveURL(/\/signin\?callbackUrl=%2Fstaff/);
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("Sign in to the question desk");
});

for (const [role, email] of Object.entries(DEMO_ACCOUNTS) as [keyof typeof NAV_BY_ROLE, string][]) {
  test(`${role} signs in and sees its own staff navigation`, async ({ page }) => {
    await signInThroughPage(page, email);
    const nav = page.getByRole("navigation", { name: "Staff" });
    await expect(nav.getByRole("link")).toHaveText([...NAV_BY_ROLE[role]]);
    await expect(page.getByTestId("staff-role")).toBeVisible();
  });
}

test("a wrong password gets a clear message and no session", async ({ page }) => {
  await page.goto("/signin");
  await page.getByLabel("E-mail").fill(DEMO_ACCOUNTS.communications);
  await page.getByLabel("Password").fill("not-the-password");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.locator("#sign-in-failure")).toHaveText("That e-mail and password do not match an active staff account.");
  const me = await page.request.get("/api/staff/me");
  expect(me.status()).toBe(401);
});

test("a communications user is refused the admin pages and admin-only route handlers", async ({ page }) => {
  await signInThroughPage(page, DEMO_ACCOUNTS.communications);
  const list = await page.request.get("/api/staff/users");
  expect(list.status()).toBe(403);
  const create = await page.request.post("/api/staff/users", {
    data: { name: "Someone New", email: "new.person@example.org", role: "admin", password: "a-long-enough-password" },
  });
  expect(create.status()).toBe(403);
  await page.goto("/staff/users");
  await expect(page).toHaveURL(/\/staff\/not-allowed/);
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("This page is not part of your role");
});

test("facilities cannot open the question list; signing out ends the session", async ({ page }) => {
  await signInThroughPage(page, DEMO_ACCOUNTS.facilities);
  await page.goto("/staff/desk");
  await expect(page).toHaveURL(/\/staff\/not-allowed/);
  await page.getByRole("button", { name: "Sign out" }).click();
  await expect(page).toHaveURL(/\/signin/);
  expect((await page.request.get("/api/staff/me")).status()).toBe(401);
});

test("the admin adds an account, turns it off, and it can no longer sign in", async ({ page, browser }) => {
  const email = `temp.${Date.now()}@example.org`;
  await signInThroughPage(page, DEMO_ACCOUNTS.admin);
  await page.goto("/staff/users");
  await page.getByLabel("Name", { exact: true }).fill("Avery Lindqvist");
  await page.getByLabel("E-mail", { exact: true }).fill(email);
  await page.getByLabel("Role", { exact: true }).selectOption("facilities");
  await page.getByLabel("First password").fill("temporary-pass-123");
  await page.getByRole("button", { name: "Add staff member" }).click();
  await expect(page.getByRole("status").filter({ hasText: "Account for Avery Lindqvist created" })).toBeVisible();

  // While active, the new account signs in.
  const other = await browser.newContext();
  expect(await signInThroughApi(other.request, email, "temporary-pass-123")).toBe(200);
  expect((await other.request.get("/api/staff/me")).status()).toBe(200);

  await page.reload();
  const row = page.getByTestId(`account-${email}`);
  await row.getByRole("button", { name: "Turn off Avery Lindqvist's account" }).click();
  await expect(row.getByText("Turned off")).toBeVisible();

  // The live session stops working at once, and a new sign-in is refused.
  expect((await other.request.get("/api/staff/me")).status()).toBe(401);
  const fresh = await browser.newContext();
  await signInThroughApi(fresh.request, email, "temporary-pass-123");
  expect((await fresh.request.get("/api/staff/me")).status()).toBe(401);
  await other.close();
  await fresh.close();
});

test("the last active administrator cannot be turned off or demoted", async ({ page }) => {
  await signInThroughPage(page, DEMO_ACCOUNTS.admin);
  const { users } = (await (await page.request.get("/api/staff/users")).json()) as { users: { id: number; email: string }[] };
  const me = users.find((u) => u.email === DEMO_ACCOUNTS.admin)!;
  const demote = await page.request.patch(`/api/staff/users/${me.id}`, { data: { role: "communications" } });
  expect(demote.status()).toBe(409);
  const disable = await page.request.patch(`/api/staff/users/${me.id}`, { data: { disabled: true } });
  expect(disable.status()).toBe(409);
  expect((await page.request.get("/api/staff/me")).status()).toBe(200);
});

test("password guessing is slowed: after five failures even the right password waits", async ({ page, playwright, baseURL }) => {
  const email = `guess.${Date.now()}@example.org`;
  const admin = await playwright.request.newContext({ baseURL });
  expect(await signInThroughApi(admin, DEMO_ACCOUNTS.admin)).toBe(200);
  const created = await admin.post("/api/staff/users", { data: { name: "Sam Okonkwo-Hale", email, role: "communications", password: "right-password-123" } });
  expect(created.status()).toBe(201);
  await admin.dispose();

  const guesser = await playwright.request.newContext({ baseURL });
  for (let i = 0; i < 5; i++) await signInThroughApi(guesser, email, `wrong-guess-${i}`);
  await signInThroughApi(guesser, email, "right-password-123");
  expect((await guesser.get("/api/staff/me")).status()).toBe(401);
  await guesser.dispose();

  await page.goto("/signin");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill("right-password-123");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.locator("#sign-in-failure")).toContainText("Too many failed attempts");
});
