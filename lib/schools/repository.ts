import type { DB } from "@/db/connection";
import type { School } from "@/db/types";

export function listSchools(db: DB): Promise<School[]> {
  return db.selectFrom("schools").selectAll().orderBy("id").execute();
}

export async function getSchoolBySlug(db: DB, slug: string): Promise<School | null> {
  return (await db.selectFrom("schools").selectAll().where("slug", "=", slug).executeTakeFirst()) ?? null;
}
