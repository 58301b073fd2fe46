"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm, useWatch, type Resolver } from "react-hook-form";
import { removeHolidaysAction } from "@/app/(staff)/staff/settings/actions";
import type { IsoDate } from "@/lib/school-days/calendar";
import { formatIsoDateInYear } from "@/lib/school-days/format";
import { groupHolidaysByYear, type DistrictHoliday } from "@/lib/school-days/holidays";
import { holidayRemoveSchema, type HolidayRemoveInput } from "@/lib/validation/calendar-settings";
import { ActionStatus } from "./action-status";

export interface HolidayListProps {
  holidays: DistrictHoliday[];
  /** Today in the district's time zone; earlier days are folded away. */
  today: IsoDate;
}

// react-hook-form gives a lone checkbox's value as a string (or false when unticked),
// and several as an array; the schema always sees an array.
function tickedDates(value: unknown): string[] {
  if (Array.isArray(value)) return value.filter((v): v is string => typeof v === "string");
  return typeof value === "string" && value !== "" ? [value] : [];
}
const zodRemove = zodResolver(holidayRemoveSchema);
const removeResolver: Resolver<HolidayRemoveInput> = (values, context, options) => zodRemove({ dates: tickedDates(values.dates) }, context, options);

const plural = (n: number, one: string, many = `${one}s`) => `${n.toLocaleString("en-US")} ${n === 1 ? one : many}`;

export function HolidayList({ holidays, today }: HolidayListProps) {
  const [status, setStatus] = useState<{ ok: boolean; message: string } | null>(null);
  const {
    register,
    handleSubmit,
    reset,
    control,
    formState: { errors, isSubmitting },
  } = useForm<HolidayRemoveInput>({ resolver: removeResolver, defaultValues: { dates: [] } });
  const tickedCount = tickedDates(useWatch({ control, name: "dates" })).length;
  const years = groupHolidaysByYear(holidays, today);

  async function onSubmit(values: HolidayRemoveInput) {
    const result = await removeHolidaysAction(values);
    setStatus(result);
    if (result.ok) reset({ dates: [] });
  }

  const errorId = "holiday-remove-error";
  const day = (h: DistrictHoliday) => (
    <li key={h.date} className="py-1">
      <label className="flex min-h-11 items-center gap-3">
        <input
          type="checkbox"
          value={h.date}
          className="size-6 shrink-0 accent-harbour"
          aria-describedby={errors.dates ? errorId : undefined}
          data-date={h.date}
          {...register("dates")}
        />
        <span>
          <span className="font-bold">{formatIsoDateInYear(h.date)}</span>
          {h.name ? <span> — {h.name}</span> : null}
        </span>
      </label>
    </li>
  );

  // The status sits outside the list so it stays, and is announced, when the last day is removed.
  return (
    <div>
      {holidays.length === 0 ? (
        <p className="mt-2">No district holidays yet: every weekday counts as a school day.</p>
      ) : (
        <form onSubmit={handleSubmit(onSubmit)} noValidate aria-label="District holidays" data-testid="holiday-list">
          <div className="grid gap-4 lg:grid-cols-2">
            {years.map((y) => {
              const total = y.past.length + y.upcoming.length;
              return (
                <fieldset key={y.year} className="min-w-0 rounded-plate border-2 border-paper-line bg-white p-4" data-year={y.year}>
                  <legend className="px-1 text-lg font-bold">
                    {y.year} <span className="font-normal">· {plural(total, "day")}</span>
                  </legend>
                  {y.past.length ? (
                    <details className="mb-2">
                      <summary className="min-h-11 cursor-pointer py-2 text-harbour-deep underline">
                        {y.upcoming.length === 0 ? `All ${plural(y.past.length, "day")} are past: show them` : `Show ${plural(y.past.length, "past day")}`}
                      </summary>
                      <ul className="pl-1">{y.past.map(day)}</ul>
                    </details>
                  ) : null}
                  {y.upcoming.length ? <ul className="pl-1">{y.upcoming.map(day)}</ul> : null}
                </fieldset>
              );
            })}
          </div>
          {errors.dates ? (
            <p id={errorId} role="alert" className="mt-3 font-bold text-ember-deep">
              <span aria-hidden="true">! </span>
              {errors.dates.message ?? errors.dates.root?.message}
            </p>
          ) : null}
          <button
            type="submit"
            disabled={isSubmitting}
            className="mt-4 min-h-11 rounded-plate border-2 border-ember bg-paper px-4 font-bold text-ember-deep hover:bg-ember-soft disabled:opacity-60"
          >
            {isSubmitting ? "Removing…" : tickedCount ? `Remove the ${plural(tickedCount, "ticked day")}` : "Remove the ticked days"}
          </button>
        </form>
      )}
      <ActionStatus status={status} />
    </div>
  );
}
