import { queueQuerySchema, type QueueQuery } from "@/lib/validation/desk";

// The queue's filters live in the address bar, so a view can be shared and survives a reload. The
// same schema as the server's reads them; a value it refuses is dropped rather than breaking the page.

const KEYS = ["state", "school", "topic", "technical", "assignee", "q", "sort", "dir", "page", "pageSize"] as const;
type Key = (typeof KEYS)[number];

export const QUEUE_DEFAULTS: QueueQuery = queueQuerySchema.parse({});

export function parseQueueParams(params: URLSearchParams | Record<string, string | string[] | undefined>): QueueQuery {
  const raw: Partial<Record<Key, string>> = {};
  for (const key of KEYS) {
    const value = params instanceof URLSearchParams ? params.get(key) : params[key];
    const one = Array.isArray(value) ? value[0] : value;
    if (typeof one === "string" && one !== "") raw[key] = one;
  }
  const first = queueQuerySchema.safeParse(raw);
  if (first.success) return first.data;
  const bad = new Set(first.error.issues.map((i) => String(i.path[0])));
  const kept = Object.fromEntries(Object.entries(raw).filter(([key]) => !bad.has(key)));
  const second = queueQuerySchema.safeParse(kept);
  return second.success ? second.data : QUEUE_DEFAULTS;
}

/** The query string for a view, leaving out what is the default so links stay short. */
export function queueSearch(query: QueueQuery): string {
  const out = new URLSearchParams();
  for (const key of KEYS) {
    const value = query[key];
    if (value === undefined || value === QUEUE_DEFAULTS[key]) continue;
    out.set(key, String(value));
  }
  return out.toString();
}
