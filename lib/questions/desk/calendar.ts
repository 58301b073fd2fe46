import type { DB } from "@/db/connection";
import { isoDateInTimeZone, replyDueDate, schoolDaysUntil, type IsoDate, type SchoolCalendar } from "@/lib/school-days/calendar";
import { districtCalendar, districtTimeZone, replyTargetSchoolDays } from "@/lib/settings/district";
import { isQuestionState, isTerminalState } from "../state-machine";

/** The district calendar as the desk needs it, read once per request. */
export interface DeskCalendar {
  calendar: SchoolCalendar;
  timeZone: string;
  targetSchoolDays: number;
  today: IsoDate;
}

export async function deskCalendar(db: DB, now: Date = new Date()): Promise<DeskCalendar> {
  const [calendar, timeZone, targetSchoolDays] = await Promise.all([districtCalendar(db), districtTimeZone(db), replyTargetSchoolDays(db)]);
  return { calendar, timeZone, targetSchoolDays, today: isoDateInTimeZone(now, timeZone) };
}

/** When a question's reply is due and how many school days are left; none once it is closed. */
export function replyTiming(receivedAt: string, state: string, cal: DeskCalendar): { dueDate: IsoDate; schoolDaysLeft: number | null } {
  const dueDate = replyDueDate(isoDateInTimeZone(new Date(receivedAt), cal.timeZone), cal.targetSchoolDays, cal.calendar);
  const closed = isQuestionState(state) && isTerminalState(state);
  return { dueDate, schoolDaysLeft: closed ? null : schoolDaysUntil(dueDate, cal.today, cal.calendar) };
}
