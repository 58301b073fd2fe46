import { z } from "zod";
import type { DB } from "@/db/connection";
import { isIsoDate, type IsoDate } from "@/lib/school-days/calendar";
import {
  holidaysFromStored,
  holidaysToStored,
  MAX_DISTRICT_HOLIDAYS,
  mergeHolidays,
  removeHolidayDates,
  type DistrictHoliday,
  type HolidayMerge,
  type HolidayRemoval,
} from "@/lib/school-days/holidays";
import { districtTimeZone, replyTargetSchoolDays } from "./district";
import { getSetting, putSetting } from "./repository";
import { getSearchSynonyms, putSearchSynonyms, SEARCH_SYNONYMS_KEY, synonymGroupsSchema, type SynonymGroup } from "./synonyms";
import { SynonymListError } from "./synonym-groups";

// The administrator's Settings page writes through here. Each change is one
// transaction with a staff_events row saying who changed which setting and how.

export const DISTRICT_SETTING_KEYS = {
  /** YYYY-MM-DD dates with no school besides weekends; the desk and the CO2 figures read it. */
  holidays: "district_holidays",
  /** `{ "YYYY-MM-DD": "Winter break" }`, kept apart so the date list stays a plain array. */
  holidayNames: "district_holiday_names",
  replyTarget: "reply_target_school_days",
  timeZone: "district_time_zone",
  searchSynonyms: SEARCH_SYNONYMS_KEY,
} as const;

/** `staff_events.kind` for a change on the Settings page; `detail` names the setting. */
export const SETTING_CHANGED_EVENT = "setting_changed";

export class SettingsChangeError extends Error {
  constructor(
    message: string,
    readonly field = "_form",
  ) {
    super(message);
    this.name = "SettingsChangeError";
  }
}

const holidayDatesSchema = z.array(z.string().refine(isIsoDate));
const holidayNamesSchema = z.record(z.string(), z.string().max(200));

async function recordSettingChange(db: DB, actorId: number, detail: { setting: string } & Record<string, unknown>, now: string): Promise<void> {
  await db
    .insertInto("staff_events")
    .values({ actor_id: actorId, subject_user_id: null, kind: SETTING_CHANGED_EVENT, detail: JSON.stringify(detail), created_at: now })
    .execute();
}

/** The district holidays with their names, sorted by date. */
export async function districtHolidays(db: DB): Promise<DistrictHoliday[]> {
  const [dates, names] = await Promise.all([
    getSetting(db, DISTRICT_SETTING_KEYS.holidays, holidayDatesSchema, []),
    getSetting(db, DISTRICT_SETTING_KEYS.holidayNames, holidayNamesSchema, {}),
  ]);
  return holidaysFromStored(dates, names);
}

async function writeHolidays(db: DB, holidays: readonly DistrictHoliday[]): Promise<void> {
  const stored = holidaysToStored(holidays);
  await putSetting(db, DISTRICT_SETTING_KEYS.holidays, stored.dates);
  await putSetting(db, DISTRICT_SETTING_KEYS.holidayNames, stored.names);
}

/** Adds days (already expanded to weekdays); a day already listed takes the new name if one is given. */
export async function addDistrictHolidays(db: DB, dates: readonly IsoDate[], name: string | null, actorId: number): Promise<HolidayMerge> {
  const now = new Date().toISOString();
  return db.transaction().execute(async (trx) => {
    const merge = mergeHolidays(await districtHolidays(trx), dates, name);
    if (merge.holidays.length > MAX_DISTRICT_HOLIDAYS) {
      throw new SettingsChangeError(`The calendar can hold ${MAX_DISTRICT_HOLIDAYS.toLocaleString("en-US")} days; remove past days first.`);
    }
    if (merge.added.length || merge.renamed.length) {
      await writeHolidays(trx, merge.holidays);
      await recordSettingChange(trx, actorId, { setting: DISTRICT_SETTING_KEYS.holidays, added: merge.added, renamed: merge.renamed, name }, now);
    }
    return merge;
  });
}

export async function removeDistrictHolidays(db: DB, dates: readonly IsoDate[], actorId: number): Promise<HolidayRemoval> {
  const now = new Date().toISOString();
  return db.transaction().execute(async (trx) => {
    const removal = removeHolidayDates(await districtHolidays(trx), dates);
    if (removal.removed.length) {
      await writeHolidays(trx, removal.holidays);
      await recordSettingChange(trx, actorId, { setting: DISTRICT_SETTING_KEYS.holidays, removed: removal.removed }, now);
    }
    return removal;
  });
}

export interface ReplySettingsValues {
  replyTargetSchoolDays: number;
  timeZone: string;
}

export async function replySettings(db: DB): Promise<ReplySettingsValues> {
  const [target, timeZone] = await Promise.all([replyTargetSchoolDays(db), districtTimeZone(db)]);
  return { replyTargetSchoolDays: target, timeZone };
}

/** Saves the reply target and time zone; returns what they were before. */
export async function saveReplySettings(db: DB, next: ReplySettingsValues, actorId: number): Promise<ReplySettingsValues> {
  const now = new Date().toISOString();
  return db.transaction().execute(async (trx) => {
    const before = await replySettings(trx);
    if (before.replyTargetSchoolDays !== next.replyTargetSchoolDays) {
      await putSetting(trx, DISTRICT_SETTING_KEYS.replyTarget, next.replyTargetSchoolDays);
      await recordSettingChange(trx, actorId, { setting: DISTRICT_SETTING_KEYS.replyTarget, from: before.replyTargetSchoolDays, to: next.replyTargetSchoolDays }, now);
    }
    if (before.timeZone !== next.timeZone) {
      await putSetting(trx, DISTRICT_SETTING_KEYS.timeZone, next.timeZone);
      await recordSettingChange(trx, actorId, { setting: DISTRICT_SETTING_KEYS.timeZone, from: before.timeZone, to: next.timeZone }, now);
    }
    return before;
  });
}

/**
 * Applies `change` to the stored synonym list and saves the result, refusing a list
 * the search could not use (SynonymListError / SettingsChangeError, nothing saved).
 */
export async function changeSearchSynonyms(
  db: DB,
  change: (groups: SynonymGroup[]) => SynonymGroup[],
  actorId: number,
  what: "group_added" | "group_changed" | "group_removed" | "defaults_restored",
): Promise<SynonymGroup[]> {
  const now = new Date().toISOString();
  return db.transaction().execute(async (trx) => {
    const before = await getSearchSynonyms(trx);
    const next = change(before);
    const checked = synonymGroupsSchema.safeParse(next);
    if (!checked.success) throw new SynonymListError(checked.error.issues[0]?.message ?? "The list could not be saved.", "_form");
    await putSearchSynonyms(trx, checked.data);
    await recordSettingChange(trx, actorId, { setting: DISTRICT_SETTING_KEYS.searchSynonyms, change: what, before, after: checked.data }, now);
    return checked.data;
  });
}
