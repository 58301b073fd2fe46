import { minutesToRemove, REMOVAL_99, REMOVAL_99_9 } from "./removal";
import {
  airChangesPerHour,
  breathingZoneOutdoorAir,
  equivalentAirChangesPerHour,
  floorAreaFt2,
  meetsOutdoorAirRate,
  roomVolumeFt3,
  zoneOutdoorAir,
  type RoomUse,
} from "./ventilation";

export interface RoomAirRecord {
  lengthFt: number;
  widthFt: number;
  ceilingFt: number;
  occupancy: number;
  use: RoomUse;
  outdoorAirCfm: number;
  airCleaners: number;
  cadrCfmEach: number;
}

export interface RoomFigures {
  floorAreaFt2: number;
  volumeFt3: number;
  outdoorAirCfm: number;
  airChangesPerHour: number;
  equivalentAirChangesPerHour: number;
  /** Zone outdoor air Voz for the room's use and occupancy, cfm. */
  requiredOutdoorAirCfm: number;
  meetsOutdoorAirRate: boolean;
  /** At the equivalent ACH; null when that is 0 (no air moved). */
  minutesTo99: number | null;
  minutesTo999: number | null;
}

/** Unrounded figures for one room; round only where they are shown. */
export function roomFigures(room: RoomAirRecord, options: { zoneAirDistributionEffectiveness?: number } = {}): RoomFigures {
  const area = floorAreaFt2(room);
  const volume = roomVolumeFt3(room);
  const ach = airChangesPerHour(room.outdoorAirCfm, volume);
  const equivalentAch = equivalentAirChangesPerHour({
    outdoorAirCfm: room.outdoorAirCfm,
    volumeFt3: volume,
    airCleaners: room.airCleaners,
    cadrCfmEach: room.cadrCfmEach,
  });
  const required = zoneOutdoorAir(
    breathingZoneOutdoorAir({ use: room.use, people: room.occupancy, floorAreaFt2: area }),
    options.zoneAirDistributionEffectiveness,
  );
  return {
    floorAreaFt2: area,
    volumeFt3: volume,
    outdoorAirCfm: room.outdoorAirCfm,
    airChangesPerHour: ach,
    equivalentAirChangesPerHour: equivalentAch,
    requiredOutdoorAirCfm: required,
    meetsOutdoorAirRate: meetsOutdoorAirRate(room.outdoorAirCfm, required),
    minutesTo99: minutesToRemove(REMOVAL_99, equivalentAch),
    minutesTo999: minutesToRemove(REMOVAL_99_9, equivalentAch),
  };
}
