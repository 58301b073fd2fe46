import { NextRequest } from "next/server";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { seed } from "@/db/seed";
import { createTestDb, type TestDb } from "../support/test-db";

// The real DELETE /api/staff/rooms/[id] handler over the seeded demo data, signed in as facilities:
// who may call it is covered by tests/e2e/staff-api-guard.spec.ts.
vi.mock("@/lib/auth/guard", () => import("../support/guard-as-facilities"));
const revalidated: string[] = [];
vi.mock("@/lib/rooms/publish", () => ({ revalidateSchoolAir: (slug: string) => revalidated.push(slug) }));

let t: TestDb;
let remove: (id: string) => Promise<Response>;

beforeAll(async () => {
  t = await createTestDb();
  await seed(t.db);
  process.env.DATABASE_URL = t.path;
  const route = await import("@/app/api/staff/rooms/[id]/route");
  remove = (id) =>
    route.DELETE(new NextRequest(`http://localhost:3000/api/staff/rooms/${id}`, { method: "DELETE", headers: { origin: "http://localhost:3000" } }), {
      params: Promise.resolve({ id }),
    });
});
afterAll(async () => t.cleanup());

const count = async (table: "rooms" | "co2_readings" | "co2_daily", roomId?: number) => {
  let query = t.db.selectFrom(table).select((eb) => eb.fn.countAll<number>().as("n"));
  if (roomId !== undefined) query = query.where(table === "rooms" ? "id" : "room_id", "=", roomId);
  return Number((await query.executeTakeFirstOrThrow()).n);
};

describe("removing a room", () => {
  it("takes the room, its CO2 readings and day summaries away in one step, says how many, and refreshes the school's pages", async () => {
    // A demo room with readings: the one with the most.
    const busiest = await t.db
      .selectFrom("co2_readings")
      .select((eb) => ["room_id", eb.fn.countAll<number>().as("n")])
      .groupBy("room_id")
      .orderBy("n", "desc")
      .executeTakeFirstOrThrow();
    const roomId = busiest.room_id;
    const room = await t.db
      .selectFrom("rooms")
      .innerJoin("schools", "schools.id", "rooms.school_id")
      .select(["rooms.name", "schools.name as school", "schools.slug"])
      .where("rooms.id", "=", roomId)
      .executeTakeFirstOrThrow();
    const readings = await count("co2_readings", roomId);
    const days = await count("co2_daily", roomId);
    expect(readings).toBeGreaterThan(0);
    expect(days).toBeGreaterThan(0);
    const [roomsBefore, readingsBefore, daysBefore] = [await count("rooms"), await count("co2_readings"), await count("co2_daily")];

    const response = await remove(String(roomId));
    expect(response.status).toBe(200);
    expect(await response.json()).toEqual({ removed: { id: roomId, name: room.name, school: room.school, schoolSlug: room.slug, readings, days } });

    expect(await count("rooms", roomId)).toBe(0);
    expect(await count("co2_readings", roomId)).toBe(0);
    expect(await count("co2_daily", roomId)).toBe(0);
    // Nothing else went with it.
    expect(await count("rooms")).toBe(roomsBefore - 1);
    expect(await count("co2_readings")).toBe(readingsBefore - readings);
    expect(await count("co2_daily")).toBe(daysBefore - days);
    expect(revalidated).toEqual([room.slug]);

    // Asked again, there is nothing to remove.
    const again = await remove(String(roomId));
    expect(again.status).toBe(404);
    expect(await again.json()).toEqual({ error: "No room has this id." });
  });

  it("answers 404 for an id that is not a room id, and removes nothing", async () => {
    const before = await count("rooms");
    for (const id of ["abc", "0", "-3", "999999"]) expect((await remove(id)).status, id).toBe(404);
    expect(await count("rooms")).toBe(before);
  });
});
