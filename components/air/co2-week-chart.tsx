import type { Co2Week } from "@/lib/co2/repository";
import { formatDay, formatLongDay, formatShortDay, formatWhole } from "./format";

const W = 330;
const H = 210;
const PAD = { left: 48, right: 10, top: 24, bottom: 32 };

function niceMax(peak: number, threshold: number): number {
  return Math.max(1200, Math.ceil(Math.max(peak, threshold) / 250) * 250 + 100);
}

export interface Co2WeekChartProps {
  week: Co2Week;
  /** Used for ids; one chart per page. */
  id?: string;
}

/**
 * CO2 over a school's last school week, one small panel per room on the same scale:
 * a bar for each day's average during school hours and a dot on a stem for that day's
 * highest reading, with the district's threshold as a dashed line. Each panel is one
 * image named in words; the table below gives every number.
 */
export function Co2WeekChart({ week, id = "co2-week" }: Co2WeekChartProps) {
  if (week.days.length === 0 || week.rooms.length === 0) {
    return <p className="my-6">No CO2 readings have been uploaded for this school yet.</p>;
  }
  const threshold = week.thresholdPpm ?? 1000;
  const peak = Math.max(...week.rooms.flatMap((r) => [...r.days.values()].map((d) => d.peakPpm)));
  const top = niceMax(peak, threshold);
  const plotW = W - PAD.left - PAD.right;
  const plotH = H - PAD.top - PAD.bottom;
  const y = (ppm: number) => PAD.top + plotH * (1 - ppm / top);
  const slot = plotW / week.days.length;
  const barW = Math.min(26, slot * 0.5);
  const ticks = [0, 500, 1000, 1500, 2000, 2500, 3000].filter((t) => t <= top);
  const first = week.days[0]!;
  const last = week.days[week.days.length - 1]!;

  return (
    <figure className="my-6 xl:w-[69.5rem]" aria-labelledby={`${id}-caption`}>
      <figcaption id={`${id}-caption`} className="text-lg font-bold text-harbour-deep">
        CO2 in school hours, {formatDay(first)} to {formatDay(last)}
      </figcaption>
      <p className="mt-1 max-w-prose text-sm">
        <svg aria-hidden="true" viewBox="0 0 16 16" className="mr-1 inline h-4 w-4 align-[-2px]">
          <rect x="3" y="4" width="10" height="12" fill="#1d3a5f" />
        </svg>
        Bar: average while school is in{" "}
        <svg aria-hidden="true" viewBox="0 0 16 16" className="mr-1 ml-3 inline h-4 w-4 align-[-2px]">
          <line x1="8" y1="16" x2="8" y2="6" stroke="#1c2530" strokeWidth="1.5" />
          <circle cx="8" cy="5" r="3.5" fill="#fbf7ef" stroke="#1c2530" strokeWidth="2" />
        </svg>
        Dot: highest reading{" "}
        <svg aria-hidden="true" viewBox="0 0 24 16" className="mr-1 ml-3 inline h-4 w-6 align-[-2px]">
          <line x1="0" y1="8" x2="24" y2="8" stroke="#a63f0c" strokeWidth="2" strokeDasharray="4 3" />
        </svg>
        Dashed line: {formatWhole(threshold)} ppm, the level the district counts minutes above
      </p>
      <ul className="mt-3 grid max-w-prose gap-4 sm:grid-cols-2 xl:max-w-none xl:grid-cols-3">
        {week.rooms.map((room, index) => {
          const values = week.days.map((d) => room.days.get(d));
          const peaks = values.filter((v) => v !== undefined).map((v) => v.peakPpm);
          const daysAbove = values.filter((v) => v && v.minutesAbove > 0).length;
          const withData = values.filter(Boolean).length;
          const label =
            `${room.room}: highest reading each day from ${formatWhole(Math.min(...peaks))} to ${formatWhole(Math.max(...peaks))} ppm; ` +
            `above ${formatWhole(threshold)} ppm on ${daysAbove} of ${withData} school days with readings.`;
          return (
            <li key={room.room} className="rounded-plate border-2 border-paper-line bg-white p-2">
              <p className="px-1 font-bold">{room.room}</p>
              <svg viewBox={`0 0 ${W} ${H}`} role="img" aria-label={label} className="h-auto w-full" data-testid="co2-room-chart">
                {ticks.map((t) => (
                  <g key={t}>
                    <line x1={PAD.left} x2={W - PAD.right} y1={y(t)} y2={y(t)} stroke="#d8cdb8" strokeWidth={t === 0 ? 1.5 : 0.75} />
                    <text x={PAD.left - 6} y={y(t)} fontSize="13" textAnchor="end" dominantBaseline="middle" fill="#45505c">
                      {formatWhole(t)}
                    </text>
                  </g>
                ))}
                <line x1={PAD.left} x2={W - PAD.right} y1={y(threshold)} y2={y(threshold)} stroke="#a63f0c" strokeWidth="1.75" strokeDasharray="5 4" />
                {values.map((v, i) => {
                  const cx = PAD.left + slot * (i + 0.5);
                  const day = week.days[i]!;
                  return (
                    <g key={day}>
                      {v ? (
                        <>
                          <rect x={cx - barW / 2} y={y(v.meanPpm)} width={barW} height={y(0) - y(v.meanPpm)} fill="#1d3a5f" />
                          <line x1={cx} x2={cx} y1={y(v.meanPpm)} y2={y(v.peakPpm)} stroke="#1c2530" strokeWidth="1.5" />
                          <circle cx={cx} cy={y(v.peakPpm)} r="4" fill="#fbf7ef" stroke="#1c2530" strokeWidth="2" />
                        </>
                      ) : (
                        <text x={cx} y={y(0) - 8} fontSize="12" textAnchor="middle" fill="#45505c">
                          none
                        </text>
                      )}
                      <text x={cx} y={H - 10} fontSize="13" textAnchor="middle" fill="#1c2530">
                        {formatShortDay(day)}
                      </text>
                    </g>
                  );
                })}
                <text x={4} y={13} fontSize="13" fill="#45505c">
                  ppm
                </text>
              </svg>
              <span className="sr-only">{index === 0 ? "The numbers are in the table after the charts." : ""}</span>
            </li>
          );
        })}
      </ul>
      <details className="mt-4 max-w-prose xl:max-w-none">
        <summary className="min-h-11 cursor-pointer py-2 font-bold text-harbour">Show the chart&apos;s numbers as a table</summary>
        <div className="overflow-x-auto rounded-plate border-2 border-paper-line bg-white" role="region" aria-labelledby={`${id}-table-caption`} tabIndex={0}>
          <table className="w-full border-collapse text-left text-sm">
            <caption id={`${id}-table-caption`} className="p-2 text-left font-bold">
              Highest and average CO2 (ppm) in school hours, and minutes above {formatWhole(threshold)} ppm
            </caption>
            <thead>
              <tr className="border-b-2 border-harbour">
                <th scope="col" className="p-2">Room</th>
                {week.days.map((d) => (
                  <th key={d} scope="col" className="p-2">
                    <abbr title={formatLongDay(d)} className="no-underline">{formatDay(d)}</abbr>
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {week.rooms.map((room) => (
                <tr key={room.room} className="border-b border-paper-line align-top">
                  <th scope="row" className="p-2 font-bold">{room.room}</th>
                  {week.days.map((d) => {
                    const v = room.days.get(d);
                    return (
                      <td key={d} className="p-2">
                        {v ? (
                          <>
                            <span className="block">highest {formatWhole(v.peakPpm)}</span>{" "}
                            <span className="block">average {formatWhole(v.meanPpm)}</span>{" "}
                            <span className="block text-ink-soft">{Math.round(v.minutesAbove)} min above</span>
                          </>
                        ) : (
                          "no readings"
                        )}
                      </td>
                    );
                  })}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </details>
      <p className="mt-3 max-w-prose text-sm text-ink-soft">
        School hours only, on school days. CO2 shows how well a room is aired out, not whether germs are present. No standard sets an indoor CO2
        limit: the CDC says a reading above 800 ppm suggests a room may need more outdoor air, and {formatWhole(threshold)} ppm is the level our
        district chose for counting minutes. Sensor readings can be off by a few dozen ppm.
      </p>
    </figure>
  );
}
