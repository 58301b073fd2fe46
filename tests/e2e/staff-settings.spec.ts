import AxeBuilder from "@axe-core/playwright";
import { expect, test, type Page } from "@playwright/test";
import { isoDateInTimeZone, replyDueDate } from "../../lib/school-days/calendar";
import { formatIsoDateLong } from "../../lib/school-days/format";
import { DEMO_ACCOUNTS, signInThroughPage } from "./support/staff";

// The administrator's Settings page. These tests change district settings on the shared
// e2e database, so they run in order and the last one puts every value back as seeded.
test.describe.configure({ mode: "serial" });

const SPRING_BREAK = ["2027-04-16", "2027-04-19", "2027-04-20", "2027-04-21", "2027-04-22", "2027-04-23"];

async function openSettings(page: Page) {
  await page.goto("/staff/settings");
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("Settings");
}

/** The saved calendar as the page lists it. */
const listedDates = (page: Page) => page.getByTestId("holiday-list").locator("input[data-date]").evaluateAll((els) => els.map((e) => (e as HTMLInputElement).value));

async function expectAccessible(page: Page) {
  const results = await new AxeBuilder({ page }).withTags(["wcag2a", "wcag2aa", "wcag21a", "wcag21aa"]).analyze();
  expect(results.violations.map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(" ")).join(", ")}`)).toEqual([]);
}

for (const role of ["communications", "facilities"] as const) {
  test(`${role} opening /staff/settings is sent to /staff/not-allowed`, async ({ page }) => {
    await signInThroughPage(page, DEMO_ACCOUNTS[role]);
    await expect(page.getByRole("navigation", { name: /staff/i }).getByRole("link", { name: "Settings" })).toHaveCount(0);
    await page.goto("/staff/settings");
    await expect(page).toHaveURL(/\/staff\/not-allowed\?from=%2Fstaff%2Fsettings$/);
    await expect(page.getByRole("heading", { level: 1 })).toHaveText("This page is not part of your role");
  });
}

test("the page passes axe (WCAG 2.1 A and AA) and fits a 320 px screen", async ({ page }) => {
  await signInThroughPage(page, DEMO_ACCOUNTS.admin);
  await openSettings(page);
  await expect(page.getByText("A search for any word in a group also finds answers that use the others.")).toBeVisible();
  await expectAccessible(page);
  await page.screenshot({ path: `${process.env.E2E_DIR ?? "test-results"}/settings-desktop.png`, fullPage: true });

  await page.setViewportSize({ width: 320, height: 800 });
  await openSettings(page);
  const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
  expect(overflow).toBeLessThanOrEqual(0);
  const shots = process.env.E2E_DIR ?? "test-results";
  await page.screenshot({ path: `${shots}/settings-320.png`, fullPage: true });
  for (const id of ["reply", "calendar", "synonyms"]) {
    await page.locator(`section[aria-labelledby="${id}"]`).screenshot({ path: `${shots}/settings-320-${id}.png` });
  }
});

test("the admin adds a break: its weekdays are listed under their year with the name, weekends left out", async ({ page }) => {
  await signInThroughPage(page, DEMO_ACCOUNTS.admin);
  await openSettings(page);
  const before = await listedDates(page);
  await page.getByLabel("First day", { exact: true }).fill("2027-04-16");
  await page.getByLabel("Last day, for a break (optional)").fill("2027-04-23");
  await page.getByLabel("Name (optional)").fill("Spring break");
  await page.getByRole("button", { name: "Add to the calendar" }).click();
  await expect(page.getByRole("status").filter({ hasText: "Added 6 weekdays" })).toContainText(
    "Added 6 weekdays from Friday, April 16, 2027 to Friday, April 23, 2027 as “Spring break”.",
  );

  const year = page.getByRole("group", { name: /^2027/ });
  await expect(year.getByRole("checkbox", { name: "Monday, April 19 — Spring break" })).toBeVisible();
  await expect(year.getByRole("checkbox", { name: "Friday, April 23 — Spring break" })).toBeVisible();
  await expect(year.getByRole("checkbox", { name: /Saturday, April 17/ })).toHaveCount(0);
  const after = await listedDates(page);
  expect(after).toEqual([...new Set([...before, ...SPRING_BREAK])].sort());

  await page.reload();
  expect(await listedDates(page)).toEqual(after);
});

test("the admin changes the reply target and the worked example follows the saved calendar", async ({ page }) => {
  await signInThroughPage(page, DEMO_ACCOUNTS.admin);
  await openSettings(page);
  const holidays = await listedDates(page);
  const today = isoDateInTimeZone(new Date(), "America/New_York");
  const due = page.getByTestId("reply-example-due");
  await expect(due).toHaveText(formatIsoDateLong(replyDueDate(today, 3, { holidays })));

  await page.getByLabel("Reply due after (school days)").fill("12");
  const expected = formatIsoDateLong(replyDueDate(today, 12, { holidays }));
  await expect(due).toHaveText(expected);
  await expect(page.getByTestId("reply-example")).toContainText("Worked example (not saved yet)");
  await page.getByRole("button", { name: "Save reply target" }).click();
  await expect(page.getByRole("status").filter({ hasText: "Saved." })).toHaveText(
    "Saved. Replies are due 12 school days after a question arrives, counted in America/New_York.",
  );
  await expect(page.getByTestId("reply-example").getByRole("heading")).toHaveText("Worked example");

  await page.reload();
  await expect(page.getByLabel("Reply due after (school days)")).toHaveValue("12");
  await expect(page.getByTestId("reply-example-sentence")).toHaveText(`A question that arrives today, ${formatIsoDateLong(today)}, is due on ${expected}.`);
  await page.goto("/ask");
  await expect(page.getByText(/within 12 school days/).first()).toBeVisible();
});

test("bad input shows a clear message by the field, is announced, and changes nothing", async ({ page }) => {
  await signInThroughPage(page, DEMO_ACCOUNTS.admin);
  await openSettings(page);
  const target = page.getByLabel("Reply due after (school days)");
  await target.fill("99");
  await page.getByRole("button", { name: "Save reply target" }).click();
  await expect(target).toHaveAttribute("aria-invalid", "true");
  await expect(target).toBeFocused();
  await expect(page.locator("#reply-target-error")).toHaveText("! Enter a whole number of school days from 0 to 60.");
  await expect(target).toHaveAttribute("aria-describedby", /reply-target-error/);

  const zone = page.getByLabel("District time zone");
  await target.fill("12");
  await zone.fill("Wrenmoor/Valley");
  await page.getByRole("button", { name: "Save reply target" }).click();
  await expect(page.locator("#reply-time-zone-error")).toContainText("“Wrenmoor/Valley” is not a time zone name.");

  const before = await listedDates(page);
  const first = page.getByLabel("First day", { exact: true });
  await first.fill("2026-02-30");
  await page.getByRole("button", { name: "Add to the calendar" }).click();
  await expect(first).toHaveAttribute("aria-invalid", "true");
  await expect(page.locator("#holiday-from-error")).toHaveText("! 2026-02-30 is not a date: February 2026 has 28 days.");
  await first.fill("2026-12-19");
  await page.getByRole("button", { name: "Add to the calendar" }).click();
  await expect(page.locator("#holiday-from-error")).toContainText("Saturday, December 19, 2026 is a weekend day.");

  await page.getByRole("button", { name: "Remove the ticked days" }).click();
  await expect(page.getByRole("alert").filter({ hasText: "Tick at least one day to remove." })).toBeVisible();

  await page.getByLabel("New group: words that mean the same, separated by commas").fill("cooling, chiller");
  await page.getByRole("button", { name: "Add the group" }).click();
  await expect(page.locator("#synonym-new-error")).toContainText("“cooling” is already in the group “ac, air conditioning, air conditioner, cooling”.");

  await expectAccessible(page);

  await page.reload();
  await expect(page.getByLabel("Reply due after (school days)")).toHaveValue("12");
  await expect(page.getByLabel("District time zone")).toHaveValue("America/New_York");
  expect(await listedDates(page)).toEqual(before);
  await expect(page.getByTestId("synonym-groups").getByRole("listitem").filter({ hasText: "chiller" })).toHaveCount(0);
});

test("the admin adds, changes and removes a synonym group, then puts back the starting list", async ({ page }) => {
  await signInThroughPage(page, DEMO_ACCOUNTS.admin);
  await openSettings(page);
  const groups = page.getByTestId("synonym-groups");
  const rows = groups.locator(":scope > li");
  await expect(rows).toHaveCount(4);

  await page.getByLabel("New group: words that mean the same, separated by commas").fill("Bus, school bus");
  await page.getByRole("button", { name: "Add the group" }).click();
  await expect(page.locator("#synonym-status")).toHaveText("Added the group “bus, school bus”.");
  await expect(rows).toHaveCount(5);
  await expect(groups.getByRole("list", { name: "Group: bus, school bus" })).toBeVisible();

  await page.getByRole("button", { name: "Change the group bus, school bus" }).click();
  const edit = page.getByLabel("Words in this group, separated by commas");
  await expect(edit).toBeFocused();
  await expect(edit).toHaveValue("bus, school bus");
  await edit.fill("bus, school bus, transportation");
  await page.getByRole("button", { name: "Save the group" }).click();
  await expect(page.locator("#synonym-status")).toHaveText("Saved the group “bus, school bus, transportation”.");
  await expect(groups.getByRole("list", { name: "Group: bus, school bus, transportation" })).toBeVisible();

  await page.reload();
  await expect(groups.getByRole("list", { name: "Group: bus, school bus, transportation" })).toBeVisible();
  await page.getByRole("button", { name: "Remove the group mask, face covering, face mask" }).click();
  await expect(page.locator("#synonym-status")).toHaveText("Removed the group “mask, face covering, face mask”.");
  await expect(rows).toHaveCount(4);

  await page.getByRole("button", { name: "Put back the starting list…" }).click();
  await page.getByRole("button", { name: "Yes, put back the starting list" }).click();
  await expect(page.locator("#synonym-status")).toHaveText("The list is back to the 4 groups Clearhall starts with.");
  await expect(groups.getByRole("list", { name: "Group: mask, face covering, face mask" })).toBeVisible();
  await expect(groups.getByText("transportation")).toHaveCount(0);
});

test("the admin removes ticked days and puts the reply target back", async ({ page }) => {
  await signInThroughPage(page, DEMO_ACCOUNTS.admin);
  await openSettings(page);
  const year = page.getByRole("group", { name: /^2027/ });
  for (const name of ["Friday, April 16", "Monday, April 19", "Tuesday, April 20", "Wednesday, April 21", "Thursday, April 22", "Friday, April 23"]) {
    await year.getByRole("checkbox", { name: `${name} — Spring break` }).check();
  }
  await page.getByRole("button", { name: "Remove the 6 ticked days" }).click();
  // No room has CO2 readings in April 2027, so the message says nothing about recounting them.
  await expect(page.getByRole("status").filter({ hasText: "Removed" })).toHaveText("Removed 6 days. They count as school days again.");
  await expect(year.getByRole("checkbox", { name: /Spring break/ })).toHaveCount(0);
  const dates = await listedDates(page);
  for (const d of SPRING_BREAK) expect(dates).not.toContain(d);

  await page.getByLabel("Reply due after (school days)").fill("3");
  await page.getByRole("button", { name: "Save reply target" }).click();
  await expect(page.getByRole("status").filter({ hasText: "Saved." })).toContainText("due 3 school days");
});
