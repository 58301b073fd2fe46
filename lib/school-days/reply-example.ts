import { dayNumber, dayOfWeek, isoDateFromDayNumber, replyDueDate, type IsoDate } from "./calendar";
import type { DistrictHoliday } from "./holidays";

export interface ReplyDueExample {
  received: IsoDate;
  due: IsoDate;
  targetSchoolDays: number;
  /** Saturdays and Sundays after the day of receipt, up to the due date. */
  weekendDays: number;
  /** District holidays on weekdays after the day of receipt, up to the due date. */
  holidays: DistrictHoliday[];
}

/**
 * The due date of a question received on `received`, with what was skipped on the
 * way, for the worked example beside the reply target. Uses replyDueDate, so it is
 * the same date the desk and the confirmation e-mail show.
 */
export function replyDueExample(received: IsoDate, targetSchoolDays: number, holidays: readonly DistrictHoliday[]): ReplyDueExample {
  const due = replyDueDate(received, targetSchoolDays, { holidays: holidays.map((h) => h.date) });
  const listed = new Map(holidays.map((h) => [h.date, h]));
  let weekendDays = 0;
  const skipped: DistrictHoliday[] = [];
  for (let day = dayNumber(received) + 1; day <= dayNumber(due); day += 1) {
    const date = isoDateFromDayNumber(day);
    const weekday = dayOfWeek(date);
    if (weekday === 0 || weekday === 6) weekendDays += 1;
    else {
      const holiday = listed.get(date);
      if (holiday) skipped.push(holiday);
    }
  }
  return { received, due, targetSchoolDays, weekendDays, holidays: skipped };
}
