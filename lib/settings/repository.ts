import type { z } from "zod";
import type { DB } from "@/db/connection";

/**
 * A district setting, parsed with its schema. A missing or unreadable value
 * falls back to the default, so one bad edit never takes the site down.
 */
export async function getSetting<T>(db: DB, key: string, schema: z.ZodType<T>, fallback: T): Promise<T> {
  const row = await db.selectFrom("settings").select("value").where("key", "=", key).executeTakeFirst();
  if (!row) return fallback;
  try {
    const parsed = schema.safeParse(JSON.parse(row.value));
    return parsed.success ? parsed.data : fallback;
  } catch {
    return fallback;
  }
}

export async function putSetting(db: DB, key: string, value: unknown): Promise<void> {
  const now = new Date().toISOString();
  await db
    .insertInto("settings")
    .values({ key, value: JSON.stringify(value), updated_at: now })
    .onConflict((oc) => oc.column("key").doUpdateSet({ value: JSON.stringify(value), updated_at: now }))
    .execute();
}
