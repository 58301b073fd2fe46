import type { Metadata } from "next";
import Link from "next/link";
import { cookies } from "next/headers";
import { notFound } from "next/navigation";
import { HelpfulVote } from "@/components/answers/helpful-vote";
import { Caution } from "@/components/mdx/caution";
import { Breadcrumbs } from "@/components/site/breadcrumbs";
import { Markdown } from "@/components/ui/markdown";
import { db } from "@/db/client";
import { TOPIC_CAUTIONS } from "@/lib/answers/cautions";
import { formatDay } from "@/lib/answers/format";
import { answersHref } from "@/lib/answers/query";
import { DISTRICT_WIDE_LABEL, getPublishedAnswer } from "@/lib/answers/repository";
import { getAnswersSearch } from "@/lib/answers/search-index";
import { VOTER_COOKIE, voteCounts, voteOf, voterHash } from "@/lib/answers/votes";
import { markdownExcerpt } from "@/lib/markdown/parse";
import { districtTimeZone } from "@/lib/settings/district";

// An answer taken down must disappear at once, so this page is never cached.
export const dynamic = "force-dynamic";

type Params = { params: Promise<{ id: string }> };

async function answerFor(params: Params["params"]) {
  const { id } = await params;
  return /^[1-9]\d{0,9}$/.test(id) ? getPublishedAnswer(db(), Number(id)) : null;
}

export async function generateMetadata({ params }: Params): Promise<Metadata> {
  const answer = await answerFor(params);
  if (!answer) return {};
  const description = markdownExcerpt(answer.answerMarkdown, 155);
  return { title: answer.question, description, openGraph: { title: answer.question, description, type: "article" } };
}

export default async function PublishedAnswerPage({ params }: Params) {
  const answer = await answerFor(params);
  if (!answer) notFound();
  const voter = voterHash((await cookies()).get(VOTER_COOKIE)?.value);
  const [timeZone, counts, vote, search] = await Promise.all([
    districtTimeZone(db()),
    voteCounts(db(), answer.id),
    voteOf(db(), answer.id, voter),
    getAnswersSearch(db()),
  ]);
  const related = search.engine.related(answer.id, 3);
  const dateFormat = new Intl.DateTimeFormat("en-US", { dateStyle: "long", timeZone });
  const caution = TOPIC_CAUTIONS[answer.topic];
  const updated = answer.updatedAt.slice(0, 10) !== answer.publishedAt.slice(0, 10);
  const followUp = `/ask?${new URLSearchParams({ school: answer.school?.slug ?? "district", topic: answer.topic }).toString()}`;
  return (
    <article className="max-w-prose">
      <Breadcrumbs
        items={[
          { href: "/", label: "Home" },
          { href: "/answers", label: "Answers" },
          { label: "This answer" },
        ]}
      />
      <p className="text-sm font-bold text-ink-soft">A question families asked</p>
      <h1 className="mt-1 text-3xl">{answer.question}</h1>
      <p className="mt-3 text-ink-soft">
        {answer.school ? <Link href={answersHref({ school: answer.school.slug })}>{answer.school.name}</Link> : DISTRICT_WIDE_LABEL} ·{" "}
        <Link href={answersHref({ topic: answer.topic })}>{answer.topicLabel}</Link> · Published{" "}
        <time dateTime={answer.publishedAt}>{dateFormat.format(new Date(answer.publishedAt))}</time>
        {updated ? (
          <>
            {" "}
            · Updated <time dateTime={answer.updatedAt}>{dateFormat.format(new Date(answer.updatedAt))}</time>
          </>
        ) : null}
      </p>
      <h2 className="mt-8 text-2xl">Our answer</h2>
      <Markdown source={answer.answerMarkdown} className="mt-3" />
      {caution ? (
        <Caution title={caution.title}>
          <p>{caution.text}</p>
        </Caution>
      ) : null}
      <HelpfulVote answerId={answer.id} counts={counts} vote={vote} />
      {related.length > 0 ? (
        <section aria-labelledby="related" className="my-8">
          <h2 id="related" className="text-xl">
            Related answers
          </h2>
          <ul className="mt-3 space-y-3">
            {related.map((r) => (
              <li key={r.id}>
                <Link href={r.url} className="font-bold">
                  {r.question.text}
                </Link>
                <p className="text-sm text-ink-soft">
                  {r.schoolName} · {r.topicLabel} · <time dateTime={r.day}>{formatDay(r.day)}</time>
                </p>
              </li>
            ))}
          </ul>
        </section>
      ) : null}
      <aside className="my-8 rounded-plate border-2 border-harbour-line bg-paper-deep p-5">
        <p className="text-lg font-bold text-harbour-deep">Does this not answer your question?</p>
        <p className="mt-1">
          Our staff read every question and reply by e-mail. <Link href={followUp} className="font-bold">Ask a follow-up question</Link>
        </p>
      </aside>
    </article>
  );
}
