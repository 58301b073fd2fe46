import type { MetadataRoute } from "next";
import { db } from "@/db/client";
import { answerPath, listPublishedAnswers } from "@/lib/answers/repository";
import { DISTRICT_TOPICS } from "@/lib/content/district-topics";
import { SCHOOL_TOPICS } from "@/lib/content/topics";
import { env } from "@/lib/env";
import { listSchools } from "@/lib/schools/repository";

export const revalidate = 3600;

export default async function sitemap(): Promise<MetadataRoute.Sitemap> {
  const base = env().APP_URL.replace(/\/$/, "");
  const [schools, answers] = await Promise.all([listSchools(db()), listPublishedAnswers(db())]);
  return [
    { url: `${base}/` },
    { url: `${base}/schools` },
    { url: `${base}/ask` },
    { url: `${base}/answers` },
    ...DISTRICT_TOPICS.map((t) => ({ url: `${base}/district/${t.slug}` })),
    ...schools.flatMap((s) => [{ url: `${base}/schools/${s.slug}` }, ...SCHOOL_TOPICS.map((t) => ({ url: `${base}/schools/${s.slug}/${t.slug}` }))]),
    ...answers.map((a) => ({ url: `${base}${answerPath(a.id)}`, lastModified: a.updatedAt })),
  ];
}
