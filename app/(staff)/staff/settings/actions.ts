"use server";

import { db } from "@/db/client";
import { AuthorizationError, requireRole } from "@/lib/auth/guard";
import { STAFF_PAGE_ROLES } from "@/lib/auth/staff-nav";
import { fieldErrors } from "@/lib/http/errors";
import { listSchools } from "@/lib/schools/repository";
import { formatIsoDateLong } from "@/lib/school-days/format";
import { recountAllCo2Days, recountCo2Days } from "@/lib/settings/calendar-effects";
import { addDistrictHolidays, changeSearchSynonyms, removeDistrictHolidays, saveReplySettings, SettingsChangeError } from "@/lib/settings/district-settings";
import { revalidateReplyTarget, revalidateSchoolCalendar, revalidateSearchSynonyms } from "@/lib/settings/publish";
import { addSynonymGroup, removeSynonymGroup, replaceSynonymGroup, SynonymListError } from "@/lib/settings/synonym-groups";
import { DEFAULT_SEARCH_SYNONYMS } from "@/lib/settings/synonyms";
import { holidayAddSchema, holidayRemoveSchema, replySettingsSchema } from "@/lib/validation/calendar-settings";
import { synonymGroupAddSchema, synonymGroupEditSchema, synonymGroupRemoveSchema } from "@/lib/validation/synonyms";

// Every action here is a public endpoint: each checks the role itself, parses its
// input with the same schema as its form, and changes nothing when either fails.

export interface SettingsActionResult {
  ok: boolean;
  message: string;
  errors?: Record<string, string>;
}

const NOTHING_SAVED = "Nothing was saved. See the message by the field.";

function refusal(error: unknown): SettingsActionResult {
  if (error instanceof AuthorizationError) return { ok: false, message: error.message };
  if (error instanceof SettingsChangeError || error instanceof SynonymListError) {
    return { ok: false, message: error.message, errors: error.field === "_form" ? undefined : { [error.field]: error.message } };
  }
  throw error;
}

const plural = (n: number, one: string, many = `${one}s`) => `${n.toLocaleString("en-US")} ${n === 1 ? one : many}`;

async function calendarChanged(dates: readonly string[]): Promise<string> {
  const recounted = await recountCo2Days(db(), dates);
  revalidateSchoolCalendar((await listSchools(db())).map((s) => s.slug));
  return recounted > 0 ? " The daily CO2 figures of those days were recounted." : "";
}

export async function addHolidaysAction(input: unknown): Promise<SettingsActionResult> {
  try {
    const actor = await requireRole(STAFF_PAGE_ROLES.settings);
    const parsed = holidayAddSchema.safeParse(input);
    if (!parsed.success) return { ok: false, message: NOTHING_SAVED, errors: fieldErrors(parsed.error) };
    const { from, to, name, dates } = parsed.data;
    const merge = await addDistrictHolidays(db(), dates, name, actor.id);
    if (merge.added.length === 0 && merge.renamed.length === 0) {
      return { ok: true, message: from === to ? `${formatIsoDateLong(from)} is already on the calendar; nothing changed.` : "Those days are already on the calendar; nothing changed." };
    }
    const parts: string[] = [];
    if (merge.added.length) {
      const span = from === to ? formatIsoDateLong(from) : `${plural(merge.added.length, "weekday")} from ${formatIsoDateLong(from)} to ${formatIsoDateLong(to)}`;
      parts.push(`Added ${span}${name ? ` as “${name}”` : ""}.`);
      if (from !== to) parts.push("Weekends in between are not listed: they are never school days.");
    }
    if (merge.renamed.length) parts.push(`${plural(merge.renamed.length, "day")} already listed now named “${name}”.`);
    return { ok: true, message: parts.join(" ") + (await calendarChanged(merge.added)) };
  } catch (error) {
    return refusal(error);
  }
}

export async function removeHolidaysAction(input: unknown): Promise<SettingsActionResult> {
  try {
    const actor = await requireRole(STAFF_PAGE_ROLES.settings);
    const parsed = holidayRemoveSchema.safeParse(input);
    if (!parsed.success) return { ok: false, message: parsed.error.issues[0]?.message ?? NOTHING_SAVED, errors: fieldErrors(parsed.error) };
    const removal = await removeDistrictHolidays(db(), parsed.data.dates, actor.id);
    if (removal.removed.length === 0) return { ok: false, message: "Those days are no longer on the calendar. Reload the page to see the list as it is." };
    const which = removal.removed.length === 1 ? formatIsoDateLong(removal.removed[0] ?? "") : plural(removal.removed.length, "day");
    const missing = removal.missing.length ? ` ${plural(removal.missing.length, "ticked day was", "ticked days were")} already gone.` : "";
    const again = removal.removed.length === 1 ? "It counts as a school day again." : "They count as school days again.";
    return { ok: true, message: `Removed ${which}. ${again}${missing}${await calendarChanged(removal.removed)}` };
  } catch (error) {
    return refusal(error);
  }
}

export async function saveReplySettingsAction(input: unknown): Promise<SettingsActionResult> {
  try {
    const actor = await requireRole(STAFF_PAGE_ROLES.settings);
    const parsed = replySettingsSchema.safeParse(input);
    if (!parsed.success) return { ok: false, message: NOTHING_SAVED, errors: fieldErrors(parsed.error) };
    const next = parsed.data;
    const before = await saveReplySettings(db(), next, actor.id);
    revalidateReplyTarget();
    let recount = "";
    if (before.timeZone !== next.timeZone) {
      const days = await recountAllCo2Days(db());
      revalidateSchoolCalendar((await listSchools(db())).map((s) => s.slug));
      recount = ` Daily CO2 figures recounted in the new time zone for ${plural(days, "room-day")}.`;
    }
    const unchanged = before.timeZone === next.timeZone && before.replyTargetSchoolDays === next.replyTargetSchoolDays;
    return {
      ok: true,
      message: `${unchanged ? "Nothing changed: replies" : "Saved. Replies"} are due ${plural(next.replyTargetSchoolDays, "school day")} after a question arrives, counted in ${next.timeZone}.${recount}`,
    };
  } catch (error) {
    return refusal(error);
  }
}

export async function addSynonymGroupAction(input: unknown): Promise<SettingsActionResult> {
  try {
    const actor = await requireRole(STAFF_PAGE_ROLES.settings);
    const parsed = synonymGroupAddSchema.safeParse(input);
    if (!parsed.success) return { ok: false, message: NOTHING_SAVED, errors: fieldErrors(parsed.error) };
    await changeSearchSynonyms(db(), (groups) => addSynonymGroup(groups, parsed.data.words), actor.id, "group_added");
    revalidateSearchSynonyms();
    return { ok: true, message: `Added the group “${parsed.data.words.join(", ")}”.` };
  } catch (error) {
    return refusal(error);
  }
}

export async function updateSynonymGroupAction(input: unknown): Promise<SettingsActionResult> {
  try {
    const actor = await requireRole(STAFF_PAGE_ROLES.settings);
    const parsed = synonymGroupEditSchema.safeParse(input);
    if (!parsed.success) return { ok: false, message: NOTHING_SAVED, errors: fieldErrors(parsed.error) };
    const { original, words } = parsed.data;
    await changeSearchSynonyms(db(), (groups) => replaceSynonymGroup(groups, original, words), actor.id, "group_changed");
    revalidateSearchSynonyms();
    return { ok: true, message: `Saved the group “${words.join(", ")}”.` };
  } catch (error) {
    return refusal(error);
  }
}

export async function removeSynonymGroupAction(input: unknown): Promise<SettingsActionResult> {
  try {
    const actor = await requireRole(STAFF_PAGE_ROLES.settings);
    const parsed = synonymGroupRemoveSchema.safeParse(input);
    if (!parsed.success) return { ok: false, message: "That group could not be found. Reload the page." };
    await changeSearchSynonyms(db(), (groups) => removeSynonymGroup(groups, parsed.data.original), actor.id, "group_removed");
    revalidateSearchSynonyms();
    return { ok: true, message: `Removed the group “${parsed.data.original.join(", ")}”.` };
  } catch (error) {
    return refusal(error);
  }
}

export async function resetSynonymsAction(): Promise<SettingsActionResult> {
  try {
    const actor = await requireRole(STAFF_PAGE_ROLES.settings);
    await changeSearchSynonyms(db(), () => DEFAULT_SEARCH_SYNONYMS, actor.id, "defaults_restored");
    revalidateSearchSynonyms();
    return { ok: true, message: `The list is back to the ${plural(DEFAULT_SEARCH_SYNONYMS.length, "group")} Clearhall starts with.` };
  } catch (error) {
    return refusal(error);
  }
}
