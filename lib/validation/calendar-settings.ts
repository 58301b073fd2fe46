import { z } from "zod";
import { isIsoDate } from "@/lib/school-days/calendar";
import { formatIsoDateLong } from "@/lib/school-days/format";
import { daysInRange, isoDateProblem, MAX_DISTRICT_HOLIDAYS, MAX_HOLIDAY_RANGE_DAYS, weekdaysInRange } from "@/lib/school-days/holidays";
import { canonicalTimeZone } from "@/lib/school-days/time-zone";

export const MAX_REPLY_TARGET_SCHOOL_DAYS = 60;
export const HOLIDAY_NAME_MAX_LENGTH = 60;

const dateProblem = (value: string, ctx: z.RefinementCtx) => {
  const problem = value === "" ? null : isoDateProblem(value);
  if (problem) ctx.addIssue({ code: "custom", message: problem });
};

/**
 * One day or a break off school, as the admin's form sends it: the first day, an
 * optional last day and an optional name. The output lists the weekdays it covers,
 * both ends included; weekends are left out because they are never school days.
 */
export const holidayAddSchema = z
  .object({
    from: z.string().trim().min(1, "Enter the first day, like 2026-12-21.").superRefine(dateProblem),
    to: z.string().trim().max(20, "Write the date as year-month-day, like 2027-01-01.").superRefine(dateProblem),
    name: z
      .string()
      .trim()
      .max(HOLIDAY_NAME_MAX_LENGTH, `Keep the name under ${HOLIDAY_NAME_MAX_LENGTH} characters.`)
      .regex(/^[^\u0000-\u001f\u007f]*$/, "Use letters, numbers and punctuation only."),
  })
  .superRefine((v, ctx) => {
    const to = v.to || v.from;
    if (!isIsoDate(v.from) || !isIsoDate(to)) return;
    const span = daysInRange(v.from, to);
    if (span < 1) {
      ctx.addIssue({ code: "custom", path: ["to"], message: `The last day, ${formatIsoDateLong(to)}, is before the first day, ${formatIsoDateLong(v.from)}.` });
    } else if (span > MAX_HOLIDAY_RANGE_DAYS) {
      ctx.addIssue({ code: "custom", path: ["to"], message: `A range can cover at most ${MAX_HOLIDAY_RANGE_DAYS} days. Add a longer closure in parts.` });
    } else if (weekdaysInRange(v.from, to).length === 0) {
      const what = span === 1 ? `${formatIsoDateLong(v.from)} is a weekend day` : `There are no weekdays from ${formatIsoDateLong(v.from)} to ${formatIsoDateLong(to)}`;
      ctx.addIssue({ code: "custom", path: ["from"], message: `${what}. Weekends are never school days, so there is nothing to add.` });
    }
  })
  .transform((v) => {
    const to = v.to || v.from;
    return { from: v.from, to, name: v.name === "" ? null : v.name, dates: weekdaysInRange(v.from, to) };
  });

/** Days to take off the calendar, as ticked in the list. */
export const holidayRemoveSchema = z.object({
  dates: z
    .array(z.string().refine(isIsoDate, "One of the ticked days is not a date."), "Tick at least one day to remove.")
    .min(1, "Tick at least one day to remove.")
    .max(MAX_DISTRICT_HOLIDAYS, "Too many days at once."),
});

const replyTargetMessage = `Enter a whole number of school days from 0 to ${MAX_REPLY_TARGET_SCHOOL_DAYS}.`;

/** The reply target and the district's time zone, as typed in the form. */
export const replySettingsSchema = z.object({
  replyTargetSchoolDays: z
    .string(replyTargetMessage)
    .trim()
    .regex(/^\d{1,3}$/, replyTargetMessage)
    .transform(Number)
    .refine((n) => n <= MAX_REPLY_TARGET_SCHOOL_DAYS, replyTargetMessage),
  timeZone: z
    .string("Enter the district's time zone, like America/New_York.")
    .trim()
    .min(1, "Enter the district's time zone, like America/New_York.")
    .max(64, "That is too long for a time zone name.")
    .transform((value, ctx) => {
      const zone = canonicalTimeZone(value);
      if (zone === null) {
        ctx.addIssue({ code: "custom", message: `“${value}” is not a time zone name. Use an IANA name like America/New_York, America/Chicago or America/Denver.` });
        return z.NEVER;
      }
      return zone;
    }),
});

export type HolidayAddInput = z.input<typeof holidayAddSchema>;
export type HolidayAdd = z.output<typeof holidayAddSchema>;
export type HolidayRemoveInput = z.input<typeof holidayRemoveSchema>;
export type ReplySettingsInput = z.input<typeof replySettingsSchema>;
export type ReplySettings = z.output<typeof replySettingsSchema>;
