import AxeBuilder from "@axe-core/playwright";
import { expect, test, type APIRequestContext, type Browser, type BrowserContext, type Page } from "@playwright/test";
import { mailTo, type CaughtMail } from "./support/mail";
import { DEMO_ACCOUNTS, signInThroughApi, signInThroughPage } from "./support/staff";

// The desk's screens as staff use them: the queue, the question page with its editor, the
// facilities check, snippets, and what reaches families by e-mail and on the answers page.

const A11Y_TAGS = ["wcag2a", "wcag2aa", "wcag21a", "wcag21aa"];

async function axeViolations(page: Page): Promise<string[]> {
  const results = await new AxeBuilder({ page }).withTags(A11Y_TAGS).analyze();
  return results.violations.map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(" ")).join(", ")}`);
}

/** Presses Tab until the element is focused: the keyboard is the only way in. */
async function tabTo(page: Page, selector: string, maxPresses = 120): Promise<void> {
  for (let i = 0; i < maxPresses; i += 1) {
    if (await page.locator(selector).evaluate((el) => el === document.activeElement)) return;
    await page.keyboard.press("Tab");
  }
  throw new Error(`could not reach ${selector} with the Tab key`);
}

/** A staff member in a browser context of their own, signed in through the real sign-in page. */
async function staffPage(browser: Browser, role: keyof typeof DEMO_ACCOUNTS, viewport = { width: 1280, height: 900 }): Promise<{ context: BrowserContext; page: Page }> {
  const context = await browser.newContext({ viewport });
  const page = await context.newPage();
  await signInThroughPage(page, DEMO_ACCOUNTS[role]);
  return { context, page };
}

/** Asks a question as a family does, each test from its own address (RFC 5737 range) so rate limits never meet. */
async function ask(request: APIRequestContext, ip: string, data: { school: string; topic: string; question: string; email: string }): Promise<string> {
  const response = await request.post("/api/questions", { headers: { "x-forwarded-for": ip }, data });
  expect(response.status(), await response.text()).toBe(201);
  return ((await response.json()) as { reference: string }).reference;
}

/** The question's id, read from the queue API as communications. */
async function questionId(request: APIRequestContext, reference: string): Promise<{ id: number; state: string }> {
  const response = await request.get(`/api/staff/questions?state=all&q=${encodeURIComponent(reference)}`);
  expect(response.status()).toBe(200);
  const { items } = (await response.json()) as { items: { id: number; reference: string; state: string }[] };
  const item = items.find((i) => i.reference === reference);
  expect(item, `${reference} in the queue`).toBeTruthy();
  return { id: item!.id, state: item!.state };
}

async function waitForMail(address: string, subject: RegExp, timeoutMs = 20_000): Promise<CaughtMail> {
  let found: CaughtMail | undefined;
  await expect
    .poll(
      async () => {
        found = (await mailTo(address)).find((m) => subject.test(m.subject));
        return Boolean(found);
      },
      { timeout: timeoutMs, message: `no e-mail "${subject}" reached ${address}` },
    )
    .toBe(true);
  return found!;
}

/** The table shows the last view while the next one loads (marked aria-busy): wait until it shows the new one. */
async function settled(page: Page) {
  await expect(page.getByTestId("queue-summary")).not.toHaveText("Loading questions…");
  await expect(page.locator('[aria-busy="true"]')).toHaveCount(0);
}

const status = (page: Page) => page.getByTestId("desk-status");
const stateOf = (page: Page) => page.getByTestId("question-state");

async function openQuestion(page: Page, id: number) {
  await page.goto(`/staff/desk/${id}`);
  await expect(page.getByTestId("question-body")).toBeVisible();
}

test("the whole path: a technical answer is drafted, sent back by facilities, fixed, approved, sent and published", async ({ browser }) => {
  test.setTimeout(120_000);
  const comms = await staffPage(browser, "communications");
  const facilities = await staffPage(browser, "facilities");
  const c = comms.page;
  const f = facilities.page;

  // Q-2026-0003 in the demo data: Eastmere, building work (technical by its topic), asked by Jonah Perrault.
  let reference = "Q-2026-0003";
  let asker = "jonah.perrault@example.net";
  const seeded = await questionId(c.request, reference);
  if (seeded.state !== "received") {
    // A retry after the demo question was answered: the same path on a fresh building question.
    asker = `generator.parent.${Date.now()}@example.net`;
    reference = await ask(c.request, "203.0.113.90", {
      school: "eastmere",
      topic: "building",
      question: "If the power goes out during a storm, does the new generator keep the whole school running, including the heating?",
      email: asker,
    });
  }

  // Communications finds it in the queue by its reference and opens it.
  await c.goto("/staff/desk");
  await c.getByLabel("Words or reference").fill(reference);
  await c.getByRole("button", { name: "Search" }).click();
  await expect(c).toHaveURL(new RegExp(`q=${reference}`));
  const row = c.getByTestId("queue-row").filter({ hasText: reference });
  await expect(row).toHaveCount(1);
  await expect(row).toContainText("Needed");
  await row.getByRole("link", { name: reference }).click();
  await expect(c).toHaveURL(/\/staff\/desk\/\d+$/);
  await expect(c.getByRole("heading", { level: 1 })).toContainText(reference);
  await expect(stateOf(c)).toContainText("New");
  await expect(c.getByTestId("technical")).toContainText("Building work questions always need one");
  await expect(c.getByLabel("Technical: facilities check the answer first")).toBeDisabled();

  await c.getByRole("button", { name: "Assign to me" }).click();
  await expect(status(c)).toContainText("Assigned to you.");
  await expect(c.getByTestId("assignee")).toContainText("You (Priya Vandermolen)");

  // The editor: a technical answer offers the facilities check instead of Send.
  const answer = c.getByLabel("Answer (Markdown)");
  await answer.fill("Yes. The new generator at Eastmere runs the **whole school**, including the heating.");
  await expect(c.getByTestId("answer-preview").locator("strong")).toHaveText("whole school");
  await expect(c.getByTestId("reading-grade")).toContainText("Grade");
  await c.getByLabel(/The question for the answers page/).fill("Does the new generator at Eastmere keep the school running in a power cut?");
  await expect(c.getByRole("button", { name: "Send reply" })).toHaveCount(0);
  await c.getByRole("button", { name: "Save draft" }).click();
  await expect(status(c)).toContainText("Draft saved");
  await expect(stateOf(c)).toContainText("Being written");
  await expect(c.getByTestId("revisions").locator("li")).toHaveCount(1);
  await c.getByRole("button", { name: "Send to facilities for a check" }).click();
  await expect(status(c)).toContainText("Sent to facilities for a check");
  await expect(stateOf(c)).toContainText("With facilities for a check");
  await expect(c.getByLabel("Answer (Markdown)")).toHaveCount(0);

  // Facilities see it waiting, read the draft and send it back; a comment is required.
  await f.goto("/staff/check");
  const check = f.getByRole("link", { name: `Check ${reference}` });
  await expect(check).toBeVisible();
  await check.click();
  await expect(f.getByTestId("draft-read")).toContainText("runs the whole school, including the heating");
  await f.getByRole("button", { name: "Send back with a comment" }).click();
  await expect(f.getByTestId("review-panel").getByText(/^! Say what needs to change\.$/)).toBeVisible();
  await expect(f.getByLabel("Comment for communications")).toHaveAttribute("aria-invalid", "true");
  const comment = "The generator runs the boiler controls, the fire alarm and the hall lights, not every classroom. Please say so.";
  await f.getByLabel("Comment for communications").fill(comment);
  await f.getByRole("button", { name: "Send back with a comment" }).click();
  await expect(status(f)).toContainText("Sent back to communications");
  await expect(stateOf(f)).toContainText("Sent back by facilities");

  // Communications read the comment in the history, fix the draft and send it to the check again.
  await c.reload();
  await expect(stateOf(c)).toContainText("Sent back by facilities");
  await expect(c.getByTestId("history")).toContainText(comment);
  await expect(c.getByTestId("sent-back-comment")).toHaveText(comment);
  const fixed =
    "Yes, for what matters most. The new generator at Eastmere runs the boiler controls, so the heating stays on. It also runs the fire alarm and the hall lights. It does not run every classroom.";
  await c.getByLabel("Answer (Markdown)").fill(fixed);
  await c.getByRole("button", { name: "Send to facilities for a check" }).click();
  await expect(status(c)).toContainText("Sent to facilities for a check");
  await expect(stateOf(c)).toContainText("With facilities for a check");
  await expect(c.getByTestId("revisions").locator("li")).toHaveCount(2);

  // Facilities approve the fixed answer.
  await f.goto("/staff/check");
  await f.getByRole("link", { name: `Check ${reference}` }).click();
  await expect(f.getByTestId("draft-read")).toContainText("It does not run every classroom.");
  await f.getByRole("button", { name: "Approve the answer" }).click();
  await expect(status(f)).toContainText("Approved");
  await expect(stateOf(f)).toContainText("Checked, ready to send");
  await f.goto("/staff/check");
  await expect(f.getByRole("link", { name: `Check ${reference}` })).toHaveCount(0);

  // Communications send the reply (with a confirmation first), then publish a public version.
  await c.reload();
  await expect(stateOf(c)).toContainText("Checked, ready to send");
  await c.getByRole("button", { name: "Send reply" }).click();
  await expect(c.getByRole("group", { name: "Send the reply now?" })).toContainText(asker);
  await c.getByRole("button", { name: "Yes, send the reply" }).click();
  await expect(status(c)).toContainText(`Reply sent to ${asker}`);
  await expect(stateOf(c)).toContainText("Answered");
  await expect(c.getByTestId("reply-sent")).toContainText("Sent");
  await expect(c.getByRole("region", { name: "The reply sent" })).toContainText("It does not run every classroom.");

  const publish = c.getByTestId("publish-panel");
  await expect(publish.getByLabel("Question as the public will read it")).toHaveValue("Does the new generator at Eastmere keep the school running in a power cut?");
  await expect(publish.getByLabel("School")).toHaveValue(/^\d+$/);
  await expect(publish.getByLabel("Topic")).toHaveValue("building");
  await publish.getByRole("button", { name: "Publish on the answers page" }).click();
  await expect(status(c)).toContainText(/Published on the answers page: \/answers\/\d+/);
  const link = publish.getByTestId("publication-link");
  await expect(link).toHaveText("Does the new generator at Eastmere keep the school running in a power cut?");
  const publicPath = await link.getAttribute("href");
  expect(publicPath).toMatch(/^\/answers\/\d+$/);
  await expect(c.getByTestId("history")).toContainText("Published on the answers page");

  // The reply reached the asker, with the answer and the private status link.
  const mail = await waitForMail(asker, new RegExp(`Our answer to your question ${reference}`));
  expect(mail.text).toContain("It does not run every classroom.");
  expect(mail.text).toMatch(/\/ask\/status\/[A-Za-z0-9_-]{43}/);
  expect(mail.text).not.toContain(comment);

  // The public page shows the rewritten question and the approved answer, never the asker.
  const pub = await browser.newContext();
  const reader = await pub.newPage();
  const response = await reader.goto(publicPath!);
  expect(response?.status()).toBe(200);
  await expect(reader.getByRole("heading", { level: 1 })).toHaveText("Does the new generator at Eastmere keep the school running in a power cut?");
  await expect(reader.locator("article")).toContainText("It does not run every classroom.");
  expect(await reader.content()).not.toContain(asker);
  const list = await reader.goto("/answers");
  if (list?.status() === 200) await expect(reader.locator("main")).toContainText("Does the new generator at Eastmere keep the school running in a power cut?");
  await pub.close();
  await comms.context.close();
  await facilities.context.close();
});

test("the queue's filters, sort, search and pages update the table and the address, and new questions appear without a reload", async ({ browser }) => {
  test.setTimeout(90_000);
  const { context, page } = await staffPage(browser, "communications");
  await page.goto("/staff/desk?state=all");
  await expect(page.getByTestId("queue-row").first()).toBeVisible();

  // Filters are a labelled search form; each choice updates the address and the table.
  await expect(page.getByRole("search", { name: "Find questions" })).toBeVisible();
  await page.getByLabel("Topic").selectOption("air");
  await expect(page).toHaveURL(/topic=air/);
  await settled(page);
  await expect(page.getByTestId("queue-row").first()).toBeVisible();
  for (const topic of await page.getByTestId("queue-row").locator("td:nth-child(4)").allTextContents()) expect(topic).toBe("Air and ventilation");
  await page.getByLabel("School", { exact: true }).selectOption("tamsin-creek");
  await expect(page).toHaveURL(/school=tamsin-creek/);
  await settled(page);
  await expect(page.getByTestId("queue-row").filter({ hasText: "Q-2026-0001" })).toHaveCount(1);
  for (const school of await page.getByTestId("queue-row").locator("td:nth-child(3)").allTextContents()) expect(school).toBe("Tamsin Creek Elementary School");

  // The view survives a reload.
  await page.reload();
  await expect(page.getByLabel("Topic")).toHaveValue("air");
  await expect(page.getByLabel("School", { exact: true })).toHaveValue("tamsin-creek");
  await expect(page.getByLabel("Where it is")).toHaveValue("all");
  await page.getByRole("button", { name: "Clear the filters" }).click();
  await expect(page).toHaveURL(/\/staff\/desk$/);

  // Sorting: buttons in the column headers, with aria-sort on the header.
  await page.getByLabel("Where it is").selectOption("all");
  const referenceHeader = page.getByRole("columnheader", { name: /Question/ });
  await page.getByRole("button", { name: "Question", exact: true }).click();
  await expect(page).toHaveURL(/sort=reference/);
  await settled(page);
  await expect(referenceHeader).toHaveAttribute("aria-sort", "ascending");
  await expect(page.getByRole("columnheader", { name: /Reply target/ })).toHaveAttribute("aria-sort", "none");
  const ascending = await page.getByTestId("queue-row").evaluateAll((rows) => rows.map((r) => r.getAttribute("data-reference") ?? ""));
  expect(ascending).toEqual([...ascending].sort());
  expect(ascending[0]).toBe("Q-2026-0001");
  await page.getByRole("button", { name: "Question", exact: true }).click();
  await expect(page).toHaveURL(/dir=desc/);
  await settled(page);
  await expect(referenceHeader).toHaveAttribute("aria-sort", "descending");
  await expect(page.getByTestId("queue-row").first()).not.toHaveAttribute("data-reference", "Q-2026-0001");
  const descending = await page.getByTestId("queue-row").evaluateAll((rows) => rows.map((r) => r.getAttribute("data-reference") ?? ""));
  expect(descending).toEqual([...descending].sort().reverse());

  // Pages: ten rows a page, a navigation with the current page marked.
  await page.getByLabel("Rows a page").selectOption("10");
  await expect(page).toHaveURL(/pageSize=10/);
  await settled(page);
  await expect(page.getByTestId("queue-row")).toHaveCount(10);
  const pages = page.getByRole("navigation", { name: "Pages of questions" });
  await expect(pages.getByRole("link", { name: "Page 1" })).toHaveAttribute("aria-current", "page");
  const firstPage = await page.getByTestId("queue-row").first().getAttribute("data-reference");
  await pages.getByRole("link", { name: "Page 2" }).click();
  await expect(page).toHaveURL(/page=2/);
  await settled(page);
  await expect(pages.getByRole("link", { name: "Page 2" })).toHaveAttribute("aria-current", "page");
  await expect(page.getByTestId("queue-summary")).toContainText("Showing 11–");
  await expect(page.getByTestId("queue-row").first()).not.toHaveAttribute("data-reference", firstPage!);
  await page.goBack();
  await expect(page.getByTestId("queue-summary")).toContainText("Showing 1–10");

  // Search, and a question that arrives while the desk is open appears by itself.
  const word = `skylight${Date.now()}`;
  await page.getByLabel("Words or reference").fill(word);
  await expect(page).toHaveURL(new RegExp(`q=${word}`));
  await expect(page.getByTestId("queue-summary")).toHaveText("No question matches these filters.");
  await page.evaluate(() => ((window as unknown as { stillHere: boolean }).stillHere = true));
  const reference = await ask(page.request, "203.0.113.91", {
    school: "corrow-ridge",
    topic: "building",
    question: `Is the ${word} over the library being fixed before the children come back?`,
    email: `skylight.parent.${Date.now()}@example.net`,
  });
  await expect(page.getByTestId("queue-row").filter({ hasText: reference })).toBeVisible({ timeout: 45_000 });
  await expect(page.getByTestId("queue-summary")).toHaveText("1 question matches. Showing 1–1.");
  expect(await page.evaluate(() => (window as unknown as { stillHere?: boolean }).stillHere)).toBe(true);
  await context.close();
});

test("the keyboard alone reaches a question from the desk, writes a draft and saves it", async ({ browser }) => {
  const { context, page } = await staffPage(browser, "communications");
  const reference = await ask(page.request, "203.0.113.92", {
    school: "tamsin-creek",
    topic: "signs",
    question: "Which door do parents use at pick-up now that the arrows are painted on the playground?",
    email: `keyboard.desk.${Date.now()}@example.net`,
  });
  await page.goto(`/staff/desk?q=${reference}`);
  const link = page.getByRole("link", { name: reference });
  await expect(link).toBeVisible();
  await tabTo(page, `a[href^="/staff/desk/"]:text("${reference}")`);
  await page.keyboard.press("Enter");
  await expect(page).toHaveURL(/\/staff\/desk\/\d+$/);
  await expect(page.getByTestId("question-body")).toBeVisible();

  const textarea = page.getByLabel("Answer (Markdown)");
  const id = await textarea.getAttribute("id");
  await tabTo(page, `[id="${id}"]`);
  await page.keyboard.type("Use the blue door by the playground. Follow the arrows and wait on the painted dots.");
  await expect(page.getByTestId("answer-preview")).toContainText("Use the blue door by the playground.");
  await expect(page.getByTestId("draft-state")).toHaveText("Unsaved changes");
  await tabTo(page, 'button:text("Save draft")');
  await page.keyboard.press("Enter");
  await expect(status(page)).toContainText("Draft saved");
  await expect(stateOf(page)).toContainText("Being written");
  await expect(page.getByTestId("revisions")).toContainText("Priya Vandermolen");
  // A non-technical answer can be sent straight away; the button is the next stop after saving.
  await page.keyboard.press("Tab");
  await expect(page.getByRole("button", { name: "Send reply" })).toBeFocused();
  await context.close();
});

test("joining a duplicate: one reply reaches both askers", async ({ browser }) => {
  const { context, page } = await staffPage(browser, "communications");
  const stamp = Date.now();
  const first = `lunch.one.${stamp}@example.net`;
  const second = `lunch.two.${stamp}@example.net`;
  const into = await ask(page.request, "203.0.113.93", {
    school: "eastmere",
    topic: "distancing",
    question: `Where do the children eat lunch now at Eastmere (${stamp})?`,
    email: first,
  });
  const duplicate = await ask(page.request, "203.0.113.94", {
    school: "eastmere",
    topic: "distancing",
    question: `Is lunch still in the cafeteria at Eastmere, or in the classrooms (${stamp})?`,
    email: second,
  });
  const target = await questionId(page.request, into);
  const dupe = await questionId(page.request, duplicate);

  await openQuestion(page, dupe.id);
  const merge = page.getByTestId("merge-panel");
  await merge.getByLabel("Join to a question by its reference").fill("Q-1");
  await merge.getByRole("button", { name: "Find" }).click();
  await expect(merge.getByText("Write a reference like Q-2026-0004.")).toBeVisible();
  await merge.getByLabel("Join to a question by its reference").fill(into);
  await merge.getByRole("button", { name: "Find" }).click();
  const confirm = page.getByRole("group", { name: `Join ${duplicate} to ${into}?` });
  await expect(confirm).toBeFocused();
  await confirm.getByRole("button", { name: `Yes, join to ${into}` }).click();
  await expect(status(page)).toContainText(`${duplicate} is joined to ${into}`);
  await expect(stateOf(page)).toContainText("Joined to another question");

  await openQuestion(page, target.id);
  await expect(page.getByTestId("merged-from")).toContainText(duplicate);
  await page.getByLabel("Answer (Markdown)").fill("Lunch is in the cafeteria, at tables spread across the room and the stage. Each class has its own tables.");
  await page.getByRole("button", { name: "Send reply" }).click();
  await expect(page.getByRole("group", { name: "Send the reply now?" })).toContainText("1 asker of the questions joined to this one");
  await page.getByRole("button", { name: "Yes, send the reply" }).click();
  await expect(status(page)).toContainText(`Reply sent to ${first} and 1 other asker`);
  await expect(stateOf(page)).toContainText("Answered");

  for (const address of [first, second]) {
    const mail = await waitForMail(address, /Our answer to your question/);
    expect(mail.text).toContain("Each class has its own tables.");
  }
  await context.close();
});

test("declining with a reason sends the asker a polite e-mail", async ({ browser }) => {
  const { context, page } = await staffPage(browser, "communications");
  const email = `bus.parent.${Date.now()}@example.net`;
  const reference = await ask(page.request, "203.0.113.95", {
    school: "corrow-ridge",
    topic: "other",
    question: "Can you change the bus stop on Alder Lane to be closer to our house?",
    email,
  });
  await openQuestion(page, (await questionId(page.request, reference)).id);
  const panel = page.getByTestId("decline-panel");
  await panel.getByLabel("Reason, as the asker will read it").fill("No.");
  await panel.getByRole("button", { name: "Decline…" }).click();
  await expect(panel.getByText("Give the asker a reason of at least a few words.")).toBeVisible();
  const reason = "Bus stops are set by the transport office, so we have passed your request on and they will write to you.";
  await panel.getByLabel("Reason, as the asker will read it").fill(reason);
  await panel.getByRole("button", { name: "Decline…" }).click();
  const confirm = page.getByRole("group", { name: `Decline ${reference}?` });
  await expect(confirm).toBeFocused();
  await confirm.getByRole("button", { name: "Cancel" }).click();
  await expect(stateOf(page)).toContainText("New");
  await panel.getByRole("button", { name: "Decline…" }).click();
  await confirm.getByRole("button", { name: "Yes, decline and e-mail the asker" }).click();
  await expect(status(page)).toContainText(`${email} has been sent a polite e-mail`);
  await expect(stateOf(page)).toContainText("Declined");
  await expect(page.getByRole("region", { name: "Declined" })).toContainText(reason);

  const mail = await waitForMail(email, new RegExp(`About your question ${reference}`));
  expect(mail.text).toContain(reason);
  expect(mail.text).toMatch(/thank/i);
  await context.close();
});

test("reply snippets: add one, put it into an answer, change it and remove it", async ({ browser }) => {
  const { context, page } = await staffPage(browser, "communications");
  const title = `Office hours ${Date.now()}`;
  await page.goto("/staff/snippets");
  const add = page.getByRole("region", { name: "Add a snippet" });
  await add.getByRole("button", { name: "Add snippet" }).click();
  await expect(add.getByText("Give the snippet a short title.")).toBeVisible();
  await add.getByLabel("Title").fill(title);
  await add.getByLabel("Text (Markdown)").fill("The front office is open from **7:30 to 4:00** on school days.");
  await add.getByRole("button", { name: "Add snippet" }).click();
  await expect(status(page)).toContainText(`Snippet “${title}” added.`);
  const item = page.getByTestId("snippet").filter({ hasText: title });
  await expect(item.locator("strong")).toHaveText("7:30 to 4:00");

  const reference = await ask(page.request, "203.0.113.96", {
    school: "eastmere",
    topic: "other",
    question: "When can I drop off a forgotten lunch box at the office?",
    email: `snippet.parent.${Date.now()}@example.net`,
  });
  await openQuestion(page, (await questionId(page.request, reference)).id);
  await page.getByLabel("Answer (Markdown)").fill("Thank you for asking.");
  await page.getByLabel("Reply snippet").selectOption({ label: title });
  await page.getByRole("button", { name: "Insert snippet" }).click();
  await expect(page.getByLabel("Answer (Markdown)")).toBeFocused();
  await expect(page.getByLabel("Answer (Markdown)")).toHaveValue("Thank you for asking.\n\nThe front office is open from **7:30 to 4:00** on school days.");
  await expect(page.getByTestId("answer-preview").locator("strong")).toHaveText("7:30 to 4:00");

  await page.goto("/staff/snippets");
  await item.getByRole("button", { name: /^Edit/ }).click();
  const edit = page.getByRole("form", { name: `Edit snippet ${title}` });
  await expect(edit.getByLabel("Title")).toBeFocused();
  await edit.getByLabel("Title").fill(`${title} (winter)`);
  await edit.getByRole("button", { name: "Save snippet" }).click();
  await expect(status(page)).toContainText(`Snippet “${title} (winter)” saved.`);
  const changed = page.getByTestId("snippet").filter({ hasText: `${title} (winter)` });
  await changed.getByRole("button", { name: /^Remove/ }).click();
  await changed.getByRole("button", { name: "Yes, remove it" }).click();
  await expect(status(page)).toContainText("removed");
  await expect(page.getByTestId("snippet").filter({ hasText: title })).toHaveCount(0);
  await page.reload();
  await expect(page.getByTestId("snippet").first()).toBeVisible();
  await expect(page.getByTestId("snippet").filter({ hasText: title })).toHaveCount(0);
  await context.close();
});

test("a refused step shows the server's reason and the page catches up with the question", async ({ browser }) => {
  const { context, page } = await staffPage(browser, "communications");
  const reference = await ask(page.request, "203.0.113.97", {
    school: "tamsin-creek",
    topic: "distancing",
    question: "Are the reading corners still open in the grade 2 rooms?",
    email: `stale.parent.${Date.now()}@example.net`,
  });
  const { id } = await questionId(page.request, reference);
  await openQuestion(page, id);
  await page.getByLabel("Answer (Markdown)").fill("Yes. Each reading corner has room for four children at a time.");
  await page.getByRole("button", { name: "Save draft" }).click();
  await expect(status(page)).toContainText("Draft saved");

  // Meanwhile a colleague declines it through the API; this page still offers Send.
  const other = await browser.newContext();
  expect(await signInThroughApi(other.request, DEMO_ACCOUNTS.admin)).toBe(200);
  const declined = await other.request.post(`/api/staff/questions/${id}/decline`, {
    headers: { Origin: new URL(page.url()).origin },
    data: { reason: "Answered by the class teacher at the parents' evening instead." },
  });
  expect(declined.status()).toBe(200);
  await page.getByRole("button", { name: "Send reply" }).click();
  await page.getByRole("button", { name: "Yes, send the reply" }).click();
  const alert = page.getByTestId("desk-alert");
  await expect(alert).toContainText("Not done:");
  await expect(alert).toContainText(/declined/);
  await expect(alert).toBeFocused();
  await expect(stateOf(page)).toContainText("Declined");
  await expect(page.getByRole("button", { name: "Send reply" })).toHaveCount(0);
  await other.close();
  await context.close();
});

test("the desk's screens have no WCAG 2.1 A/AA violations, also at 320 px", async ({ browser }) => {
  test.setTimeout(120_000);
  const comms = await staffPage(browser, "communications");
  const { id } = await questionId(comms.page.request, "Q-2026-0001");
  for (const viewport of [{ width: 1280, height: 900 }, { width: 320, height: 720 }]) {
    await comms.page.setViewportSize(viewport);
    await comms.page.goto("/staff/desk");
    await expect(comms.page.getByTestId("queue-row").first()).toBeVisible();
    expect(await axeViolations(comms.page), `/staff/desk at ${viewport.width}px`).toEqual([]);
    await openQuestion(comms.page, id);
    await expect(comms.page.getByTestId("history").locator("li").first()).toBeVisible();
    expect(await axeViolations(comms.page), `/staff/desk/${id} at ${viewport.width}px`).toEqual([]);
    await comms.page.goto("/staff/snippets");
    await expect(comms.page.getByTestId("snippet").first()).toBeVisible();
    expect(await axeViolations(comms.page), `/staff/snippets at ${viewport.width}px`).toEqual([]);
    // The page itself never scrolls sideways; the table scrolls in its own box.
    expect(await comms.page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth)).toBe(true);
  }

  // The check list with an answer in it, and the question page as facilities read it.
  const reference = await ask(comms.page.request, "203.0.113.98", {
    school: "corrow-ridge",
    topic: "air",
    question: "How often are the filters in the music room's air cleaner changed?",
    email: `axe.parent.${Date.now()}@example.net`,
  });
  const asked = await questionId(comms.page.request, reference);
  const origin = { Origin: new URL(comms.page.url()).origin };
  expect((await comms.page.request.post(`/api/staff/questions/${asked.id}/drafts`, { headers: origin, data: { bodyMarkdown: "Every three months, and sooner when the unit's light says so." } })).status()).toBe(200);
  expect((await comms.page.request.post(`/api/staff/questions/${asked.id}/check`, { headers: origin, data: {} })).status()).toBe(200);
  const facilities = await staffPage(browser, "facilities");
  await facilities.page.goto("/staff/check");
  await expect(facilities.page.getByRole("link", { name: `Check ${reference}` })).toBeVisible();
  expect(await axeViolations(facilities.page), "/staff/check").toEqual([]);
  await facilities.page.getByRole("link", { name: `Check ${reference}` }).click();
  await expect(facilities.page.getByTestId("review-panel")).toBeVisible();
  expect(await axeViolations(facilities.page), "the question as facilities check it").toEqual([]);
  await comms.context.close();
  await facilities.context.close();
});

test("each role reaches only its own desk pages", async ({ browser }) => {
  const comms = await staffPage(browser, "communications");
  await comms.page.goto("/staff/check");
  await expect(comms.page).toHaveURL(/\/staff\/not-allowed\?from=%2Fstaff%2Fcheck/);
  await expect(comms.page.getByRole("heading", { level: 1 })).toHaveText("This page is not part of your role");
  const facilities = await staffPage(browser, "facilities");
  await facilities.page.goto("/staff/desk");
  await expect(facilities.page).toHaveURL(/\/staff\/not-allowed\?from=%2Fstaff%2Fdesk/);
  await facilities.page.goto("/staff/snippets");
  await expect(facilities.page).toHaveURL(/\/staff\/not-allowed/);
  // Facilities may read a question (to check it), but get no editor, assignment or decline.
  const { id } = await questionId(comms.page.request, "Q-2026-0001");
  await openQuestion(facilities.page, id);
  await expect(facilities.page.getByLabel("Answer (Markdown)")).toHaveCount(0);
  await expect(facilities.page.getByRole("button", { name: "Assign to me" })).toHaveCount(0);
  await expect(facilities.page.getByTestId("decline-panel")).toHaveCount(0);
  await expect(facilities.page.getByRole("link", { name: /All answers waiting for a check/ })).toBeVisible();
  await comms.context.close();
  await facilities.context.close();
});

test("a desk list that cannot be fetched says why, and Try again loads it", async ({ browser }) => {
  for (const [role, path, api, summary] of [
    ["communications", "/staff/desk", "/api/staff/questions", "queue-summary"],
    ["facilities", "/staff/check", "/api/staff/checks", "check-summary"],
  ] as const) {
    const { context, page } = await staffPage(browser, role);
    // The server is down until the test lets it come back (the client retries a 5xx twice on its own).
    let down = true;
    await page.route((url) => url.pathname === api, (route) => (down ? route.fulfill({ status: 503, contentType: "application/json", body: "{}" }) : route.fallback()));
    await page.goto(path);
    const alert = page.getByRole("alert").filter({ hasText: "The server could not do this just now" });
    await expect(alert, path).toBeVisible({ timeout: 20_000 });
    down = false;
    await alert.getByRole("button", { name: "Try again" }).click();
    await expect(alert, path).toHaveCount(0);
    await expect(page.getByTestId(summary), path).not.toHaveText(/could not be loaded|Loading/);
    await context.close();
  }
});
