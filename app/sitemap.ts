import type { MetadataRoute } from "next";
import { db } from "@/db/client";
import { DISTRICT_TOPICS } from "@/lib/content/district-topics";
import { SCHOOL_TOPICS } from "@/lib/content/topics";
import { env } from "@/lib/env";
import { listSchools } from "@/lib/schools/repository";

export const revalidate = 3600;

export default async function sitemap(): Promise<MetadataRoute.Sitemap> {
  const base = env().APP_URL.replace(/\/$/, "");
  const schools = await listSchools(db());
  return [
    { url: `${base}/` },
    { url: `${base}/schools` },
    ...DISTRICT_TOPICS.map((t) => ({ url: `${base}/district/${t.slug}` })),
    ...schools.flatMap((s) => [{ url: `${base}/schools/${s.slug}` }, ...SCHOOL_TOPICS.map((t) => ({ url: `${base}/schools/${s.slug}/${t.slug}` }))]),
  ];
}
