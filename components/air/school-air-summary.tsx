import Link from "next/link";
import { db } from "@/db/client";
import { schoolRoomFigures } from "@/lib/rooms/figures";
import { formatDay, formatWhole } from "./format";

/** Five-air-changes goal: CDC, "Improving Ventilation in Buildings" (2023). */
const CLEAN_AIR_GOAL_ACH = 5;

/** The school's room figures in three sentences, for its overview page. */
export async function SchoolAirSummary({ school }: { school: string }) {
  const figures = await schoolRoomFigures(db(), school);
  if (!figures || figures.rooms.length === 0) return null;
  const rooms = figures.rooms;
  const meeting = rooms.filter((r) => r.meetsOutdoorAirRate).length;
  const atGoal = rooms.filter((r) => r.equivalentAirChangesPerHour >= CLEAN_AIR_GOAL_ACH).length;
  const withCo2 = rooms.filter((r) => r.co2 !== null);
  const latestDay = withCo2.map((r) => r.co2!.day).sort().at(-1);
  const thatDay = withCo2.filter((r) => r.co2!.day === latestDay);
  const highest = thatDay.sort((a, b) => b.co2!.peakPpm - a.co2!.peakPpm)[0];
  return (
    <section aria-labelledby="air-glance" className="mt-section">
      <h2 id="air-glance" className="text-2xl">
        Fresh air, room by room
      </h2>
      <ul className="mt-3 list-disc space-y-1 pl-6" data-testid="school-air-summary">
        <li>
          {meeting} of {rooms.length} rooms get the outdoor air the ventilation standard asks for when they are full.
        </li>
        <li>
          {atGoal} of {rooms.length} rooms reach {CLEAN_AIR_GOAL_ACH} air changes of clean air an hour, counting portable air cleaners.
        </li>
        {highest && latestDay ? (
          <li>
            On {formatDay(latestDay)}, the highest CO2 reading in school hours among the {thatDay.length} rooms with sensor logs was{" "}
            {formatWhole(highest.co2!.peakPpm)} ppm, in {highest.room}.
          </li>
        ) : null}
      </ul>
      <p className="mt-2">
        <Link href={`/schools/${school}/air`}>See every room&apos;s figures and what they mean</Link>. Figures are estimates.
      </p>
    </section>
  );
}
