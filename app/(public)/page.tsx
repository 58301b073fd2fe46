import Link from "next/link";
import { SchoolCard } from "@/components/site/school-card";
import { SchoolPicker } from "@/components/site/school-picker";
import { db } from "@/db/client";
import { listSchools } from "@/lib/schools/repository";
import { DISTRICT_TOPICS } from "@/lib/content/district-topics";

export const revalidate = 300;

export default async function HomePage() {
  const schools = await listSchools(db());
  return (
    <>
      <section aria-labelledby="welcome" className="max-w-prose">
        <h1 id="welcome" className="text-3xl">
          Our school buildings are open again
        </h1>
        <p className="mt-4 text-lg">
          Over the closure, our facilities team cleaned, repaired and improved every building. Here you can see what
          changed at your child&apos;s school, why we made each change, and how we keep rooms clean and well aired.
        </p>
      </section>

      <section aria-labelledby="pick" className="mt-section rounded-plate border-2 border-harbour-line bg-harbour-soft p-5">
        <h2 id="pick" className="text-xl">
          Start with your school
        </h2>
        <p className="mb-3">Each school has its own pages on cleaning, fresh air and building work.</p>
        <SchoolPicker schools={schools} idSuffix="home" />
      </section>

      <section aria-labelledby="schools" className="mt-section">
        <h2 id="schools" className="text-2xl">
          Our schools
        </h2>
        {schools.length === 0 ? (
          <p className="mt-3">No schools have been added yet.</p>
        ) : (
          <ul className="mt-4 grid gap-4 md:grid-cols-3">
            {schools.map((s) => (
              <SchoolCard key={s.slug} school={s} />
            ))}
          </ul>
        )}
      </section>

      <section aria-labelledby="district" className="mt-section">
        <h2 id="district" className="text-2xl">
          For every school
        </h2>
        <ul className="mt-4 grid gap-4 md:grid-cols-2">
          {DISTRICT_TOPICS.map((t) => (
            <li key={t.slug} className="rounded-plate border-2 border-paper-line bg-white p-5">
              <h3 className="text-lg">
                <Link href={`/district/${t.slug}`}>{t.title}</Link>
              </h3>
              <p>{t.blurb}</p>
            </li>
          ))}
        </ul>
      </section>
    </>
  );
}
