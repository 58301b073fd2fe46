export const ROOM_USES = [
  "classroom_5_8",
  "classroom_9_plus",
  "lecture",
  "science_lab",
  "gym",
  "office",
  "other",
] as const;

export type RoomUse = (typeof ROOM_USES)[number];

export interface OutdoorAirRate {
  /** Rp, outdoor air per person, cfm/person. */
  readonly rpCfmPerPerson: number;
  /** Ra, outdoor air per floor area, cfm/ft². */
  readonly raCfmPerFt2: number;
  /** Default occupant density per 1000 ft², or null when we hold no trusted figure. */
  readonly defaultOccupantsPer1000Ft2: number | null;
  /** Where the figure comes from, for display beside it. */
  readonly basis: "ashrae_62_1_table_6_1" | "from_memory" | "as_classroom_9_plus";
}

const CLASSROOM_9_PLUS: OutdoorAirRate = {
  rpCfmPerPerson: 10,
  raCfmPerFt2: 0.12,
  defaultOccupantsPer1000Ft2: 35,
  basis: "ashrae_62_1_table_6_1",
};

// ANSI/ASHRAE 62.1 Table 6-1, minimum ventilation rates in the breathing zone.
export const OUTDOOR_AIR_RATES: Readonly<Record<RoomUse, OutdoorAirRate>> = {
  classroom_5_8: { rpCfmPerPerson: 10, raCfmPerFt2: 0.12, defaultOccupantsPer1000Ft2: 25, basis: "ashrae_62_1_table_6_1" },
  classroom_9_plus: CLASSROOM_9_PLUS,
  lecture: { rpCfmPerPerson: 7.5, raCfmPerFt2: 0.06, defaultOccupantsPer1000Ft2: 65, basis: "ashrae_62_1_table_6_1" },
  science_lab: { rpCfmPerPerson: 10, raCfmPerFt2: 0.18, defaultOccupantsPer1000Ft2: 25, basis: "ashrae_62_1_table_6_1" },
  // Gym and office rates are from memory, unconfirmed against the standard's text.
  gym: { rpCfmPerPerson: 20, raCfmPerFt2: 0.18, defaultOccupantsPer1000Ft2: null, basis: "from_memory" },
  office: { rpCfmPerPerson: 5, raCfmPerFt2: 0.06, defaultOccupantsPer1000Ft2: 5, basis: "from_memory" },
  // A room we cannot classify is held to the classroom (age 9 plus) rates.
  other: { ...CLASSROOM_9_PLUS, basis: "as_classroom_9_plus" },
};

export function isRoomUse(value: string): value is RoomUse {
  return (ROOM_USES as readonly string[]).includes(value);
}

export function floorAreaFt2(room: { lengthFt: number; widthFt: number }): number {
  return room.lengthFt * room.widthFt;
}

export function roomVolumeFt3(room: { lengthFt: number; widthFt: number; ceilingFt: number }): number {
  return room.lengthFt * room.widthFt * room.ceilingFt;
}

/** ACH = cfm × 60 / ft³. */
export function airChangesPerHour(airflowCfm: number, volumeFt3: number): number {
  if (!(volumeFt3 > 0)) throw new RangeError(`room volume must be positive, got ${volumeFt3}`);
  return (airflowCfm * 60) / volumeFt3;
}

/**
 * Outdoor air plus portable air cleaners, each turned into air changes and added
 * (CDC, "Ventilation in Buildings", 2023).
 */
export function equivalentAirChangesPerHour(input: {
  outdoorAirCfm: number;
  volumeFt3: number;
  airCleaners: number;
  cadrCfmEach: number;
}): number {
  const cleanerCfm = input.airCleaners * input.cadrCfmEach;
  return airChangesPerHour(input.outdoorAirCfm, input.volumeFt3) + airChangesPerHour(cleanerCfm, input.volumeFt3);
}

/** Vbz = Rp·Pz + Ra·Az, cfm. */
export function breathingZoneOutdoorAir(input: { use: RoomUse; people: number; floorAreaFt2: number }): number {
  const rate = OUTDOOR_AIR_RATES[input.use];
  return rate.rpCfmPerPerson * input.people + rate.raCfmPerFt2 * input.floorAreaFt2;
}

/** Voz = Vbz / Ez. Ez 1.0 is ceiling supply of cool air; 0.8 is warm air supplied and returned at the ceiling. */
export function zoneOutdoorAir(breathingZoneCfm: number, zoneAirDistributionEffectiveness = 1.0): number {
  if (!(zoneAirDistributionEffectiveness > 0)) {
    throw new RangeError(`Ez must be positive, got ${zoneAirDistributionEffectiveness}`);
  }
  return breathingZoneCfm / zoneAirDistributionEffectiveness;
}

// A hair of tolerance so a supply equal to the requirement is not failed by float rounding.
const CFM_TOLERANCE = 1e-9;

export function meetsOutdoorAirRate(suppliedCfm: number, requiredCfm: number): boolean {
  return suppliedCfm + CFM_TOLERANCE >= requiredCfm;
}
