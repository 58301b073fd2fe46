import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { Breadcrumbs } from "@/components/site/breadcrumbs";
import { ContentArticle } from "@/components/site/content-article";
import { districtPage } from "@/lib/content/files";
import { DISTRICT_TOPICS } from "@/lib/content/district-topics";

export const dynamicParams = false;
export const revalidate = 300;

type Params = { params: Promise<{ page: string }> };

export function generateStaticParams() {
  return DISTRICT_TOPICS.map((t) => ({ page: t.slug }));
}

export async function generateMetadata({ params }: Params): Promise<Metadata> {
  const page = await districtPage((await params).page);
  if (!page) return {};
  const { title, summary } = page.frontmatter;
  return { title, description: summary, openGraph: { title, description: summary, type: "article" } };
}

export default async function DistrictPage({ params }: Params) {
  const page = await districtPage((await params).page);
  if (!page) notFound();
  return <ContentArticle page={page} before={<Breadcrumbs items={[{ href: "/", label: "Home" }, { label: page.frontmatter.title }]} />} />;
}
