import type { SearchResult } from "./search";

const MONTHS = ["January", "February", "March", "April", "May", "June", "July", "August", "September", "October", "November", "December"];

/** "2026-11-19" → "November 19, 2026", the same in every browser and on the server (no locale data involved). */
export function formatDay(day: string): string {
  const m = /^(\d{4})-(\d{2})-(\d{2})$/.exec(day);
  if (!m) return day;
  return `${MONTHS[Number(m[2]) - 1] ?? m[2]} ${Number(m[3])}, ${m[1]}`;
}

function plural(n: number, one: string, many: string): string {
  return `${n.toLocaleString("en-US")} ${n === 1 ? one : many}`;
}

/** What a result list holds, in words: the visible count and what screen readers hear after typing stops. */
export function resultSummary(result: SearchResult, names: { school?: string; topic?: string }): string {
  const parts = [plural(result.totalAnswers, "answer", "answers")];
  if (result.searched) parts.push(`matching “${result.query.q}”`);
  if (names.school) parts.push(result.query.school === "district" ? "for every school" : `for ${names.school}`);
  if (names.topic) parts.push(`about ${names.topic}`);
  let text = parts.join(" ");
  if (result.searched && result.totalSections > 0) text += `, and ${plural(result.totalSections, "part", "parts")} of our pages`;
  return `${text}.`;
}
