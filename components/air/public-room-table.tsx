import type { PublicRoomFigures } from "@/lib/rooms/figures";
import { OUTDOOR_AIR_RATES, isRoomUse } from "@/lib/air/ventilation";
import { ROOM_USE_LABELS } from "@/lib/rooms/labels";
import type { AirSettings } from "@/lib/settings/air";
import { formatDay, formatMinutes, formatOneDecimal, formatUpToOne, formatWhole } from "./format";

export const ROOM_TABLE_CAPTION = "Rooms and the outdoor air they need";

function rateUnchecked(use: string): boolean {
  return isRoomUse(use) && OUTDOOR_AIR_RATES[use].basis !== "ashrae_62_1_table_6_1";
}

function Meets({ room }: { room: PublicRoomFigures }) {
  return (
    <span className={room.meetsOutdoorAirRate ? "font-bold text-leaf" : "font-bold text-ember-deep"}>
      <span aria-hidden="true">{room.meetsOutdoorAirRate ? "✓ " : "✗ "}</span>
      {room.meetsOutdoorAirRate ? "Yes" : "No"}
      {rateUnchecked(room.use) ? <sup aria-label="see the note on gyms and offices"> †</sup> : null}
    </span>
  );
}

function Supply({ room }: { room: PublicRoomFigures }) {
  return (
    <span className="block text-sm font-normal text-ink-soft">
      {formatWhole(room.outdoorAirCfm)} of {formatWhole(room.requiredOutdoorAirCfm)} cfm
    </span>
  );
}

function UseLabel({ room }: { room: PublicRoomFigures }) {
  const label = ROOM_USE_LABELS[room.use] ?? room.use;
  if (label.toLowerCase() === room.room.toLowerCase()) return null;
  return <span className="block text-sm font-normal text-ink-soft">{label}</span>;
}

function Co2({ room }: { room: PublicRoomFigures }) {
  if (!room.co2) return <span className="text-ink-soft">No readings yet</span>;
  return (
    <>
      <span className="block whitespace-nowrap">peak {formatWhole(room.co2.peakPpm)} ppm</span>{" "}
      <span className="block whitespace-nowrap">average {formatWhole(room.co2.meanPpm)} ppm</span>{" "}
      <span className="block text-sm text-ink-soft">{formatDay(room.co2.day)}</span>
    </>
  );
}

/**
 * The public room-by-room figures: a table on wider screens and one card per room on
 * a phone (each shows the same words; the other is hidden from everyone).
 */
export function PublicRoomTable({ rooms, settings }: { rooms: PublicRoomFigures[]; settings: AirSettings }) {
  const spacing = formatUpToOne(settings.seatingSpacingFt);
  const anyUnchecked = rooms.some((r) => rateUnchecked(r.use));
  return (
    <div className="my-6">
      {/* At wide screens the table may run wider than the words around it (the page's full width). */}
      <div className="hidden overflow-x-auto xl:w-[69.5rem] rounded-plate border-2 border-paper-line bg-white md:block" tabIndex={0} role="region" aria-labelledby="room-figures-caption">
        <table className="w-full border-collapse text-left text-sm" data-testid="room-figures-table">
          <caption id="room-figures-caption" className="p-3 text-left font-bold text-harbour-deep">
            {ROOM_TABLE_CAPTION}
          </caption>
          <thead>
            <tr className="border-b-2 border-harbour bg-paper-deep align-bottom">
              <th scope="col" className="p-2">Room</th>
              <th scope="col" className="p-2 text-right">Air changes per hour (outdoor air)</th>
              <th scope="col" className="p-2 text-right">Equivalent air changes (with air cleaners)</th>
              <th scope="col" className="p-2">Gets the outdoor air it needs?</th>
              <th scope="col" className="p-2 text-right">Minutes to clear 99%</th>
              <th scope="col" className="p-2 text-right">Desks {spacing} ft apart</th>
              <th scope="col" className="p-2">CO2, latest school day</th>
            </tr>
          </thead>
          <tbody>
            {rooms.map((r) => (
              <tr key={r.room} className="border-b border-paper-line align-top" data-room={r.room}>
                <th scope="row" className="p-2">
                  <span className="block font-bold">{r.room}</span> <UseLabel room={r} />
                </th>
                <td className="p-2 text-right" data-col="ach">{formatOneDecimal(r.airChangesPerHour)}</td>
                <td className="p-2 text-right" data-col="eq-ach">{formatOneDecimal(r.equivalentAirChangesPerHour)}</td>
                <td className="p-2" data-col="meets">
                  <Meets room={r} /> <Supply room={r} />
                </td>
                <td className="p-2 text-right" data-col="minutes-99">{r.minutesTo99 === null ? "—" : formatMinutes(r.minutesTo99)}</td>
                <td className="p-2 text-right" data-col="seats">{r.seats.count}</td>
                <td className="p-2" data-col="co2">
                  <Co2 room={r} />
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>

      <ul className="space-y-3 md:hidden" aria-label={ROOM_TABLE_CAPTION}>
        {rooms.map((r) => (
          <li key={r.room} className="rounded-plate border-2 border-paper-line bg-white p-4">
            <p className="text-lg font-bold text-harbour-deep">{r.room}</p>
            <UseLabel room={r} />
            <dl className="mt-2 grid grid-cols-[minmax(0,1fr)_auto] gap-x-3 gap-y-2">
              <dt>Air changes per hour (outdoor air)</dt>
              <dd className="text-right font-bold">{formatOneDecimal(r.airChangesPerHour)}</dd>
              <dt>Equivalent air changes (with air cleaners)</dt>
              <dd className="text-right font-bold">{formatOneDecimal(r.equivalentAirChangesPerHour)}</dd>
              <dt>Gets the outdoor air it needs?</dt>
              <dd className="text-right">
                <Meets room={r} /> <Supply room={r} />
              </dd>
              <dt>Minutes to clear 99%</dt>
              <dd className="text-right font-bold">{r.minutesTo99 === null ? "—" : formatMinutes(r.minutesTo99)}</dd>
              <dt>Desks {spacing} ft apart</dt>
              <dd className="text-right font-bold">{r.seats.count}</dd>
              <dt>CO2, latest school day</dt>
              <dd className="text-right">
                <Co2 room={r} />
              </dd>
            </dl>
          </li>
        ))}
      </ul>

      <h3 className="mt-6 mb-2 text-xl">What each column means</h3>
      <dl className="space-y-2">
        <div>
          <dt className="font-bold">Air changes per hour (outdoor air)</dt>
          <dd>
            How many times an hour the fresh outdoor air brought in would fill the room. It is the outdoor air in cubic feet per minute (cfm),
            times 60, divided by the room&apos;s volume.
          </dd>
        </div>
        <div>
          <dt className="font-bold">Equivalent air changes (with air cleaners)</dt>
          <dd>
            The same, with the room&apos;s portable HEPA air cleaners added in: each cleaner&apos;s clean air delivery rate (CADR) counts like outdoor air.
            The CDC suggests aiming for at least 5 air changes of clean air per hour.
          </dd>
        </div>
        <div>
          <dt className="font-bold">Gets the outdoor air it needs?</dt>
          <dd>
            Whether the outdoor air measured for the room reaches the amount the ventilation standard our engineers use (ASHRAE Standard 62.1) asks
            for when the room is full: an amount for each person plus an amount for the floor area. &quot;330 of 358 cfm&quot; would mean a room gets 330
            and needs 358.{anyUnchecked ? " † For gyms and offices, the per-person and per-area amounts are our reading of the standard and have not yet been checked against its text." : ""}
          </dd>
        </div>
        <div>
          <dt className="font-bold">Minutes to clear 99%</dt>
          <dd>
            How long the clean air would take to remove 99 out of every 100 particles from the air of an empty room, at the equivalent air
            changes. It assumes the air mixes well and nobody is in the room, so a real room with people takes longer.
          </dd>
        </div>
        <div>
          <dt className="font-bold">Desks {spacing} ft apart</dt>
          <dd>
            How many desks (about 2 by 2.5 feet each) fit with {spacing} feet between the centres of neighbouring desks, keeping a 6-foot teacher
            zone at the front and 2 feet clear along the walls. Rooms are not always set up this way.
          </dd>
        </div>
        <div>
          <dt className="font-bold">CO2, latest school day</dt>
          <dd>
            The highest reading and the average reading of the room&apos;s CO2 sensor during school hours on the last school day with readings, in
            parts per million (ppm). Outdoor air is about 420 ppm.
          </dd>
        </div>
      </dl>
      <p className="mt-4 text-sm text-ink-soft">
        All of these figures are estimates from room sizes and from airflows measured by licensed mechanical engineers and test-and-balance
        contractors; they change as rooms are tested again. Fresh air does not replace other measures, such as staying home when sick and washing
        hands. For health advice, we follow the local health department.
      </p>
    </div>
  );
}
