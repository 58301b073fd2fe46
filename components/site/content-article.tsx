import type { ReactNode } from "react";
import { LastReviewed } from "@/components/mdx/last-reviewed";
import { MdxBody } from "@/components/mdx/render";
import type { ContentPage } from "@/lib/content/files";

/** A content page: title, summary, review line, what is on the page, then the words. */
export function ContentArticle({ page, before }: { page: ContentPage; before?: ReactNode }) {
  const sections = page.headings.filter((h) => h.depth === 2);
  return (
    <article>
      {before}
      <h1 className="text-3xl">{page.frontmatter.title}</h1>
      <p className="mt-3 max-w-prose text-lg">{page.frontmatter.summary}</p>
      <LastReviewed updated={page.frontmatter.updated} reviewedBy={page.frontmatter.reviewedBy} />
      {sections.length > 2 ? (
        <nav aria-label="On this page" className="my-6 max-w-prose rounded-plate border-2 border-paper-line bg-white p-4 no-print">
          <p className="font-bold">On this page</p>
          <ul className="mt-1 list-disc pl-6">
            {sections.map((h) => (
              <li key={h.id}>
                <a href={`#${h.id}`}>{h.text}</a>
              </li>
            ))}
          </ul>
        </nav>
      ) : null}
      <div className="mt-6">
        <MdxBody page={page} />
      </div>
    </article>
  );
}
