import { expect, test, type APIRequestContext } from "@playwright/test";
import { SEED_QUESTIONS } from "../../db/seed-data";
import { allMail } from "./support/mail";

// Askers in the demo data and in these tests all write from example.net; staff accounts are example.org.
const ASKER_ADDRESS = /[a-z0-9._%+-]+@example\.net/gi;

interface Asked {
  reference: string;
  statusUrl: string;
  email: string;
  name: string;
  question: string;
}

async function ask(request: APIRequestContext, ip: string, who: { email: string; name: string; question: string }): Promise<Asked> {
  const response = await request.post("/api/questions", {
    headers: { "x-forwarded-for": ip },
    data: { school: "tamsin-creek", topic: "cleaning", room: "Room 104", question: who.question, name: who.name, email: who.email },
  });
  expect(response.status()).toBe(201);
  return { ...who, ...((await response.json()) as { reference: string; statusUrl: string }) };
}

test("no public page or public API shows anything about an asker, and a status page shows only its own question", async ({ request }) => {
  const stamp = Date.now();
  const first = await ask(request, "203.0.113.140", {
    email: `wilhelmina.first.${stamp}@example.net`,
    name: "Wilhelmina Ashgrove",
    question: "Which disinfectant is used on the desks in Room 104, and how long before children sit down?",
  });
  const second = await ask(request, "203.0.113.141", {
    email: `cosmo.second.${stamp}@example.net`,
    name: "Cosmo Trevellyan",
    question: "My son Alaric has a bleach allergy; who do I tell about the Room 104 cleaning routine?",
  });

  const sitemap = await (await request.get("/sitemap.xml")).text();
  const publicPaths = [...sitemap.matchAll(/<loc>([^<]+)<\/loc>/g)].map((m) => new URL(m[1]!).pathname);
  expect(publicPaths.length).toBeGreaterThan(10);
  const schools = [...new Set(publicPaths.map((p) => /^\/schools\/([^/]+)$/.exec(p)?.[1]).filter(Boolean))] as string[];
  const paths = [
    ...publicPaths,
    "/sitemap.xml",
    "/robots.txt",
    "/api/answers/suggestions",
    ...schools.map((s) => `/api/schools/${s}/rooms`),
    `/ask/sent?ref=${first.reference}`,
    `/ask/sent?ref=${second.reference}`,
  ];

  const seededNames = SEED_QUESTIONS.flatMap((q) => (q.askerName ? [q.askerName] : []));
  for (const path of paths) {
    const response = await request.get(path);
    expect(response.status(), path).toBe(200);
    const text = await response.text();
    expect(text.match(ASKER_ADDRESS), `${path} shows an asker's e-mail address`).toBeNull();
    for (const secret of [first.name, second.name, first.question, second.question, "Alaric", ...seededNames]) {
      expect(text, `${path} shows "${secret}"`).not.toContain(secret);
    }
    expect(text).not.toContain(new URL(first.statusUrl).pathname);
    expect(text).not.toContain(new URL(second.statusUrl).pathname);
  }

  // Each asker's private page: their own words, nobody else's, and never their name or address.
  for (const [own, other] of [
    [first, second],
    [second, first],
  ] as const) {
    const page = await (await request.get(new URL(own.statusUrl).pathname)).text();
    expect(page).toContain(own.reference);
    expect(page).toContain(own.question.replace(/'/g, "&#x27;"));
    expect(page.match(ASKER_ADDRESS)).toBeNull();
    for (const secret of [own.name, other.name, other.question, other.reference]) expect(page).not.toContain(secret);
  }
});

test("a burst of questions sent at once all land, each with its own reference and one confirmation e-mail", async ({ request }) => {
  const BURST = 30;
  const stamp = Date.now();
  const emails = Array.from({ length: BURST }, (_, i) => `burst.${i}.${stamp}@example.net`);
  const responses = await Promise.all(
    emails.map((email, i) =>
      request.post("/api/questions", {
        // One address each (RFC 5737 documentation range), so the per-address limit plays no part.
        headers: { "x-forwarded-for": `198.51.100.${i + 1}` },
        data: { school: "district", topic: "signs", question: `What does the green arrow on the stairs mean? (${i})`, email },
      }),
    ),
  );
  expect(responses.map((r) => r.status())).toEqual(Array(BURST).fill(201));
  const references = await Promise.all(responses.map(async (r) => ((await r.json()) as { reference: string }).reference));
  expect(new Set(references).size).toBe(BURST);
  const numbers = references.map((r) => Number(r.split("-")[2])).sort((a, b) => a - b);
  // Numbered one after another with nothing skipped or taken twice.
  expect(numbers.at(-1)! - numbers[0]!).toBe(BURST - 1);

  let delivered: string[] = [];
  await expect
    .poll(
      async () => {
        const wanted = new Set(emails);
        delivered = (await allMail()).flatMap((m) => m.to.map((t) => t.address.toLowerCase())).filter((a) => wanted.has(a));
        return new Set(delivered).size;
      },
      { timeout: 30_000, message: "every asker in the burst gets a confirmation" },
    )
    .toBe(BURST);
  // Exactly once each.
  expect(delivered.length).toBe(BURST);
});
