import type { School } from "@/db/types";

/** A plain GET form: works without JavaScript, and nothing moves until the visitor presses Go. */
export function SchoolPicker({ schools, current, idSuffix = "header" }: { schools: School[]; current?: string; idSuffix?: string }) {
  const id = `school-picker-${idSuffix}`;
  return (
    <form action="/schools" method="get" className="flex flex-wrap items-end gap-2" role="search" aria-label="Choose your school">
      <div className="min-w-0 max-w-full">
        <label htmlFor={id} className="block text-sm font-bold">
          Your school
        </label>
        <select
          id={id}
          name="school"
          defaultValue={current ?? ""}
          className="min-h-11 max-w-full rounded-plate border-2 border-ink-soft bg-white px-2 py-1 text-base text-ink"
        >
          <option value="">Choose a school…</option>
          {schools.map((s) => (
            <option key={s.slug} value={s.slug}>
              {s.name}
            </option>
          ))}
        </select>
      </div>
      <button type="submit" className="min-h-11 rounded-plate border-2 border-harbour bg-harbour px-4 font-bold text-paper hover:bg-harbour-deep">
        Go
      </button>
    </form>
  );
}
