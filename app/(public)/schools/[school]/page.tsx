import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { SchoolAirSummary } from "@/components/air/school-air-summary";
import { AskAboutThis } from "@/components/mdx/ask-about-this";
import { Breadcrumbs } from "@/components/site/breadcrumbs";
import { SchoolTopicNav } from "@/components/site/school-topic-nav";
import { db } from "@/db/client";
import { schoolPage } from "@/lib/content/files";
import { SCHOOL_TOPICS } from "@/lib/content/topics";
import { listProjects, PROJECT_STATUS_LABELS } from "@/lib/projects/repository";
import { getSchoolBySlug, listSchools } from "@/lib/schools/repository";

export const dynamicParams = false;
export const revalidate = 300;

type Params = { params: Promise<{ school: string }> };

export async function generateStaticParams() {
  return (await listSchools(db())).map((s) => ({ school: s.slug }));
}

export async function generateMetadata({ params }: Params): Promise<Metadata> {
  const school = await getSchoolBySlug(db(), (await params).school);
  if (!school) return {};
  const description = `What changed at ${school.name} for the reopening: cleaning, fresh air and building work.`;
  return { title: school.name, description, openGraph: { title: school.name, description } };
}

export default async function SchoolOverviewPage({ params }: Params) {
  const school = await getSchoolBySlug(db(), (await params).school);
  if (!school) notFound();
  const [pages, projects] = await Promise.all([
    Promise.all(SCHOOL_TOPICS.map(async (t) => ({ topic: t, page: await schoolPage(school.slug, t.slug) }))),
    listProjects(db(), school.slug),
  ]);
  const finished = projects.filter((p) => p.status === "finished").length;
  return (
    <>
      <Breadcrumbs items={[{ href: "/", label: "Home" }, { label: school.name }]} />
      <SchoolTopicNav school={school.slug} />
      <h1 className="text-3xl">{school.name}</h1>
      <p className="mt-2 text-lg">
        Grades {school.grades} · {school.address} · Front office{" "}
        <a href={`tel:${school.phone.replace(/[^0-9+]/g, "")}`}>{school.phone}</a>
      </p>

      <section aria-labelledby="glance" className="mt-section">
        <h2 id="glance" className="text-2xl">
          What changed here, at a glance
        </h2>
        <ul className="mt-4 grid gap-4 md:grid-cols-3">
          {pages.map(({ topic, page }) =>
            page ? (
              <li key={topic.slug} className="rounded-plate border-2 border-paper-line bg-white p-5">
                <h3 className="text-lg">
                  <Link href={`/schools/${school.slug}/${topic.slug}`}>{topic.label}</Link>
                </h3>
                <p className="mt-1">{page.frontmatter.summary}</p>
              </li>
            ) : null,
          )}
        </ul>
      </section>

      <SchoolAirSummary school={school.slug} />

      {projects.length > 0 ? (
        <section aria-labelledby="work" className="mt-section">
          <h2 id="work" className="text-2xl">
            Building work
          </h2>
          <p className="mt-2">
            {finished} of {projects.length} projects finished.{" "}
            <Link href={`/schools/${school.slug}/building`}>See every project and what it changed</Link>.
          </p>
          <ul className="mt-3 list-disc pl-6">
            {projects.map((p) => (
              <li key={p.id}>
                {p.title}: <strong>{PROJECT_STATUS_LABELS[p.status]}</strong>
              </li>
            ))}
          </ul>
        </section>
      ) : null}

      <AskAboutThis school={school.slug} topic="other" />
    </>
  );
}
