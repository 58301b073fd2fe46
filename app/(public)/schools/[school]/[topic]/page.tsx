import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { Breadcrumbs } from "@/components/site/breadcrumbs";
import { ContentArticle } from "@/components/site/content-article";
import { SchoolTopicNav } from "@/components/site/school-topic-nav";
import { db } from "@/db/client";
import { schoolPage } from "@/lib/content/files";
import { isSchoolTopic, SCHOOL_TOPICS } from "@/lib/content/topics";
import { getSchoolBySlug, listSchools } from "@/lib/schools/repository";

export const dynamicParams = false;
export const revalidate = 300;

type Params = { params: Promise<{ school: string; topic: string }> };

export async function generateStaticParams() {
  const schools = await listSchools(db());
  return schools.flatMap((s) => SCHOOL_TOPICS.map((t) => ({ school: s.slug, topic: t.slug })));
}

async function load(params: Params["params"]) {
  const { school: slug, topic } = await params;
  if (!isSchoolTopic(topic)) return null;
  const [school, page] = await Promise.all([getSchoolBySlug(db(), slug), schoolPage(slug, topic)]);
  return school && page ? { school, page, topic } : null;
}

export async function generateMetadata({ params }: Params): Promise<Metadata> {
  const found = await load(params);
  if (!found) return {};
  const title = `${found.page.frontmatter.title} — ${found.school.name}`;
  return {
    title,
    description: found.page.frontmatter.summary,
    openGraph: { title, description: found.page.frontmatter.summary, type: "article" },
  };
}

export default async function SchoolTopicPage({ params }: Params) {
  const found = await load(params);
  if (!found) notFound();
  const { school, page, topic } = found;
  const label = SCHOOL_TOPICS.find((t) => t.slug === topic)!.label;
  return (
    <ContentArticle
      page={page}
      before={
        <>
          <Breadcrumbs items={[{ href: "/", label: "Home" }, { href: `/schools/${school.slug}`, label: school.name }, { label }]} />
          <SchoolTopicNav school={school.slug} current={topic} />
        </>
      }
    />
  );
}
