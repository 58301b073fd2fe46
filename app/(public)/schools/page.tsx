import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { z } from "zod";
import { SchoolCard } from "@/components/site/school-card";
import { db } from "@/db/client";
import { getSchoolBySlug, listSchools } from "@/lib/schools/repository";

export const metadata: Metadata = { title: "Schools", description: "Pick a school to see what changed in its building." };

const searchSchema = z.object({ school: z.string().regex(/^[a-z0-9-]{1,60}$/).optional().catch(undefined) });

export default async function SchoolsPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const { school } = searchSchema.parse(await searchParams);
  if (school && (await getSchoolBySlug(db(), school))) redirect(`/schools/${school}`);
  const schools = await listSchools(db());
  return (
    <>
      <h1 className="text-3xl">Schools</h1>
      <p className="mt-3 max-w-prose">Choose your child&apos;s school to see what changed in its building.</p>
      <ul className="mt-6 grid gap-4 md:grid-cols-3">
        {schools.map((s) => (
          <SchoolCard key={s.slug} school={s} />
        ))}
      </ul>
    </>
  );
}
