import Link from "next/link";
import { formatOneDecimal, formatUpToOne, formatWhole } from "@/components/air/format";
import { RoomImport } from "@/components/rooms/room-import";
import { Notice } from "@/components/ui/notice";
import { db } from "@/db/client";
import { requireStaffPage } from "@/lib/auth/guard";
import { STAFF_PAGE_ROLES } from "@/lib/auth/staff-nav";
import { figuresOfRoom, latestCo2Days } from "@/lib/rooms/figures";
import { ROOM_USE_LABELS } from "@/lib/rooms/labels";
import { ROOM_CSV_COLUMNS } from "@/lib/rooms/csv";
import { listRooms } from "@/lib/rooms/repository";
import { listSchools } from "@/lib/schools/repository";
import { airSettings } from "@/lib/settings/air";

export const metadata = { title: "Rooms" };

/** `?removed=` names the room the room page has just removed; it is said once at the top, cut to this length. */
const REMOVED_MAX_CHARS = 200;

export default async function RoomsPage({ searchParams }: { searchParams: Promise<{ removed?: string | string[] }> }) {
  await requireStaffPage(STAFF_PAGE_ROLES.rooms, "/staff/rooms");
  const removedParam = (await searchParams).removed;
  const removed = typeof removedParam === "string" ? removedParam.slice(0, REMOVED_MAX_CHARS) : null;
  const [schools, rooms, settings] = await Promise.all([listSchools(db()), listRooms(db()), airSettings(db())]);
  const co2 = await latestCo2Days(db(), rooms.map((r) => r.id));
  const spacing = formatUpToOne(settings.seatingSpacingFt);
  return (
    <>
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <h1 className="text-2xl">Rooms</h1>
          <p className="mt-1 max-w-prose text-ink-soft">
            Each room&apos;s size, outdoor air and air cleaners, and the figures families see on the school&apos;s Fresh air page. Open a room to edit
            it or to plan its seating.
          </p>
        </div>
        <p className="flex flex-wrap gap-3">
          <Link href="/staff/rooms/new" className="inline-flex min-h-11 items-center rounded-plate border-2 border-harbour bg-harbour px-4 font-bold text-paper no-underline hover:bg-harbour-deep">
            Add a room
          </Link>
          <a href="/api/staff/rooms/export" className="inline-flex min-h-11 items-center rounded-plate border-2 border-harbour px-4 font-bold text-harbour-deep no-underline hover:bg-harbour-soft" download>
            Export all rooms (CSV)
          </a>
        </p>
      </div>

      {removed ? (
        <div role="status" data-testid="room-removed">
          <Notice tone="success" title={`Removed: ${removed}`}>
            The school&apos;s Fresh air page no longer lists it, and the room&apos;s CO2 readings, if it had any, are gone with it.
          </Notice>
        </div>
      ) : null}

      <section aria-labelledby="import-heading" className="mt-6 rounded-plate border-2 border-paper-line bg-white p-4">
        <h2 id="import-heading" className="text-xl">
          Import rooms from a CSV file
        </h2>
        <p className="mt-1 max-w-prose text-sm">One row a room, with this header (feet and cfm):</p>
        <pre className="mt-1 max-w-full overflow-x-auto rounded-plate bg-paper-deep p-2 text-sm" tabIndex={0} aria-label="Header for feet and cfm">
          {ROOM_CSV_COLUMNS.us.join(",")}
        </pre>
        <p className="mt-2 max-w-prose text-sm">
          For metres and litres per second, use <code>length_m</code>, <code>width_m</code>, <code>ceiling_m</code>, <code>outdoor_air_ls</code> and{" "}
          <code>cadr_ls_each</code> instead. <code>use</code> is one of {Object.keys(ROOM_USE_LABELS).join(", ")}; <code>windows_open</code> is yes or no;
          leave <code>merv</code> empty when not known. A row for a room that exists changes it; any other row adds a room; rooms not in the file stay as
          they are. The file is checked first, and nothing is saved unless every row is good.
        </p>
        <div className="mt-3">
          <RoomImport />
        </div>
      </section>

      {schools.map((school) => {
        const own = rooms.filter((r) => r.schoolSlug === school.slug);
        return (
          <section key={school.slug} aria-labelledby={`rooms-${school.slug}`} className="mt-8">
            <div className="flex flex-wrap items-baseline justify-between gap-2">
              <h2 id={`rooms-${school.slug}`} className="text-xl">
                {school.name} <span className="text-base font-normal text-ink-soft">({own.length} rooms)</span>
              </h2>
              <a href={`/api/staff/rooms/export?school=${school.slug}`} download>
                Export {school.name} (CSV)
              </a>
            </div>
            <div className="mt-2 overflow-x-auto" role="region" aria-labelledby={`rooms-${school.slug}`} tabIndex={0}>
              <table className="w-full border-collapse text-left text-sm" data-testid={`staff-rooms-${school.slug}`}>
                <thead>
                  <tr className="border-b-2 border-harbour align-bottom">
                    <th scope="col" className="py-2 pr-3">Room</th>
                    <th scope="col" className="py-2 pr-3">Use</th>
                    <th scope="col" className="py-2 pr-3 text-right">Floor (ft)</th>
                    <th scope="col" className="py-2 pr-3 text-right">Ceiling (ft)</th>
                    <th scope="col" className="py-2 pr-3 text-right">Occupancy</th>
                    <th scope="col" className="py-2 pr-3 text-right">Outdoor air (cfm)</th>
                    <th scope="col" className="py-2 pr-3">Air cleaners</th>
                    <th scope="col" className="py-2 pr-3 text-right">MERV</th>
                    <th scope="col" className="py-2 pr-3">Windows</th>
                    <th scope="col" className="py-2 pr-3 text-right">ACH</th>
                    <th scope="col" className="py-2 pr-3 text-right">Equivalent ACH</th>
                    <th scope="col" className="py-2 pr-3">Outdoor-air rate</th>
                    <th scope="col" className="py-2 pr-3 text-right">Desks at {spacing} ft</th>
                    <th scope="col" className="py-2 pr-3 text-right">Latest CO2 peak</th>
                  </tr>
                </thead>
                <tbody>
                  {own.map((r) => {
                    const f = figuresOfRoom(r, settings, co2.get(r.id) ?? null);
                    return (
                      <tr key={r.id} className="border-b border-paper-line">
                        <td className="py-2 pr-3 font-bold">
                          <Link href={`/staff/rooms/${r.id}`}>{r.name}</Link>
                        </td>
                        <td className="py-2 pr-3">{ROOM_USE_LABELS[r.use] ?? r.use}</td>
                        <td className="py-2 pr-3 text-right whitespace-nowrap">
                          {formatUpToOne(r.lengthFt)} × {formatUpToOne(r.widthFt)}
                        </td>
                        <td className="py-2 pr-3 text-right">{formatUpToOne(r.ceilingFt)}</td>
                        <td className="py-2 pr-3 text-right">{r.occupancy}</td>
                        <td className="py-2 pr-3 text-right">{formatWhole(r.outdoorAirCfm)}</td>
                        <td className="py-2 pr-3 whitespace-nowrap">{r.airCleaners > 0 ? `${r.airCleaners} × ${formatWhole(r.cadrCfmEach)} cfm` : "none"}</td>
                        <td className="py-2 pr-3 text-right">{r.merv ?? "—"}</td>
                        <td className="py-2 pr-3">{r.windowsOpen ? "open" : "closed"}</td>
                        <td className="py-2 pr-3 text-right">{formatOneDecimal(f.airChangesPerHour)}</td>
                        <td className="py-2 pr-3 text-right">{formatOneDecimal(f.equivalentAirChangesPerHour)}</td>
                        <td className={`py-2 pr-3 whitespace-nowrap font-bold ${f.meetsOutdoorAirRate ? "text-leaf" : "text-ember-deep"}`}>
                          {f.meetsOutdoorAirRate ? "✓ meets" : "✗ short"} <span className="font-normal text-ink-soft">({formatWhole(f.requiredOutdoorAirCfm)} needed)</span>
                        </td>
                        <td className="py-2 pr-3 text-right">{f.seats.count}</td>
                        <td className="py-2 pr-3 text-right">{f.co2 ? `${formatWhole(f.co2.peakPpm)} ppm` : "—"}</td>
                      </tr>
                    );
                  })}
                </tbody>
              </table>
            </div>
          </section>
        );
      })}
    </>
  );
}
