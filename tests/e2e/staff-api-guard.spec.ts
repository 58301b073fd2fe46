import { readdirSync, readFileSync, statSync } from "node:fs";
import { join, relative, sep } from "node:path";
import { expect, test, type APIRequestContext } from "@playwright/test";
import { DEMO_ACCOUNTS, signInThroughApi } from "./support/staff";

type Role = keyof typeof DEMO_ACCOUNTS;
type Method = "GET" | "HEAD" | "POST" | "PUT" | "PATCH" | "DELETE" | "OPTIONS";

const ROLES: Role[] = ["communications", "facilities", "admin"];
const ALL: Role[] = ROLES;
const DESK: Role[] = ["communications", "admin"];
const QUESTION_READERS: Role[] = ["communications", "facilities", "admin"];
const FACILITIES: Role[] = ["facilities", "admin"];
const ADMIN: Role[] = ["admin"];

/**
 * Every staff route handler: its file under app/api/staff, and for each exported method the roles
 * allowed to use it. A route file on disk with no entry here, an entry with no file, or a method
 * exported but not listed (or listed but not exported) fails the first test: a new route cannot
 * ship without saying who may use it. Dynamic segments are called with the id 999999, which does
 * not exist: the role check runs before any lookup, so a missing check shows as 404 instead of 401.
 * `data` is a body that would otherwise be valid, so only the guard can refuse it.
 */
const MANIFEST: Record<string, Partial<Record<Method, { roles: Role[]; data?: unknown; query?: string[] }>>> = {
  "me": { GET: { roles: ALL } },
  "users": {
    GET: { roles: ADMIN },
    POST: { roles: ADMIN, data: { name: "No Session", email: "nosession@example.org", role: "admin", password: "long-enough-password" } },
  },
  "users/[id]": { PATCH: { roles: ADMIN, data: { role: "communications" } } },
  "projects/[id]": { PATCH: { roles: FACILITIES, data: { status: "finished", statusDate: "2026-11-30" } } },
  "rooms": {
    POST: {
      roles: FACILITIES,
      data: { school: "tamsin-creek", name: "Room 999", use: "office", units: "us", length: 10, width: 10, ceiling: 9, occupancy: 2, outdoorAir: 50, airCleaners: 0, merv: null, windowsOpen: false },
    },
  },
  "rooms/[id]": {
    GET: { roles: FACILITIES },
    PATCH: {
      roles: FACILITIES,
      data: { name: "Room 101", use: "classroom_5_8", units: "us", length: 30, width: 30, ceiling: 9.5, occupancy: 22, outdoorAir: 420, airCleaners: 0, merv: 13, windowsOpen: true },
    },
    DELETE: { roles: FACILITIES },
  },
  "rooms/import": { POST: { roles: FACILITIES, query: ["", "?dryRun=1"] } },
  "rooms/export": { GET: { roles: FACILITIES } },
  "co2/import": { POST: { roles: FACILITIES } },
  "questions": { GET: { roles: DESK } },
  "questions/[id]": { GET: { roles: QUESTION_READERS } },
  "questions/[id]/assign": { POST: { roles: DESK } },
  "questions/[id]/notes": { POST: { roles: QUESTION_READERS, data: { body: "A note that only staff read." } } },
  "questions/[id]/drafts": { POST: { roles: DESK } },
  "questions/[id]/technical": { PUT: { roles: DESK, data: { technical: true } } },
  "questions/[id]/check": { POST: { roles: DESK } },
  "questions/[id]/review": { POST: { roles: FACILITIES } },
  "questions/[id]/send": { POST: { roles: DESK } },
  "questions/[id]/publish": { POST: { roles: DESK } },
  "questions/[id]/decline": { POST: { roles: DESK } },
  "questions/[id]/merge": { POST: { roles: DESK } },
  "answers/[id]/unpublish": { POST: { roles: DESK } },
  "checks": { GET: { roles: FACILITIES } },
  "assignees": { GET: { roles: DESK } },
  "snippets": {
    GET: { roles: DESK },
    POST: { roles: DESK, data: { title: "Guard check", bodyMarkdown: "Made by the guard test; it must never be saved." } },
  },
  "snippets/[id]": {
    PATCH: { roles: DESK, data: { title: "Guard check", bodyMarkdown: "Never saved." } },
    DELETE: { roles: DESK },
  },
};

const STAFF_API_DIR = join(process.cwd(), "app", "api", "staff");
const METHODS: Method[] = ["GET", "HEAD", "POST", "PUT", "PATCH", "DELETE", "OPTIONS"];
const STATE_CHANGING = new Set<Method>(["POST", "PUT", "PATCH", "DELETE"]);

/** Route directories (relative to app/api/staff, with "/") of every route.ts under it. */
function routeFilesOnDisk(dir = STAFF_API_DIR): string[] {
  const found: string[] = [];
  for (const name of readdirSync(dir)) {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) found.push(...routeFilesOnDisk(path));
    else if (name === "route.ts" || name === "route.tsx" || name === "route.js") found.push(relative(STAFF_API_DIR, dir).split(sep).join("/"));
  }
  return found.sort();
}

/** The HTTP methods a route file exports, in any of the usual forms. */
function exportedMethods(route: string): Method[] {
  const source = readFileSync(routeFile(route), "utf8");
  const names = new Set<string>();
  for (const m of source.matchAll(/^export\s+(?:const|let|async\s+function|function)\s+([A-Z]+)\b/gm)) names.add(m[1]!);
  for (const m of source.matchAll(/^export\s+(?:const\s+)?\{([^}]*)\}/gm)) {
    for (const part of m[1]!.split(",")) names.add(part.trim().split(/\s+as\s+/).pop()!.trim());
  }
  return METHODS.filter((method) => names.has(method));
}

function routeFile(route: string): string {
  return join(STAFF_API_DIR, ...(route ? route.split("/") : []), "route.ts");
}

function fileExists(route: string): boolean {
  try {
    return statSync(routeFile(route)).isFile();
  } catch {
    return false;
  }
}

const urlOf = (route: string, query = "") => `/api/staff/${route.replace(/\[[^\]]+\]/g, "999999")}${query}`;

const ENTRIES = Object.entries(MANIFEST).flatMap(([route, methods]) =>
  Object.entries(methods).flatMap(([method, spec]) => (spec.query ?? [""]).map((query) => ({ route, method: method as Method, query, roles: spec.roles, data: spec.data }))),
);

test("the manifest names every staff route handler on disk, with each exported method, and nothing else", () => {
  const onDisk = routeFilesOnDisk();
  const listed = Object.keys(MANIFEST).sort();
  const unlisted = onDisk.filter((r) => !(r in MANIFEST)).map((r) => `app/api/staff/${r}/route.ts (${exportedMethods(r).join(", ")})`);
  const missing = listed.filter((r) => !fileExists(r)).map((r) => `app/api/staff/${r}/route.ts`);
  const methodProblems = onDisk
    .filter((r) => r in MANIFEST)
    .flatMap((r) => {
      const exported = exportedMethods(r);
      const expected = Object.keys(MANIFEST[r]!) as Method[];
      return [
        ...exported.filter((m) => !expected.includes(m)).map((m) => `${m} app/api/staff/${r}/route.ts is exported but has no roles in the manifest`),
        ...expected.filter((m) => !exported.includes(m)).map((m) => `${m} app/api/staff/${r}/route.ts is in the manifest but the file does not export it`),
        ...(exported.length === 0 ? [`app/api/staff/${r}/route.ts exports no HTTP method this test can see`] : []),
      ];
    });
  expect(unlisted, "route handlers with no manifest entry: add each to MANIFEST with the roles allowed").toEqual([]);
  expect(missing, "manifest entries whose route file is not on disk").toEqual([]);
  expect(methodProblems).toEqual([]);
});

test.describe("each staff route handler", () => {
  const sessions = new Map<Role, APIRequestContext>();
  let origin = "";

  test.beforeAll(async ({ playwright, baseURL }) => {
    origin = new URL(baseURL!).origin;
    for (const role of ROLES) {
      const context = await playwright.request.newContext({ baseURL });
      expect(await signInThroughApi(context, DEMO_ACCOUNTS[role])).toBe(200);
      sessions.set(role, context);
    }
  });
  test.afterAll(async () => {
    for (const context of sessions.values()) await context.dispose();
  });

  for (const entry of ENTRIES) {
    const label = `${entry.method} ${urlOf(entry.route, entry.query)}`;

    test(`${label}: 401 without a session, 403 for ${ROLES.filter((r) => !entry.roles.includes(r)).join(" and ") || "no role"}, passes the guard for ${entry.roles.join(", ")}`, async ({ request }) => {
      expect(fileExists(entry.route), `app/api/staff/${entry.route}/route.ts is in the manifest but not on disk`).toBe(true);
      const call = (context: APIRequestContext, data: unknown) =>
        context.fetch(urlOf(entry.route, entry.query), {
          method: entry.method,
          headers: { origin },
          ...(entry.method === "GET" || entry.method === "HEAD" ? {} : { data: data ?? {} }),
          maxRedirects: 0,
        });

      const anonymous = await call(request, entry.data);
      expect(anonymous.status(), `${label} without a session`).toBe(401);
      expect(await anonymous.json()).toEqual({ error: expect.any(String) });

      for (const role of ROLES) {
        if (entry.roles.includes(role)) continue;
        const refused = await call(sessions.get(role)!, entry.data);
        expect(refused.status(), `${label} as ${role}`).toBe(403);
        expect(await refused.json()).toEqual({ error: "Your role does not allow this." });
      }
      // An allowed role gets past the guard: to a 404 for the unknown id, a 400/415 for the empty
      // body sent here, or the data for a read. Nothing is changed by these calls.
      for (const role of entry.roles) {
        const allowed = await call(sessions.get(role)!, {});
        expect([401, 403], `${label} as ${role} should pass the role check`).not.toContain(allowed.status());
        expect(allowed.status(), `${label} as ${role}`).toBeLessThan(500);
      }
    });
  }

  test("a state-changing request from another site is refused before the role check, even for an admin, and changes nothing", async () => {
    const admin = sessions.get("admin")!;
    for (const entry of ENTRIES.filter((e) => STATE_CHANGING.has(e.method) && fileExists(e.route))) {
      const crossSite: Record<string, string>[] = [{ origin: "https://elsewhere.example.net" }, { origin: "null" }, { "sec-fetch-site": "cross-site" }];
      for (const headers of crossSite) {
        const response = await admin.fetch(urlOf(entry.route, entry.query), { method: entry.method, headers, data: entry.data ?? {} });
        expect(response.status(), `${entry.method} ${entry.route} with ${JSON.stringify(headers)}`).toBe(403);
        expect(await response.json()).toEqual({ error: "This request did not come from a Clearhall page." });
      }
    }
    const crossSite = await admin.post("/api/staff/users", {
      headers: { origin: "https://elsewhere.example.net" },
      data: { name: "Cross Site", email: "cross.site@example.org", role: "admin", password: "long-enough-password" },
    });
    expect(crossSite.status()).toBe(403);
    const { users } = (await (await admin.get("/api/staff/users")).json()) as { users: { email: string }[] };
    expect(users.map((u) => u.email)).not.toContain("cross.site@example.org");
    expect(users.map((u) => u.email)).not.toContain("nosession@example.org");
    const { snippets } = (await (await admin.get("/api/staff/snippets")).json()) as { snippets: { title: string }[] };
    expect(snippets.map((s) => s.title)).not.toContain("Guard check");
  });

  test("bad input to an admin route gets field errors and changes nothing", async () => {
    const admin = sessions.get("admin")!;
    const response = await admin.post("/api/staff/users", { headers: { origin }, data: { name: "X", email: "not-an-email", role: "janitor", password: "short" } });
    expect(response.status()).toBe(400);
    const body = (await response.json()) as { errors: Record<string, string> };
    expect(Object.keys(body.errors).sort()).toEqual(["email", "name", "password", "role"]);
    const wrongType = await admin.post("/api/staff/users", { headers: { origin, "content-type": "text/plain" }, data: "hello" });
    expect(wrongType.status()).toBe(415);
  });
});
