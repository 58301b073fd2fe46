import { expect, test, type APIRequestContext } from "@playwright/test";
import { mailTo, waitForMailTo, type CaughtMail } from "./support/mail";
import { DEMO_ACCOUNTS, signInThroughApi } from "./support/staff";

// The desk's JSON API over real sessions: the server, not the page, decides who may do what,
// and a technical answer cannot leave before facilities approve it, whatever the client sends.

async function as(playwright: { request: { newContext: (o: { baseURL?: string }) => Promise<APIRequestContext> } }, baseURL: string, role: keyof typeof DEMO_ACCOUNTS) {
  const context = await playwright.request.newContext({ baseURL });
  expect(await signInThroughApi(context, DEMO_ACCOUNTS[role])).toBeLessThan(400);
  return context;
}

test("a technical answer goes out only after facilities approve it, and each role keeps to its own steps", async ({ playwright, request, baseURL }) => {
  const email = `desk.api.${Date.now()}@example.net`;
  const words = `ventilation ducts ${Date.now()}`;
  const asked = await request.post("/api/questions", {
    headers: { "x-forwarded-for": "203.0.113.71" },
    data: { school: "eastmere", topic: "air", question: `Are the ${words} in the gym cleaned before the children come back?`, email },
  });
  expect(asked.status()).toBe(201);
  const { reference } = (await asked.json()) as { reference: string };

  const comms = await as(playwright, baseURL!, "communications");
  const facilities = await as(playwright, baseURL!, "facilities");

  const queue = await comms.get(`/api/staff/questions?q=${encodeURIComponent(reference)}&state=all`);
  expect(queue.status()).toBe(200);
  const { items } = (await queue.json()) as { items: { id: number; reference: string; technical: boolean; state: string }[] };
  expect(items).toHaveLength(1);
  expect(items[0]).toMatchObject({ reference, technical: true, state: "received" });
  const id = items[0]!.id;
  const url = (step: string) => `/api/staff/questions/${id}/${step}`;

  // Bad input: a clear message per field, and nothing changes.
  const empty = await comms.post(url("drafts"), { data: { bodyMarkdown: "  " } });
  expect(empty.status()).toBe(400);
  expect(((await empty.json()) as { errors: Record<string, string> }).errors.bodyMarkdown).toBe("Write the answer first.");

  const draft = await comms.post(url("drafts"), {
    data: { bodyMarkdown: "Yes. The gym's ducts were cleaned in the summer and the filters changed.", publicQuestion: "Are the gym's ducts at Eastmere cleaned?" },
  });
  expect(draft.status()).toBe(200);
  expect(((await draft.json()) as { question: { state: string } }).question.state).toBe("drafting");

  // Before approval: the server refuses to send or publish.
  const early = await comms.post(url("send"));
  expect(early.status()).toBe(409);
  expect(await early.json()).toMatchObject({ code: "illegal_transition" });
  expect((await comms.post(url("publish"), { data: { questionText: "Are the gym's ducts at Eastmere cleaned?", schoolId: null, topic: "air" } })).status()).toBe(409);

  // Roles: facilities cannot write or send; communications cannot review.
  expect((await facilities.post(url("drafts"), { data: { bodyMarkdown: "x" } })).status()).toBe(403);
  expect((await facilities.post(url("send"))).status()).toBe(403);
  expect((await facilities.get("/api/staff/questions")).status()).toBe(403);
  expect((await comms.get("/api/staff/checks")).status()).toBe(403);
  expect((await comms.post(url("check"))).status()).toBe(200);
  expect((await comms.post(url("review"), { data: { decision: "approve" } })).status()).toBe(403);

  // Facilities can read the question and find it in their list.
  expect((await facilities.get(`/api/staff/questions/${id}`)).status()).toBe(200);
  const checks = (await (await facilities.get("/api/staff/checks")).json()) as { items: { reference: string }[] };
  expect(checks.items.map((c) => c.reference)).toContain(reference);
  const noComment = await facilities.post(url("review"), { data: { decision: "changes", comment: "" } });
  expect(noComment.status()).toBe(400);
  const approved = await facilities.post(url("review"), { data: { decision: "approve" } });
  expect(approved.status()).toBe(200);

  const sent = await comms.post(url("send"));
  expect(sent.status()).toBe(200);
  expect(((await sent.json()) as { question: { state: string } }).question.state).toBe("answered");
  await waitForMailTo(email); // the confirmation comes first
  let mail: CaughtMail | undefined;
  await expect
    .poll(async () => {
      mail = (await mailTo(email)).find((m) => m.subject.startsWith("Our answer"));
      return Boolean(mail);
    }, { timeout: 15_000, message: "the reply never reached the asker" })
    .toBe(true);
  if (!mail) throw new Error("unreachable");
  expect(mail.subject).toContain(reference);
  expect(mail.text).toContain("filters changed");
  expect(mail.text).toMatch(/\/ask\/status\/[A-Za-z0-9_-]{43}/);

  // Answered is final: a second send is a conflict, not a second e-mail.
  expect((await comms.post(url("send"))).status()).toBe(409);

  await comms.dispose();
  await facilities.dispose();
});

test("snippets: communications add, edit and remove them; facilities cannot", async ({ playwright, baseURL }) => {
  const comms = await as(playwright, baseURL!, "communications");
  const facilities = await as(playwright, baseURL!, "facilities");
  const created = await comms.post("/api/staff/snippets", { data: { title: "Bus times", bodyMarkdown: "Buses keep their usual times." } });
  expect(created.status()).toBe(201);
  const { snippet } = (await created.json()) as { snippet: { id: number; title: string } };
  expect(snippet.title).toBe("Bus times");
  expect((await comms.patch(`/api/staff/snippets/${snippet.id}`, { data: { title: "Bus times this term", bodyMarkdown: "Same times." } })).status()).toBe(200);
  expect((await facilities.get("/api/staff/snippets")).status()).toBe(403);
  expect((await comms.post("/api/staff/snippets", { data: { title: "", bodyMarkdown: "" } })).status()).toBe(400);
  expect((await comms.delete(`/api/staff/snippets/${snippet.id}`)).status()).toBe(204);
  expect((await comms.delete(`/api/staff/snippets/${snippet.id}`)).status()).toBe(404);
  await comms.dispose();
  await facilities.dispose();
});
