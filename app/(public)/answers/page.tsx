import type { Metadata } from "next";
import Link from "next/link";
import { AnswersSearch } from "@/components/answers/answers-search";
import { Breadcrumbs } from "@/components/site/breadcrumbs";
import { db } from "@/db/client";
import { parseAnswersQuery } from "@/lib/answers/query";
import { MAX_QUERY_LENGTH } from "@/lib/answers/search";
import { getAnswersSearch } from "@/lib/answers/search-index";

export const metadata: Metadata = {
  title: "Answers to families’ questions",
  description: "Every answer the district has published about cleaning, fresh air, building work, signs, classrooms and reported cases. Search in your own words.",
};

// The query lives in the URL and answers taken down must vanish at once, so this page is rendered per request.
export const dynamic = "force-dynamic";

/** Answers shown at first, and added by "Show more". */
const PAGE_SIZE = 50;
const MAX_SHOWN = 5000;

type Props = { searchParams: Promise<Record<string, string | string[] | undefined>> };

export default async function AnswersPage({ searchParams }: Props) {
  const params = await searchParams;
  const state = await getAnswersSearch(db());
  const parsed = parseAnswersQuery(params, state.payload.schools.map(([slug]) => slug));
  const query = parsed.query;
  // A search too long to be a search is cut rather than refused; other bad values are simply left out.
  if (!parsed.ok && parsed.errors.q && typeof params.q === "string") query.q = params.q.replace(/\s+/g, " ").trim().slice(0, MAX_QUERY_LENGTH);
  const shownParam = typeof params.shown === "string" && /^\d{1,5}$/.test(params.shown) ? Number(params.shown) : PAGE_SIZE;
  const limit = Math.min(MAX_SHOWN, Math.max(PAGE_SIZE, shownParam));
  const result = state.engine.search(query, { answerLimit: limit });

  return (
    <>
      <Breadcrumbs items={[{ href: "/", label: "Home" }, { label: "Answers" }]} />
      <h1 className="text-3xl">Answers to families’ questions</h1>
      <p className="mt-3 max-w-prose text-lg">
        Every answer we have published, newest first. Search in your own words, or choose your school and a topic. The search
        also looks through our school and district pages.
      </p>
      <div className="mt-6">
        <AnswersSearch
          key={JSON.stringify([query, limit])}
          initialQuery={query}
          initialResult={result}
          initialLimit={limit}
          pageSize={PAGE_SIZE}
          schools={state.payload.schools}
          topics={state.payload.topics}
          indexUrl={`/api/answers/search-index?v=${state.version}`}
        />
      </div>
      <aside aria-labelledby="answers-ask" className="my-10 max-w-prose rounded-plate border-2 border-harbour-line bg-paper-deep p-5">
        <h2 id="answers-ask" className="text-xl">
          Did not find your answer?
        </h2>
        <p className="mt-1">
          Staff who know the topic read every question and reply by e-mail. <Link href="/ask" className="font-bold">Ask a question</Link>
        </p>
      </aside>
    </>
  );
}
