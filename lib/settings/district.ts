import { z } from "zod";
import type { DB } from "@/db/connection";
import { isIsoDate, type SchoolCalendar } from "@/lib/school-days/calendar";
import { getSetting } from "./repository";

export const DEFAULT_DISTRICT_NAME = "Wrenmoor Valley School District";
export const DEFAULT_REPLY_TARGET_SCHOOL_DAYS = 3;
export const DEFAULT_TIME_ZONE = "America/New_York";

function isTimeZone(value: string): boolean {
  try {
    new Intl.DateTimeFormat("en-US", { timeZone: value });
    return true;
  } catch {
    return false;
  }
}

export function districtName(db: DB): Promise<string> {
  return getSetting(db, "district_name", z.string().min(2).max(120), DEFAULT_DISTRICT_NAME);
}

/** How many school days after the day a question arrives its reply is due. */
export function replyTargetSchoolDays(db: DB): Promise<number> {
  return getSetting(db, "reply_target_school_days", z.number().int().min(0).max(60), DEFAULT_REPLY_TARGET_SCHOOL_DAYS);
}

/** The IANA zone whose calendar day counts as "today" for the district. */
export function districtTimeZone(db: DB): Promise<string> {
  return getSetting(db, "district_time_zone", z.string().refine(isTimeZone), DEFAULT_TIME_ZONE);
}

export async function districtCalendar(db: DB): Promise<SchoolCalendar> {
  const holidays = await getSetting(db, "district_holidays", z.array(z.string().refine(isIsoDate)), []);
  return { holidays };
}
