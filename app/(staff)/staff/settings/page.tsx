import Link from "next/link";
import { HolidayAddForm } from "@/components/settings/holiday-add-form";
import { HolidayList } from "@/components/settings/holiday-list";
import { ReplySettingsForm } from "@/components/settings/reply-settings-form";
import { SynonymGroupsEditor } from "@/components/settings/synonym-groups-editor";
import { db } from "@/db/client";
import { requireStaffPage } from "@/lib/auth/guard";
import { STAFF_PAGE_ROLES } from "@/lib/auth/staff-nav";
import { isoDateInTimeZone } from "@/lib/school-days/calendar";
import { knownTimeZones } from "@/lib/school-days/time-zone";
import { districtHolidays, replySettings } from "@/lib/settings/district-settings";
import { DEFAULT_SEARCH_SYNONYMS, getSearchSynonyms } from "@/lib/settings/synonyms";

export const metadata = { title: "Settings" };

export default async function SettingsPage() {
  await requireStaffPage(STAFF_PAGE_ROLES.settings, "/staff/settings");
  const [reply, holidays, synonyms] = await Promise.all([replySettings(db()), districtHolidays(db()), getSearchSynonyms(db())]);
  const now = new Date();
  const today = isoDateInTimeZone(now, reply.timeZone);
  const upcoming = holidays.filter((h) => h.date >= today).length;

  return (
    <>
      <h1 className="text-2xl">Settings</h1>
      <p className="mt-2 max-w-prose text-ink-soft">
        District choices that the question desk, the public pages and the answers search use. A change applies at once, and each one is recorded with
        who made it.
      </p>
      <nav aria-label="On this page" className="mt-3">
        <ul className="flex flex-wrap gap-x-5 gap-y-1">
          <li>
            <a href="#reply">Reply target</a>
          </li>
          <li>
            <a href="#calendar">District calendar</a>
          </li>
          <li>
            <a href="#synonyms">Search words</a>
          </li>
        </ul>
      </nav>

      <section aria-labelledby="reply" className="mt-8 scroll-mt-4">
        <h2 id="reply" className="text-xl">
          Reply target and time zone
        </h2>
        <p className="mt-1 mb-4 max-w-prose text-sm">
          Families are told when to expect a reply, and the desk counts the school days left, from these two values and the calendar below.
        </p>
        <ReplySettingsForm
          replyTargetSchoolDays={reply.replyTargetSchoolDays}
          timeZone={reply.timeZone}
          holidays={holidays}
          now={now.toISOString()}
          timeZones={knownTimeZones()}
        />
      </section>

      <section aria-labelledby="calendar" className="mt-10 scroll-mt-4">
        <h2 id="calendar" className="text-xl">
          District calendar
        </h2>
        <p className="mt-1 mb-4 max-w-prose text-sm">
          Weekdays with no school: holidays, breaks and staff days. Saturdays and Sundays are never school days and need no entry. Reply due dates and
          the daily CO2 figures skip every day listed here.
        </p>
        <HolidayAddForm />
        <h3 className="mt-6 text-lg">
          Days off school{" "}
          <span className="font-normal">
            ({holidays.length} listed, {upcoming} from today on)
          </span>
        </h3>
        <p className="mb-3 text-sm text-ink-soft">Tick the days to take off the calendar. Past days are folded away under each year.</p>
        <HolidayList holidays={holidays} today={today} />
      </section>

      <section aria-labelledby="synonyms" className="mt-10 scroll-mt-4">
        <h2 id="synonyms" className="text-xl">
          Search words that mean the same
        </h2>
        <p className="mt-1 max-w-prose">A search for any word in a group also finds answers that use the others.</p>
        <p className="mt-1 max-w-prose text-sm text-ink-soft">
          So a family that searches for “AC” also finds answers about air conditioning. Words are kept in lower case, and a word can be in one group
          only.
        </p>
        <SynonymGroupsEditor groups={synonyms} defaultGroupCount={DEFAULT_SEARCH_SYNONYMS.length} />
      </section>

      <p className="mt-10 text-sm text-ink-soft">
        The CO2 threshold, school hours and seat spacing are set on <Link href="/staff/readings">CO2 readings</Link>; staff accounts on{" "}
        <Link href="/staff/users">Staff accounts</Link>.
      </p>
    </>
  );
}
