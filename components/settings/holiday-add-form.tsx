"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { addHolidaysAction } from "@/app/(staff)/staff/settings/actions";
import { TextField } from "@/components/ui/field";
import { SubmitButton } from "@/components/ui/submit-button";
import { HOLIDAY_NAME_MAX_LENGTH, holidayAddSchema, type HolidayAdd, type HolidayAddInput } from "@/lib/validation/calendar-settings";
import { ActionStatus } from "./action-status";

const FIELDS = ["from", "to", "name"] as const;

export function HolidayAddForm() {
  const [status, setStatus] = useState<{ ok: boolean; message: string } | null>(null);
  const {
    register,
    handleSubmit,
    getValues,
    reset,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<HolidayAddInput, unknown, HolidayAdd>({
    resolver: zodResolver(holidayAddSchema),
    defaultValues: { from: "", to: "", name: "" },
  });

  async function onSubmit() {
    const result = await addHolidaysAction(getValues());
    setStatus(result);
    for (const [field, message] of Object.entries(result.errors ?? {})) {
      const name = FIELDS.find((f) => f === field);
      if (name) setError(name, { message }, { shouldFocus: true });
    }
    if (result.ok) reset();
  }

  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate aria-label="Add a day or a break" className="max-w-3xl">
      <div className="grid gap-x-6 sm:grid-cols-2">
        <TextField
          id="holiday-from"
          label="First day"
          hint="Year-month-day, like 2026-12-21."
          autoComplete="off"
          spellCheck={false}
          error={errors.from?.message}
          {...register("from")}
        />
        <TextField
          id="holiday-to"
          label="Last day, for a break (optional)"
          hint="Empty for one day; weekends are skipped."
          autoComplete="off"
          spellCheck={false}
          error={errors.to?.message}
          {...register("to")}
        />
      </div>
      <TextField
        id="holiday-name"
        label="Name (optional)"
        hint={`Shown beside each day, like “Winter break”. Up to ${HOLIDAY_NAME_MAX_LENGTH} characters.`}
        autoComplete="off"
        maxLength={HOLIDAY_NAME_MAX_LENGTH + 20}
        error={errors.name?.message}
        {...register("name")}
      />
      <SubmitButton busy={isSubmitting} busyLabel="Adding…">
        Add to the calendar
      </SubmitButton>
      <ActionStatus status={status} />
    </form>
  );
}
