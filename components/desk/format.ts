// Dates and counts as the desk shows them, in the district's time zone so every member of staff
// reads the same day.

export function formatDateTime(iso: string, timeZone: string): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return iso;
  return new Intl.DateTimeFormat("en-US", { dateStyle: "medium", timeStyle: "short", timeZone }).format(date);
}

/** A calendar date (YYYY-MM-DD) as "Thu, Dec 3". */
export function formatDay(isoDate: string): string {
  const match = /^(\d{4})-(\d{2})-(\d{2})$/.exec(isoDate);
  if (!match) return isoDate;
  const date = new Date(Date.UTC(Number(match[1]), Number(match[2]) - 1, Number(match[3]), 12));
  return new Intl.DateTimeFormat("en-US", { weekday: "short", month: "short", day: "numeric", timeZone: "UTC" }).format(date);
}

export type Urgency = "late" | "today" | "soon" | "fine" | "closed";

export function urgencyOf(schoolDaysLeft: number | null): Urgency {
  if (schoolDaysLeft === null) return "closed";
  if (schoolDaysLeft < 0) return "late";
  if (schoolDaysLeft === 0) return "today";
  if (schoolDaysLeft === 1) return "soon";
  return "fine";
}

/** Said in words, so the urgency never rests on colour alone. */
export function schoolDaysLeftLabel(schoolDaysLeft: number | null): string {
  if (schoolDaysLeft === null) return "No reply due";
  if (schoolDaysLeft < 0) {
    const late = -schoolDaysLeft;
    return `${late} school day${late === 1 ? "" : "s"} late`;
  }
  if (schoolDaysLeft === 0) return "Due today";
  return `${schoolDaysLeft} school day${schoolDaysLeft === 1 ? "" : "s"} left`;
}

export function plural(count: number, one: string, many = `${one}s`): string {
  return `${count.toLocaleString("en-US")} ${count === 1 ? one : many}`;
}
