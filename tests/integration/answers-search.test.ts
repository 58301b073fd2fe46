import { NextRequest } from "next/server";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { seed } from "@/db/seed";
import { recordVote, voteCounts, voterHash, newVoterToken } from "@/lib/answers/votes";
import type { SearchIndexPayload } from "@/lib/answers/search";
import { createTestDb, type TestDb } from "../support/test-db";

// The real route handlers over a seeded file. Next's cache is only there inside a running server.
vi.mock("next/cache", () => ({ revalidatePath: () => undefined }));

let t: TestDb;
let answersApi: (url: string, headers?: Record<string, string>) => Promise<Response>;
let indexApi: (url: string, headers?: Record<string, string>) => Promise<Response>;
let suggestionsApi: (headers?: Record<string, string>) => Promise<Response>;
let helpfulApi: (id: string, init: { body: string; type: string; origin?: string; cookie?: string }) => Promise<Response>;

const BASE = "http://localhost:3000";

beforeAll(async () => {
  t = await createTestDb();
  await seed(t.db);
  process.env.DATABASE_URL = t.path;
  const answers = await import("@/app/api/answers/route");
  const index = await import("@/app/api/answers/search-index/route");
  const suggestions = await import("@/app/api/answers/suggestions/route");
  const helpful = await import("@/app/api/answers/[id]/helpful/route");
  answersApi = (url, headers = {}) => answers.GET(new Request(`${BASE}${url}`, { headers }));
  indexApi = (url, headers = {}) => index.GET(new Request(`${BASE}${url}`, { headers }));
  suggestionsApi = (headers = {}) => suggestions.GET(new Request(`${BASE}/api/answers/suggestions`, { headers }));
  helpfulApi = (id, init) =>
    helpful.POST(
      new NextRequest(`${BASE}/api/answers/${id}/helpful`, {
        method: "POST",
        body: init.body,
        headers: { "content-type": init.type, origin: init.origin ?? BASE, ...(init.cookie ? { cookie: init.cookie } : {}) },
      }),
      { params: Promise.resolve({ id }) },
    );
});
afterAll(async () => t.cleanup());

async function resultsFor(query: string) {
  const response = await answersApi(`/api/answers${query}`);
  expect(response.status).toBe(200);
  return ((await response.json()) as { results: { id: number; question: string }[] }).results;
}

async function currentIndex() {
  const response = await indexApi("/api/answers/search-index");
  expect(response.status).toBe(200);
  return { etag: response.headers.get("etag")!, payload: (await response.json()) as SearchIndexPayload, cacheControl: response.headers.get("cache-control") };
}

describe("GET /api/answers", () => {
  it("answers with exactly the contract's fields, best match first, and nothing about askers or staff", async () => {
    const response = await answersApi("/api/answers?q=generator");
    expect(response.headers.get("cache-control")).toBe("public, no-cache");
    const body = (await response.json()) as { results: Record<string, unknown>[] };
    expect(Object.keys(body)).toEqual(["results"]);
    expect(body.results.length).toBeGreaterThanOrEqual(3);
    for (const r of body.results) {
      expect(Object.keys(r).sort()).toEqual(["answer", "id", "publishedAt", "question", "school", "topic", "url"]);
      expect(r.url).toBe(`/answers/${r.id}`);
    }
    expect(String(body.results[0]!.question)).toMatch(/generator/i);

    const people = await t.db.selectFrom("questions").select(["asker_email", "asker_name"]).execute();
    const staff = await t.db.selectFrom("users").select(["email", "name"]).execute();
    const all = JSON.stringify(await resultsFor(""));
    for (const p of people) {
      expect(all).not.toContain(p.asker_email);
      if (p.asker_name) expect(all).not.toContain(p.asker_name);
    }
    for (const s of staff) {
      expect(all).not.toContain(s.email);
      expect(all).not.toContain(s.name);
    }
  });

  it("filters by school and topic together, and refuses values it does not know", async () => {
    const both = await answersApi("/api/answers?school=eastmere&topic=building");
    const results = ((await both.json()) as { results: { school: string; topic: string }[] }).results;
    expect(results.length).toBeGreaterThan(0);
    for (const r of results) {
      expect(r.topic).toBe("building");
      expect(["eastmere", "district"]).toContain(r.school);
    }
    const unknown = await answersApi("/api/answers?school=nowhere&topic=weather");
    expect(unknown.status).toBe(400);
    expect(Object.keys(((await unknown.json()) as { errors: Record<string, string> }).errors).sort()).toEqual(["school", "topic"]);
    expect((await answersApi(`/api/answers?q=${"a".repeat(201)}`)).status).toBe(400);
  });

  it("answers a repeated request with 304 while nothing changed", async () => {
    const first = await answersApi("/api/answers?q=mask");
    const etag = first.headers.get("etag")!;
    expect((await answersApi("/api/answers?q=mask", { "if-none-match": etag })).status).toBe(304);
    expect((await answersApi("/api/answers?q=masks", { "if-none-match": etag })).status).toBe(200);
  });
});

describe("publishing and taking down, as the desk does it", () => {
  it("an answer taken down disappears from the API, the index and the suggestions at the next request", async () => {
    const target = await t.db.selectFrom("published_answers").select(["id", "question_text"]).where("question_text", "like", "%hand sanitizer%").executeTakeFirstOrThrow();
    expect((await resultsFor("?q=sanitizer")).map((r) => r.id)).toContain(target.id);
    const before = await currentIndex();
    expect(before.payload.answers.map((a) => a[0])).toContain(target.id);
    expect((await indexApi("/api/answers/search-index", { "if-none-match": before.etag })).status).toBe(304);
    expect((await indexApi(`/api/answers/search-index?v=${before.payload.version}`)).headers.get("cache-control")).toBe("public, max-age=31536000, immutable");
    expect(before.cacheControl).toBe("public, no-cache");

    // What the desk does: set unpublished_at and updated_at; nobody tells the search.
    const now = new Date().toISOString();
    await t.db.updateTable("published_answers").set({ unpublished_at: now, updated_at: now }).where("id", "=", target.id).execute();

    expect((await resultsFor("?q=sanitizer")).map((r) => r.id)).not.toContain(target.id);
    expect((await resultsFor("")).map((r) => r.id)).not.toContain(target.id);
    const after = await currentIndex();
    expect(after.etag).not.toBe(before.etag);
    expect(after.payload.answers.map((a) => a[0])).not.toContain(target.id);
    expect(JSON.stringify(after.payload)).not.toContain(target.question_text);
    // A browser holding the old index gets the new one, and the old version is no longer immutable.
    expect((await indexApi("/api/answers/search-index", { "if-none-match": before.etag })).status).toBe(200);
    expect((await indexApi(`/api/answers/search-index?v=${before.payload.version}`)).headers.get("cache-control")).toBe("public, no-cache");
    const suggestions = (await (await suggestionsApi()).json()) as { answers: { id: number }[] };
    expect(suggestions.answers.map((a) => a.id)).not.toContain(target.id);

    // Published again as a new row, as the desk inserts it.
    const row = await t.db.selectFrom("published_answers").selectAll().where("id", "=", target.id).executeTakeFirstOrThrow();
    const { id: _old, ...copy } = row;
    void _old;
    const inserted = await t.db
      .insertInto("published_answers")
      .values({ ...copy, unpublished_at: null, published_at: now, updated_at: now })
      .returning("id")
      .executeTakeFirstOrThrow();
    expect((await resultsFor("?q=sanitizer"))[0]!.id).toBe(inserted.id);
    expect((await currentIndex()).payload.answers[0]![0]).toBe(inserted.id);
  });

  it("revalidatePublishedAnswers can be called outside a request without throwing", async () => {
    const { revalidatePublishedAnswers } = await import("@/lib/answers/publish");
    expect(() => revalidatePublishedAnswers(1)).not.toThrow();
  });
});

describe("was this helpful?", () => {
  it("counts one vote per browser; voting again changes it", async () => {
    const [voterA, voterB] = [voterHash(newVoterToken())!, voterHash(newVoterToken())!];
    const start = await voteCounts(t.db, 1);
    await recordVote(t.db, 1, voterA, "yes");
    await recordVote(t.db, 1, voterA, "yes");
    expect(await voteCounts(t.db, 1)).toEqual({ helpful: start.helpful + 1, notHelpful: start.notHelpful });
    await recordVote(t.db, 1, voterA, "no");
    await recordVote(t.db, 1, voterB, "yes");
    expect(await voteCounts(t.db, 1)).toEqual({ helpful: start.helpful + 1, notHelpful: start.notHelpful + 1 });
    expect(await recordVote(t.db, 99_999, voterA, "yes")).toBeNull();
  });

  it("the form post sets the browser's cookie and goes back to the answer; JSON with that cookie does not count twice", async () => {
    const form = await helpfulApi("2", { body: "vote=yes", type: "application/x-www-form-urlencoded" });
    expect(form.status).toBe(303);
    expect(form.headers.get("location")).toBe("/answers/2#helpful");
    const cookie = form.headers.get("set-cookie")!;
    expect(cookie).toMatch(/^clearhall_voter=[A-Za-z0-9_-]{43};/);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=lax/i);
    const token = /^clearhall_voter=([^;]+)/.exec(cookie)![1]!;
    // Only the hash is stored.
    const stored = await t.db.selectFrom("answer_votes").select("voter_hash").where("answer_id", "=", 2).execute();
    expect(stored.map((s) => s.voter_hash)).toEqual([voterHash(token)]);

    const again = await helpfulApi("2", { body: JSON.stringify({ vote: "yes" }), type: "application/json", cookie: `clearhall_voter=${token}` });
    expect(again.status).toBe(200);
    expect(await again.json()).toEqual({ helpful: 1, notHelpful: 0, vote: "yes" });
    expect(again.headers.get("set-cookie")).toBeNull();
  });

  it("refuses another site's form, a bad vote, another body type and an answer that is not published", async () => {
    const before = await t.db.selectFrom("answer_votes").select((eb) => eb.fn.countAll<number>().as("n")).executeTakeFirstOrThrow();
    expect((await helpfulApi("3", { body: "vote=yes", type: "application/x-www-form-urlencoded", origin: "https://elsewhere.example" })).status).toBe(403);
    expect((await helpfulApi("3", { body: "vote=maybe", type: "application/x-www-form-urlencoded" })).status).toBe(400);
    expect((await helpfulApi("3", { body: "vote=yes", type: "text/plain" })).status).toBe(415);
    expect((await helpfulApi("99999", { body: "vote=yes", type: "application/x-www-form-urlencoded" })).status).toBe(404);
    expect((await helpfulApi("abc", { body: "vote=yes", type: "application/x-www-form-urlencoded" })).status).toBe(404);
    const after = await t.db.selectFrom("answer_votes").select((eb) => eb.fn.countAll<number>().as("n")).executeTakeFirstOrThrow();
    expect(Number(after.n)).toBe(Number(before.n));
  });
});
