import { formatClock, formatOneDecimal, formatUpToOne, formatWhole } from "@/components/air/format";
import { AirSettingsForm } from "@/components/co2/air-settings-form";
import { Co2Upload } from "@/components/co2/co2-upload";
import { db } from "@/db/client";
import { requireStaffPage } from "@/lib/auth/guard";
import { STAFF_PAGE_ROLES } from "@/lib/auth/staff-nav";
import { CO2_CSV_COLUMNS, CO2_PPM_RANGE } from "@/lib/co2/import";
import { co2Totals, recentCo2Imports } from "@/lib/co2/repository";
import { AIR_SETTINGS_ROLES, airSettings } from "@/lib/settings/air";
import { districtTimeZone } from "@/lib/settings/district";

export const metadata = { title: "CO2 readings" };


export default async function ReadingsPage() {
  const user = await requireStaffPage(STAFF_PAGE_ROLES.readings, "/staff/readings");
  const [imports, totals, settings, timeZone] = await Promise.all([recentCo2Imports(db()), co2Totals(db()), airSettings(db()), districtTimeZone(db())]);
  const canSet = (AIR_SETTINGS_ROLES as readonly string[]).includes(user.role);
  const when = new Intl.DateTimeFormat("en-US", { dateStyle: "medium", timeStyle: "short", timeZone });
  return (
    <>
      <h1 className="text-2xl">CO2 readings</h1>
      <p className="mt-1 max-w-prose text-ink-soft">
        {formatWhole(totals.readings)} readings stored; daily figures for {formatWhole(totals.roomDays)} room-days. Each upload adds readings and
        recomputes the daily figures of the days it covers; the schools&apos; Fresh air pages show them at once.
      </p>

      <section aria-labelledby="upload" className="mt-6 rounded-plate border-2 border-paper-line bg-white p-4">
        <h2 id="upload" className="text-xl">
          Upload a sensor log
        </h2>
        <p className="mt-1 max-w-prose text-sm">
          A CSV with the header <code>{CO2_CSV_COLUMNS.join(",")}</code>: the school&apos;s short name, the room name as on the Rooms page, the time
          with its offset (like <code>2026-11-30T08:05:00-05:00</code>) and CO2 in ppm ({CO2_PPM_RANGE.min}–{formatWhole(CO2_PPM_RANGE.max)}). Files of
          any size up to 200 MB. A reading already stored for the same room and time is ignored, so uploading a file twice is safe. If any row is wrong,
          nothing is saved and the rows are listed.
        </p>
        <div className="mt-3">
          <Co2Upload />
        </div>
      </section>

      <section aria-labelledby="recent" className="mt-8">
        <h2 id="recent" className="text-xl">
          Recent uploads
        </h2>
        {imports.length === 0 ? (
          <p className="mt-2">None yet.</p>
        ) : (
          <div className="mt-2 overflow-x-auto" role="region" aria-labelledby="recent" tabIndex={0}>
            <table className="w-full border-collapse text-left text-sm">
              <thead>
                <tr className="border-b-2 border-harbour">
                  <th scope="col" className="py-2 pr-3">File</th>
                  <th scope="col" className="py-2 pr-3">Uploaded</th>
                  <th scope="col" className="py-2 pr-3">By</th>
                  <th scope="col" className="py-2 pr-3 text-right">Rows</th>
                  <th scope="col" className="py-2 pr-3 text-right">Added</th>
                  <th scope="col" className="py-2 pr-3 text-right">Already stored</th>
                  <th scope="col" className="py-2 pr-3 text-right">Room-days updated</th>
                </tr>
              </thead>
              <tbody>
                {imports.map((i) => (
                  <tr key={i.id} className="border-b border-paper-line">
                    <td className="min-w-[10rem] py-2 pr-3 font-bold break-words">{i.fileName}</td>
                    <td className="py-2 pr-3 whitespace-nowrap">{when.format(new Date(i.createdAt))}</td>
                    <td className="py-2 pr-3">{i.uploadedBy ?? "—"}</td>
                    <td className="py-2 pr-3 text-right">{formatWhole(i.rowsRead)}</td>
                    <td className="py-2 pr-3 text-right">{formatWhole(i.rowsAdded)}</td>
                    <td className="py-2 pr-3 text-right">{formatWhole(i.duplicates)}</td>
                    <td className="py-2 pr-3 text-right">{formatWhole(i.roomDays)}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        )}
      </section>

      <section aria-labelledby="choices" className="mt-8">
        <h2 id="choices" className="text-xl">
          District choices
        </h2>
        <p className="mt-1 mb-3 max-w-prose text-sm text-ink-soft">
          None of these is a limit from a standard. No standard sets an indoor CO2 limit; the CDC says a reading above 800 ppm suggests a room may
          need more outdoor air. Days are counted in {timeZone} on school days of the district calendar.
        </p>
        {canSet ? (
          <AirSettingsForm settings={settings} />
        ) : (
          <>
            <dl className="grid max-w-2xl gap-2 sm:grid-cols-2">
              <div>
                <dt className="font-bold">CO2 level minutes are counted above</dt>
                <dd>{formatWhole(settings.co2ThresholdPpm)} ppm</dd>
              </div>
              <div>
                <dt className="font-bold">School hours</dt>
                <dd>
                  {formatClock(settings.occupiedStartMinute)} to {formatClock(settings.occupiedEndMinute)}
                </dd>
              </div>
              <div>
                <dt className="font-bold">Outdoor CO2 for the estimate</dt>
                <dd>{formatWhole(settings.co2OutdoorPpm)} ppm</dd>
              </div>
              <div>
                <dt className="font-bold">Public seat counts</dt>
                <dd>{formatUpToOne(settings.seatingSpacingFt)} ft apart</dd>
              </div>
              <div>
                <dt className="font-bold">Air distribution effectiveness (Ez)</dt>
                <dd>{formatOneDecimal(settings.zoneAirDistributionEffectiveness)}</dd>
              </div>
            </dl>
            <p className="mt-2 text-sm text-ink-soft">An administrator can change these.</p>
          </>
        )}
      </section>
    </>
  );
}
