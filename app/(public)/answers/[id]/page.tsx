import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { Caution } from "@/components/mdx/caution";
import { Breadcrumbs } from "@/components/site/breadcrumbs";
import { Markdown } from "@/components/ui/markdown";
import { db } from "@/db/client";
import { TOPIC_CAUTIONS } from "@/lib/answers/cautions";
import { DISTRICT_WIDE_LABEL, getPublishedAnswer } from "@/lib/answers/repository";
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
  const dateFormat = new Intl.DateTimeFormat("en-US", { dateStyle: "long", timeZone: await districtTimeZone(db()) });
  const caution = TOPIC_CAUTIONS[answer.topic];
  const updated = answer.updatedAt.slice(0, 10) !== answer.publishedAt.slice(0, 10);
  const followUp = `/ask?${new URLSearchParams({ school: answer.school?.slug ?? "district", topic: answer.topic }).toString()}`;
  return (
    <article className="max-w-prose">
      <Breadcrumbs
        items={[
          { href: "/", label: "Home" },
          ...(answer.school ? [{ href: `/schools/${answer.school.slug}`, label: answer.school.name }] : []),
          { label: "Answer" },
        ]}
      />
      <p className="text-sm font-bold text-ink-soft">A question families asked</p>
      <h1 className="mt-1 text-3xl">{answer.question}</h1>
      <p className="mt-3 text-ink-soft">
        {answer.school?.name ?? DISTRICT_WIDE_LABEL} · {answer.topicLabel} · Published{" "}
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
      <aside className="my-8 rounded-plate border-2 border-harbour-line bg-paper-deep p-5">
        <p className="text-lg font-bold text-harbour-deep">Does this not answer your question?</p>
        <p className="mt-1">
          Our staff read every question and reply by e-mail. <Link href={followUp} className="font-bold">Ask a follow-up question</Link>
        </p>
      </aside>
    </article>
  );
}
