import type { DB } from "@/db/connection";
import { isRoomUse, type RoomUse } from "@/lib/air/ventilation";
import type { RoomRecord } from "@/lib/validation/room";

export interface RoomRow extends RoomRecord {
  id: number;
  school: string;
  schoolSlug: string;
  updatedAt: string;
}

function roomsQuery(db: DB) {
  return db
    .selectFrom("rooms")
    .innerJoin("schools", "schools.id", "rooms.school_id")
    .select([
      "rooms.id",
      "schools.name as school",
      "schools.slug as schoolSlug",
      "rooms.name",
      "rooms.use",
      "rooms.length_ft as lengthFt",
      "rooms.width_ft as widthFt",
      "rooms.ceiling_ft as ceilingFt",
      "rooms.occupancy",
      "rooms.outdoor_air_cfm as outdoorAirCfm",
      "rooms.air_cleaners as airCleaners",
      "rooms.cadr_cfm_each as cadrCfmEach",
      "rooms.merv",
      "rooms.windows_open as windowsOpen",
      "rooms.updated_at as updatedAt",
    ]);
}

type RawRoom = Awaited<ReturnType<ReturnType<typeof roomsQuery>["execute"]>>[number];

function toRoomRow(raw: RawRoom): RoomRow {
  // A use written before the list was fixed is shown as "other" rather than failing the page.
  const use: RoomUse = isRoomUse(raw.use) ? raw.use : "other";
  return { ...raw, use, windowsOpen: raw.windowsOpen === 1 };
}

export async function listRooms(db: DB, schoolSlug?: string): Promise<RoomRow[]> {
  let query = roomsQuery(db).orderBy("schools.id").orderBy("rooms.name");
  if (schoolSlug) query = query.where("schools.slug", "=", schoolSlug);
  return (await query.execute()).map(toRoomRow);
}

export async function getRoom(db: DB, id: number): Promise<RoomRow | null> {
  const raw = await roomsQuery(db).where("rooms.id", "=", id).executeTakeFirst();
  return raw ? toRoomRow(raw) : null;
}

export function roomColumns(room: RoomRecord) {
  return {
    name: room.name,
    use: room.use,
    length_ft: room.lengthFt,
    width_ft: room.widthFt,
    ceiling_ft: room.ceilingFt,
    occupancy: room.occupancy,
    outdoor_air_cfm: room.outdoorAirCfm,
    air_cleaners: room.airCleaners,
    cadr_cfm_each: room.cadrCfmEach,
    merv: room.merv,
    windows_open: room.windowsOpen ? 1 : 0,
  };
}

export class RoomNameTakenError extends Error {
  constructor(name: string) {
    super(`This school already has a room named “${name}”.`);
    this.name = "RoomNameTakenError";
  }
}

async function nameTaken(db: DB, schoolId: number, name: string, exceptId?: number): Promise<boolean> {
  let query = db.selectFrom("rooms").select("id").where("school_id", "=", schoolId).where("name", "=", name);
  if (exceptId !== undefined) query = query.where("id", "!=", exceptId);
  return (await query.executeTakeFirst()) !== undefined;
}

export async function updateRoom(db: DB, id: number, room: RoomRecord, actorId: number | null, now = new Date().toISOString()): Promise<RoomRow> {
  return db.transaction().execute(async (trx) => {
    const current = await trx.selectFrom("rooms").select(["id", "school_id"]).where("id", "=", id).executeTakeFirstOrThrow();
    if (await nameTaken(trx, current.school_id, room.name, id)) throw new RoomNameTakenError(room.name);
    await trx
      .updateTable("rooms")
      .set({ ...roomColumns(room), updated_at: now, updated_by: actorId })
      .where("id", "=", id)
      .execute();
    const row = await getRoom(trx, id);
    if (!row) throw new Error(`room ${id} vanished while it was saved`);
    return row;
  });
}

export async function createRoom(db: DB, schoolId: number, room: RoomRecord, actorId: number | null, now = new Date().toISOString()): Promise<RoomRow> {
  return db.transaction().execute(async (trx) => {
    if (await nameTaken(trx, schoolId, room.name)) throw new RoomNameTakenError(room.name);
    const { id } = await trx
      .insertInto("rooms")
      .values({ school_id: schoolId, ...roomColumns(room), created_at: now, updated_at: now, updated_by: actorId })
      .returning("id")
      .executeTakeFirstOrThrow();
    const row = await getRoom(trx, id);
    if (!row) throw new Error(`room ${id} vanished while it was saved`);
    return row;
  });
}

export interface RemovedRoom {
  id: number;
  name: string;
  school: string;
  schoolSlug: string;
  /** CO2 readings and school-day summaries removed with it. */
  readings: number;
  days: number;
}

/**
 * Removes a room and, with it (the foreign keys cascade), its CO2 readings and day summaries, in
 * one transaction; null when no room has the id. The counts are what the confirmation warned of.
 */
export async function deleteRoom(db: DB, id: number): Promise<RemovedRoom | null> {
  return db.transaction().execute(async (trx) => {
    const room = await getRoom(trx, id);
    if (!room) return null;
    const { readings, days } = await roomDataCounts(trx, id);
    await trx.deleteFrom("rooms").where("id", "=", id).execute();
    return { id, name: room.name, school: room.school, schoolSlug: room.schoolSlug, readings, days };
  });
}

/** How many CO2 readings and school days a room holds: what removing it would take away. */
export async function roomDataCounts(db: DB, id: number): Promise<{ readings: number; days: number }> {
  const count = async (table: "co2_readings" | "co2_daily") =>
    Number((await db.selectFrom(table).select((eb) => eb.fn.countAll<number>().as("n")).where("room_id", "=", id).executeTakeFirstOrThrow()).n);
  return { readings: await count("co2_readings"), days: await count("co2_daily") };
}
