/** The parameters of the answers page; empty means "any". Parsed and checked in ./query. */
export interface AnswersParams {
  q: string;
  school: string;
  topic: string;
}

/** The answers page URL for a query: only the parameters in use, so a shared link stays short. */
export function answersHref(query: Partial<AnswersParams>, extra: Record<string, string> = {}): string {
  const params = new URLSearchParams();
  if (query.q) params.set("q", query.q);
  if (query.school) params.set("school", query.school);
  if (query.topic) params.set("topic", query.topic);
  for (const [k, v] of Object.entries(extra)) params.set(k, v);
  const search = params.toString();
  return search ? `/answers?${search}` : "/answers";
}
