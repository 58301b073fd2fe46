import Link from "next/link";
import { notFound } from "next/navigation";
import { formatDay, formatMinutes, formatOneDecimal, formatUpToOne, formatUpToTwo, formatWhole } from "@/components/air/format";
import { RoomForm } from "@/components/rooms/room-form";
import { RoomRemove } from "@/components/rooms/room-remove";
import { SeatingPlanner } from "@/components/seating/seating-planner";
import { db } from "@/db/client";
import { cfmToLitresPerSecond } from "@/lib/air/units";
import { OUTDOOR_AIR_RATES } from "@/lib/air/ventilation";
import { requireStaffPage } from "@/lib/auth/guard";
import { STAFF_PAGE_ROLES } from "@/lib/auth/staff-nav";
import { roomCo2History } from "@/lib/co2/repository";
import { outdoorAirEstimate } from "@/lib/co2/estimate";
import { figuresOfRoom, latestCo2Days } from "@/lib/rooms/figures";
import { ROOM_USE_LABELS } from "@/lib/rooms/labels";
import { getRoom, roomDataCounts } from "@/lib/rooms/repository";
import { getSchoolBySlug } from "@/lib/schools/repository";
import { airSettings } from "@/lib/settings/air";
import { roomIdSchema } from "@/lib/validation/room";

type Params = { params: Promise<{ id: string }> };

const BASIS = {
  ashrae_62_1_table_6_1: "ASHRAE 62.1, Table 6-1",
  from_memory: "our reading of ASHRAE 62.1, not yet checked against its text",
  as_classroom_9_plus: "held to the classroom (age 9 and up) rates",
} as const;

export async function generateMetadata({ params }: Params) {
  const id = roomIdSchema.safeParse((await params).id);
  const room = id.success ? await getRoom(db(), id.data) : null;
  return { title: room ? `${room.name}, ${room.school}` : "Room" };
}

export default async function RoomPage({ params }: Params) {
  const raw = (await params).id;
  await requireStaffPage(STAFF_PAGE_ROLES.rooms, `/staff/rooms/${encodeURIComponent(raw)}`);
  const id = roomIdSchema.safeParse(raw);
  const room = id.success ? await getRoom(db(), id.data) : null;
  if (!room) notFound();
  const [school, settings, co2, history, data] = await Promise.all([
    getSchoolBySlug(db(), room.schoolSlug),
    airSettings(db()),
    latestCo2Days(db(), [room.id]),
    roomCo2History(db(), room.id),
    roomDataCounts(db(), room.id),
  ]);
  const f = figuresOfRoom(room, settings, co2.get(room.id) ?? null);
  const rate = OUTDOOR_AIR_RATES[room.use];
  const ez = settings.zoneAirDistributionEffectiveness;
  const vbz = rate.rpCfmPerPerson * room.occupancy + rate.raCfmPerFt2 * f.floorAreaFt2;
  const perPersonSupplied = room.occupancy > 0 ? room.outdoorAirCfm / room.occupancy : null;

  return (
    <>
      <p>
        <Link href="/staff/rooms">← All rooms</Link>
      </p>
      <h1 className="mt-2 text-2xl">{room.name}</h1>
      <p className="text-ink-soft">
        {room.school} · {ROOM_USE_LABELS[room.use]} ·{" "}
        <Link href={`/schools/${room.schoolSlug}/air`}>public Fresh air page</Link>
      </p>

      <section aria-labelledby="figures" className="mt-6">
        <h2 id="figures" className="text-xl">
          Figures
        </h2>
        <dl className="mt-2 grid gap-x-6 gap-y-2 sm:grid-cols-2 lg:grid-cols-3" data-testid="room-figures">
          <div>
            <dt className="font-bold">Floor area and volume</dt>
            <dd>
              {formatWhole(f.floorAreaFt2)} ft² · {formatWhole(f.volumeFt3)} ft³
            </dd>
          </div>
          <div>
            <dt className="font-bold">Outdoor air</dt>
            <dd>
              {formatWhole(room.outdoorAirCfm)} cfm ({formatWhole(cfmToLitresPerSecond(room.outdoorAirCfm))} L/s)
              {perPersonSupplied !== null ? `, ${formatOneDecimal(perPersonSupplied)} cfm a person at design occupancy` : ""}
            </dd>
          </div>
          <div>
            <dt className="font-bold">Air changes per hour</dt>
            <dd data-testid="room-ach">
              {formatUpToTwo(f.airChangesPerHour)} from outdoor air · {formatUpToTwo(f.equivalentAirChangesPerHour)} equivalent with{" "}
              {room.airCleaners === 0 ? "no air cleaners" : `${room.airCleaners} × ${formatWhole(room.cadrCfmEach)} cfm CADR`}
            </dd>
          </div>
          <div>
            <dt className="font-bold">Outdoor air the room needs</dt>
            <dd>
              Vbz = Rp·Pz + Ra·Az = {rate.rpCfmPerPerson} × {room.occupancy} + {rate.raCfmPerFt2} × {formatWhole(f.floorAreaFt2)} = {formatUpToOne(vbz)} cfm;
              Voz = Vbz / Ez = {formatUpToOne(vbz)} / {formatOneDecimal(ez)} = {formatUpToOne(f.requiredOutdoorAirCfm)} cfm ({BASIS[rate.basis]})
            </dd>
          </div>
          <div>
            <dt className="font-bold">Meets the outdoor-air rate</dt>
            <dd className={`font-bold ${f.meetsOutdoorAirRate ? "text-leaf" : "text-ember-deep"}`}>
              {f.meetsOutdoorAirRate ? "✓ Yes" : "✗ No"}: {formatWhole(room.outdoorAirCfm)} of {formatUpToOne(f.requiredOutdoorAirCfm)} cfm
            </dd>
          </div>
          <div>
            <dt className="font-bold">Time to remove airborne particles</dt>
            <dd>
              {f.minutesTo99 === null ? "never, with no air moved" : `99% in ${formatMinutes(f.minutesTo99)}, 99.9% in ${formatMinutes(f.minutesTo999 ?? 0)}`} (empty,
              well-mixed room; CDC 2003, Table B.1)
            </dd>
          </div>
          <div>
            <dt className="font-bold">Filter and windows</dt>
            <dd>
              {room.merv ? `MERV-${room.merv}` : "MERV not recorded"} · windows {room.windowsOpen ? "open" : "do not open"}
            </dd>
          </div>
        </dl>
        <p className="mt-3 max-w-prose text-sm text-ink-soft">
          Estimates from the recorded room and airflows. Airflow should be measured by a licensed mechanical engineer or a test-and-balance
          contractor; ventilation does not replace other measures, and health questions go to the local health department.
        </p>
      </section>

      <section aria-labelledby="edit" className="mt-8">
        <h2 id="edit" className="text-xl">
          Edit the room
        </h2>
        <p className="mb-3 max-w-prose text-sm text-ink-soft">Saving updates the public Fresh air page at once.</p>
        <RoomForm room={room} />
      </section>

      <section aria-labelledby="seating" className="mt-8">
        <h2 id="seating" className="text-xl">
          Seating plan
        </h2>
        <p className="mb-3 max-w-prose text-sm text-ink-soft">
          Try a spacing and see how many desks fit. The public page shows the count at {formatUpToOne(settings.seatingSpacingFt)} ft with the default
          clearances, keeping whichever layout seats more.
        </p>
        <SeatingPlanner roomName={room.name} lengthFt={room.lengthFt} widthFt={room.widthFt} designOccupancy={room.occupancy} defaultSpacingFt={settings.seatingSpacingFt} />
      </section>

      <section aria-labelledby="co2" className="mt-8">
        <h2 id="co2" className="text-xl">
          CO2 by school day
        </h2>
        {history.length === 0 ? (
          <p className="mt-2">
            No readings yet. <Link href="/staff/readings">Upload a sensor log</Link>.
          </p>
        ) : (
          <>
            <div className="mt-2 overflow-x-auto" role="region" aria-labelledby="co2" tabIndex={0}>
              <table className="w-full border-collapse text-left text-sm">
                <thead>
                  <tr className="border-b-2 border-harbour align-bottom">
                    <th scope="col" className="py-2 pr-3">Day</th>
                    <th scope="col" className="py-2 pr-3 text-right">Readings</th>
                    <th scope="col" className="py-2 pr-3 text-right">Average (ppm)</th>
                    <th scope="col" className="py-2 pr-3 text-right">Peak (ppm)</th>
                    <th scope="col" className="py-2 pr-3 text-right">Minutes above threshold</th>
                    <th scope="col" className="py-2 pr-3 text-right">Steady level (ppm)</th>
                    <th scope="col" className="py-2 pr-3 text-right">Outdoor air a person, estimate</th>
                  </tr>
                </thead>
                <tbody>
                  {history.map((d) => {
                    const estimate = school ? outdoorAirEstimate({ use: room.use, level: school.level, steadyStatePpm: d.steadyStatePpm, outdoorPpm: settings.co2OutdoorPpm }) : null;
                    return (
                      <tr key={d.day} className="border-b border-paper-line">
                        <td className="py-2 pr-3 whitespace-nowrap">{formatDay(d.day)}</td>
                        <td className="py-2 pr-3 text-right">{d.readings}</td>
                        <td className="py-2 pr-3 text-right">{formatWhole(d.meanPpm)}</td>
                        <td className="py-2 pr-3 text-right">{formatWhole(d.peakPpm)}</td>
                        <td className="py-2 pr-3 text-right">
                          {Math.round(d.minutesAbove)} <span className="text-ink-soft">(&gt; {formatWhole(d.thresholdPpm)})</span>
                        </td>
                        <td className="py-2 pr-3 text-right">{d.steadyStatePpm === null ? "—" : formatWhole(d.steadyStatePpm)}</td>
                        <td className="py-2 pr-3 text-right whitespace-nowrap">
                          {estimate ? `${formatOneDecimal(estimate.cfmPerPerson)} cfm (${formatOneDecimal(estimate.lpsPerPerson)} L/s)` : "—"}
                        </td>
                      </tr>
                    );
                  })}
                </tbody>
              </table>
            </div>
            <p className="mt-2 max-w-prose text-sm text-ink-soft">
              School hours only. The steady level is the highest 30-minute average of the day; the estimate is Vo = G / (Cs − Co) (ASTM D6245) with
              {" "}
              G from Persily &amp; de Jonge (2017) at 1.2 met and 22 °C and outdoor CO2 of {formatWhole(settings.co2OutdoorPpm)} ppm. It holds only
              when the level truly settled with the room full; treat it as an estimate, and compare it with{" "}
              {perPersonSupplied !== null ? `${formatOneDecimal(perPersonSupplied)} cfm a person` : "the outdoor air"} from the recorded airflow. The
              threshold is the district&apos;s choice, not a limit from a standard.
            </p>
          </>
        )}
      </section>

      <section aria-labelledby="remove" className="mt-8">
        <h2 id="remove" className="text-xl">
          Remove the room
        </h2>
        <p className="mb-3 max-w-prose text-sm text-ink-soft">
          For a room that is no longer used for teaching or was added by mistake. A room that only changed is better edited above.
        </p>
        <RoomRemove id={room.id} name={room.name} school={room.school} readings={data.readings} days={data.days} />
      </section>
    </>
  );
}
