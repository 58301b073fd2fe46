import { expect, test } from "@playwright/test";
import { DEMO_ACCOUNTS, signInThroughApi } from "./support/staff";

/** Every staff route handler, with a body that would be valid, so only the guard can refuse it. */
const STAFF_ROUTES: { method: "GET" | "POST" | "PATCH"; path: string; data?: unknown }[] = [
  { method: "GET", path: "/api/staff/me" },
  { method: "GET", path: "/api/staff/users" },
  { method: "POST", path: "/api/staff/users", data: { name: "No Session", email: "nosession@example.org", role: "admin", password: "long-enough-password" } },
  { method: "PATCH", path: "/api/staff/users/1", data: { role: "communications" } },
  { method: "PATCH", path: "/api/staff/projects/1", data: { status: "finished", statusDate: "2026-11-30" } },
  { method: "POST", path: "/api/staff/rooms/import" },
  { method: "POST", path: "/api/staff/rooms/import?dryRun=1" },
  { method: "GET", path: "/api/staff/rooms/export" },
  { method: "GET", path: "/api/staff/rooms/1" },
  { method: "PATCH", path: "/api/staff/rooms/1", data: { name: "Room 101", use: "classroom_5_8", units: "us", length: 30, width: 30, ceiling: 9.5, occupancy: 22, outdoorAir: 420, airCleaners: 0, merv: 13, windowsOpen: true } },
  { method: "POST", path: "/api/staff/rooms", data: { school: "tamsin-creek", name: "Room 999", use: "office", units: "us", length: 10, width: 10, ceiling: 9, occupancy: 2, outdoorAir: 50, airCleaners: 0, merv: null, windowsOpen: false } },
  { method: "POST", path: "/api/staff/co2/import" },
];

for (const route of STAFF_ROUTES) {
  test(`${route.method} ${route.path} without a session answers 401 and changes nothing`, async ({ request }) => {
    const response = await request.fetch(route.path, { method: route.method, data: route.data });
    expect(response.status()).toBe(401);
    expect(await response.json()).toEqual({ error: expect.any(String) });
  });
}

test("a state-changing staff request from another site is refused even with a session", async ({ request }) => {
  expect(await signInThroughApi(request, DEMO_ACCOUNTS.admin)).toBe(200);
  const response = await request.post("/api/staff/users", {
    headers: { origin: "https://elsewhere.example.net" },
    data: { name: "Cross Site", email: "cross.site@example.org", role: "admin", password: "long-enough-password" },
  });
  expect(response.status()).toBe(403);
  const { users } = (await (await request.get("/api/staff/users")).json()) as { users: { email: string }[] };
  expect(users.map((u) => u.email)).not.toContain("cross.site@example.org");
});

test("bad input to an admin route gets field errors and changes nothing", async ({ request }) => {
  expect(await signInThroughApi(request, DEMO_ACCOUNTS.admin)).toBe(200);
  const response = await request.post("/api/staff/users", { data: { name: "X", email: "not-an-email", role: "janitor", password: "short" } });
  expect(response.status()).toBe(400);
  const body = (await response.json()) as { errors: Record<string, string> };
  expect(Object.keys(body.errors).sort()).toEqual(["email", "name", "password", "role"]);
  const wrongType = await request.post("/api/staff/users", { headers: { "content-type": "text/plain" }, data: "hello" });
  expect(wrongType.status()).toBe(415);
});
