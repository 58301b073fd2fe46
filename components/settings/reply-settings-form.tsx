"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import { saveReplySettingsAction } from "@/app/(staff)/staff/settings/actions";
import { TextField } from "@/components/ui/field";
import { SubmitButton } from "@/components/ui/submit-button";
import { isoDateInTimeZone } from "@/lib/school-days/calendar";
import { formatIsoDateLong } from "@/lib/school-days/format";
import type { DistrictHoliday } from "@/lib/school-days/holidays";
import { replyDueExample } from "@/lib/school-days/reply-example";
import { canonicalTimeZone } from "@/lib/school-days/time-zone";
import { MAX_REPLY_TARGET_SCHOOL_DAYS, replySettingsSchema, type ReplySettings, type ReplySettingsInput } from "@/lib/validation/calendar-settings";
import { ActionStatus } from "./action-status";

export interface ReplySettingsFormProps {
  replyTargetSchoolDays: number;
  timeZone: string;
  holidays: DistrictHoliday[];
  /** The instant the page was made, so the server and the browser agree on "today". */
  now: string;
  timeZones: string[];
}

const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;

function skippedWords(weekendDays: number, holidays: number): string {
  const parts = [weekendDays ? plural(weekendDays, "weekend day") : null, holidays ? plural(holidays, "district holiday") : null].filter(Boolean);
  return parts.length ? `, not counting ${parts.join(" and ")}` : "";
}

export function ReplySettingsForm({ replyTargetSchoolDays, timeZone, holidays, now, timeZones }: ReplySettingsFormProps) {
  const [status, setStatus] = useState<{ ok: boolean; message: string } | null>(null);
  const {
    register,
    handleSubmit,
    getValues,
    setError,
    control,
    formState: { errors, isSubmitting },
  } = useForm<ReplySettingsInput, unknown, ReplySettings>({
    resolver: zodResolver(replySettingsSchema),
    defaultValues: { replyTargetSchoolDays: String(replyTargetSchoolDays), timeZone },
  });

  async function onSubmit() {
    const result = await saveReplySettingsAction(getValues());
    setStatus(result);
    for (const [field, message] of Object.entries(result.errors ?? {})) {
      if (field === "replyTargetSchoolDays" || field === "timeZone") setError(field, { message }, { shouldFocus: true });
    }
  }

  // The example follows what is typed, and says so while it differs from what is saved.
  const typed = useWatch({ control });
  const typedTarget = /^\s*\d{1,2}\s*$/.test(typed.replyTargetSchoolDays ?? "") ? Number(typed.replyTargetSchoolDays) : null;
  const typedZone = canonicalTimeZone(typed.timeZone ?? "");
  const target = typedTarget !== null && typedTarget <= MAX_REPLY_TARGET_SCHOOL_DAYS ? typedTarget : replyTargetSchoolDays;
  const zone = typedZone ?? timeZone;
  const unsaved = target !== replyTargetSchoolDays || zone !== timeZone;
  const example = replyDueExample(isoDateInTimeZone(new Date(now), zone), target, holidays);

  return (
    <div className="grid gap-6 md:grid-cols-2">
      <form onSubmit={handleSubmit(onSubmit)} noValidate aria-label="Reply target and time zone">
        <TextField
          id="reply-target"
          label="Reply due after (school days)"
          hint={`A whole number from 0 to ${MAX_REPLY_TARGET_SCHOOL_DAYS}. The day a question arrives does not count; weekends and district holidays are skipped.`}
          inputMode="numeric"
          autoComplete="off"
          error={errors.replyTargetSchoolDays?.message}
          {...register("replyTargetSchoolDays")}
        />
        <TextField
          id="reply-time-zone"
          label="District time zone"
          hint="An IANA name such as America/New_York. It decides which day “today” is for the desk and the CO2 figures."
          list="reply-time-zones"
          autoComplete="off"
          spellCheck={false}
          error={errors.timeZone?.message}
          {...register("timeZone")}
        />
        <datalist id="reply-time-zones">
          {timeZones.map((z) => (
            <option key={z} value={z} />
          ))}
        </datalist>
        <SubmitButton busy={isSubmitting} busyLabel="Saving…">
          Save reply target
        </SubmitButton>
        <ActionStatus status={status} />
      </form>

      <div className="self-start rounded-plate border-2 border-harbour-line bg-harbour-soft p-4" data-testid="reply-example">
        <h3 className="text-lg">Worked example{unsaved ? " (not saved yet)" : ""}</h3>
        <p className="mt-2" data-testid="reply-example-sentence">
          A question that arrives today, {formatIsoDateLong(example.received)}, is due{" "}
          {example.due === example.received ? "the same day" : "on"} <strong data-testid="reply-example-due">{formatIsoDateLong(example.due)}</strong>.
        </p>
        <p className="mt-2 text-sm">
          {example.targetSchoolDays === 0
            ? "With a target of 0, a reply is due the day the question arrives."
            : `That is ${plural(example.targetSchoolDays, "school day")} later${skippedWords(example.weekendDays, example.holidays.length)}.`}
        </p>
        {example.holidays.length ? (
          <p className="mt-1 text-sm">
            Holidays skipped:{" "}
            {example.holidays.slice(0, 5).map((h, i) => (
              <span key={h.date}>
                {i ? "; " : ""}
                {formatIsoDateLong(h.date)}
                {h.name ? ` (${h.name})` : ""}
              </span>
            ))}
            {example.holidays.length > 5 ? `; and ${example.holidays.length - 5} more` : ""}.
          </p>
        ) : null}
        <p className="mt-2 text-sm text-ink-soft">Counted in {zone} with the saved district calendar.</p>
      </div>
    </div>
  );
}
