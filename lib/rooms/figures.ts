import type { DB } from "@/db/connection";
import { roomFigures } from "@/lib/air/room-figures";
import { seatsThatFit, type SeatLayout } from "@/lib/seating/layout";
import { airSettings, type AirSettings } from "@/lib/settings/air";
import { getSchoolBySlug } from "@/lib/schools/repository";
import { listRooms, type RoomRow } from "./repository";

export interface RoomCo2Day {
  day: string;
  meanPpm: number;
  peakPpm: number;
  minutesAbove: number;
}

/** One room as the public API and the Fresh air page show it; numbers unrounded. */
export interface PublicRoomFigures {
  room: string;
  use: string;
  floorAreaFt2: number;
  volumeFt3: number;
  outdoorAirCfm: number;
  airChangesPerHour: number;
  equivalentAirChangesPerHour: number;
  requiredOutdoorAirCfm: number;
  meetsOutdoorAirRate: boolean;
  minutesTo99: number | null;
  minutesTo999: number | null;
  seats: { spacingFt: number; count: number; layout: SeatLayout };
  co2: RoomCo2Day | null;
}

export interface SchoolRoomFigures {
  school: { slug: string; name: string };
  settings: AirSettings;
  rooms: PublicRoomFigures[];
  /** Extra facts the page shows beside the figures; not part of the API. */
  details: Map<string, { airCleaners: number; id: number }>;
}

/** The most recent school day with figures, per room. */
export async function latestCo2Days(db: DB, roomIds: number[]): Promise<Map<number, RoomCo2Day>> {
  if (roomIds.length === 0) return new Map();
  const rows = await db
    .selectFrom("co2_daily as d")
    .select(["d.room_id", "d.day", "d.mean_ppm", "d.peak_ppm", "d.minutes_above"])
    .where("d.room_id", "in", roomIds)
    .where((eb) => eb("d.day", "=", eb.selectFrom("co2_daily as e").select((e) => e.fn.max("e.day").as("latest")).whereRef("e.room_id", "=", "d.room_id")))
    .execute();
  return new Map(rows.map((r) => [r.room_id, { day: r.day, meanPpm: r.mean_ppm, peakPpm: r.peak_ppm, minutesAbove: r.minutes_above }]));
}

export function figuresOfRoom(room: RoomRow, settings: AirSettings, co2: RoomCo2Day | null): PublicRoomFigures {
  const figures = roomFigures(room, { zoneAirDistributionEffectiveness: settings.zoneAirDistributionEffectiveness });
  const seats = seatsThatFit({ lengthFt: room.lengthFt, widthFt: room.widthFt, spacingFt: settings.seatingSpacingFt });
  return {
    room: room.name,
    use: room.use,
    ...figures,
    seats: { spacingFt: seats.spacingFt, count: seats.count, layout: seats.layout },
    co2,
  };
}

export async function schoolRoomFigures(db: DB, slug: string): Promise<SchoolRoomFigures | null> {
  const school = await getSchoolBySlug(db, slug);
  if (!school) return null;
  const [rooms, settings] = await Promise.all([listRooms(db, slug), airSettings(db)]);
  const co2 = await latestCo2Days(db, rooms.map((r) => r.id));
  return {
    school: { slug: school.slug, name: school.name },
    settings,
    rooms: rooms.map((room) => figuresOfRoom(room, settings, co2.get(room.id) ?? null)),
    details: new Map(rooms.map((r) => [r.name, { airCleaners: r.airCleaners, id: r.id }])),
  };
}
