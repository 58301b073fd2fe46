import type { DB } from "@/db/connection";

export interface RoomRow {
  id: number;
  school: string;
  schoolSlug: string;
  name: string;
  use: string;
  lengthFt: number;
  widthFt: number;
  ceilingFt: number;
  occupancy: number;
}

export async function listRooms(db: DB, schoolSlug?: string): Promise<RoomRow[]> {
  let query = db
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
    ])
    .orderBy("schools.id")
    .orderBy("rooms.name");
  if (schoolSlug) query = query.where("schools.slug", "=", schoolSlug);
  return query.execute();
}
