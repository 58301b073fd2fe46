// Invented air equipment and CO2 readings for the demo district's rooms, kept beside
// (not inside) seed-data.ts. Figures follow each school's Fresh air page: Tamsin Creek's
// new unit ventilators take MERV-13 filters and every classroom, the library and the
// office have a HEPA air cleaner; Corrow Ridge's unit ventilators take what their makers
// allow (MERV-11 in some rooms, which get an air cleaner, as do the science labs) and
// its gym and office share a MERV-13 central air handler; Eastmere's rooms are served by
// rooftop air handlers with MERV-13 filters, and the windows of its 2009 wing (Rooms
// A104–A106) do not open, so those rooms and the lecture hall have air cleaners.

export interface SeedRoomAir {
  outdoorAirCfm: number;
  airCleaners: number;
  cadrCfmEach: number;
  merv: number | null;
  windowsOpen: boolean;
}

const uv = (outdoorAirCfm: number, merv: number, cleaner: number | null, windowsOpen = true): SeedRoomAir => ({
  outdoorAirCfm,
  airCleaners: cleaner ? 1 : 0,
  cadrCfmEach: cleaner ?? 0,
  merv,
  windowsOpen,
});

export const SEED_ROOM_AIR: Record<string, Record<string, SeedRoomAir>> = {
  "tamsin-creek": {
    "Room 101": uv(420, 13, 350),
    "Room 102": uv(400, 13, 350),
    "Room 103": uv(450, 13, 350),
    "Room 104": uv(380, 13, 350),
    "Room 105": uv(410, 13, 350),
    "Room 106": uv(440, 13, 350),
    "Room 107": uv(360, 13, 400),
    "Room 108": uv(430, 13, 350),
    // The one upstairs room still waits for its new unit ventilator.
    "Room 201": uv(330, 13, 400),
    Library: { outdoorAirCfm: 900, airCleaners: 2, cadrCfmEach: 450, merv: 13, windowsOpen: true },
    Gym: { outdoorAirCfm: 2400, airCleaners: 0, cadrCfmEach: 0, merv: 13, windowsOpen: false },
    "Main office": { outdoorAirCfm: 150, airCleaners: 1, cadrCfmEach: 250, merv: 13, windowsOpen: true },
  },
  "corrow-ridge": {
    "Room 101": uv(480, 13, null),
    "Room 102": uv(460, 11, 300),
    "Room 103": uv(500, 13, null),
    "Room 104": uv(470, 11, 300),
    "Room 105": uv(490, 13, null, false),
    "Room 201": uv(440, 11, 350),
    "Room 202": uv(460, 13, null),
    "Room 203": uv(400, 11, 350),
    "Science lab A": uv(520, 13, 300),
    "Science lab B": uv(500, 13, 300),
    Gym: { outdoorAirCfm: 3000, airCleaners: 0, cadrCfmEach: 0, merv: 13, windowsOpen: false },
    "Main office": { outdoorAirCfm: 180, airCleaners: 0, cadrCfmEach: 0, merv: 13, windowsOpen: true },
  },
  eastmere: {
    "Room A101": uv(480, 13, null),
    "Room A102": uv(470, 13, null),
    "Room A103": uv(500, 13, null),
    "Room A104": uv(460, 13, 400, false),
    "Room A105": uv(470, 13, 400, false),
    "Room A106": uv(420, 13, 400, false),
    "Lecture hall": { outdoorAirCfm: 1400, airCleaners: 2, cadrCfmEach: 400, merv: 13, windowsOpen: false },
    "Chemistry lab": uv(650, 13, null),
    "Biology lab": uv(620, 13, null),
    "Physics lab": uv(560, 13, null),
    Gym: { outdoorAirCfm: 4500, airCleaners: 0, cadrCfmEach: 0, merv: 13, windowsOpen: false },
    "Main office": { outdoorAirCfm: 200, airCleaners: 1, cadrCfmEach: 250, merv: 13, windowsOpen: true },
  },
};

/** A room's equipment, or none recorded (a room added to seed-data.ts without an entry here). */
export function seedRoomAir(school: string, room: string): SeedRoomAir {
  return SEED_ROOM_AIR[school]?.[room] ?? { outdoorAirCfm: 0, airCleaners: 0, cadrCfmEach: 0, merv: null, windowsOpen: false };
}

/** Rooms with a week of demo CO2 readings. */
export const SEED_CO2_ROOMS: Record<string, string[]> = {
  "tamsin-creek": ["Room 101", "Room 104", "Room 107", "Room 201"],
  "corrow-ridge": ["Room 101", "Room 102", "Room 203", "Science lab A"],
  eastmere: ["Room A101", "Room A104", "Room A106", "Chemistry lab"],
};

/** The demo's readings end on the last school day before 2026-12-01. */
export const SEED_CO2_COMPUTED_AT = "2026-11-30T23:00:00.000Z";
export const SEED_CO2_LAST_DAY = "2026-11-30";
export const SEED_CO2_SCHOOL_DAYS = 5;
