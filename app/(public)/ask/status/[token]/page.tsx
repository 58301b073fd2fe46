import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { Caution } from "@/components/mdx/caution";
import { Markdown } from "@/components/ui/markdown";
import { db } from "@/db/client";
import { TOPIC_CAUTIONS } from "@/lib/answers/cautions";
import { formatReplyDate } from "@/lib/questions/confirmation-mail";
import { PARENT_STEP_LABELS, PARENT_STEPS } from "@/lib/questions/parent-status";
import { questionStatusByToken } from "@/lib/questions/status";
import { districtTimeZone } from "@/lib/settings/district";

export const dynamic = "force-dynamic";

// The address is the key to the page: keep it out of search engines and out of Referer headers.
export const metadata: Metadata = {
  title: "Your question",
  robots: { index: false, follow: false, nocache: true },
  referrer: "no-referrer",
};

type Params = { params: Promise<{ token: string }> };

export default async function QuestionStatusPage({ params }: Params) {
  const view = await questionStatusByToken(db(), (await params).token);
  // Unknown, mistyped and made-up tokens all get the site's ordinary 404 page.
  if (!view) notFound();
  const dateFormat = new Intl.DateTimeFormat("en-US", { dateStyle: "long", timeZone: await districtTimeZone(db()) });
  const current = PARENT_STEPS.indexOf(view.status.step as (typeof PARENT_STEPS)[number]);
  const topicCaution = view.reply ? TOPIC_CAUTIONS[view.topic] : undefined;

  return (
    <div className="max-w-prose">
      <p className="text-sm font-bold text-ink-soft">Private page for the person who asked</p>
      <h1 className="mt-1 text-3xl">Your question {view.reference}</h1>

      <section aria-labelledby="status-now" className="mt-6 rounded-plate border-2 border-harbour bg-harbour-soft p-5">
        <h2 id="status-now" className="text-xl">
          Status: {view.status.label}
        </h2>
        <p className="mt-1">{view.status.explanation}</p>
        {view.replyBy ? (
          <p className="mt-2">
            We aim to reply by <strong>{formatReplyDate(view.replyBy)}</strong>.
          </p>
        ) : null}
        {current >= 0 ? (
          <ol className="mt-4 space-y-2" aria-label="Steps to your answer">
            {PARENT_STEPS.map((step, i) => {
              const mark = i < current || (i === current && step === "answered") ? "Done" : i === current ? "Now" : "Next";
              return (
                <li key={step} className="flex items-start gap-3">
                  <span
                    className={`inline-block min-w-16 rounded-plate border-2 px-2 text-center text-sm font-bold ${
                      mark === "Now" ? "border-harbour bg-harbour text-paper" : mark === "Done" ? "border-leaf bg-white text-leaf" : "border-paper-line bg-white text-ink-soft"
                    }`}
                  >
                    {mark}
                  </span>
                  <span className={mark === "Now" ? "font-bold" : undefined}>{PARENT_STEP_LABELS[step]}</span>
                </li>
              );
            })}
          </ol>
        ) : null}
      </section>

      {view.reply ? (
        <section aria-labelledby="status-answer" className="mt-8">
          <h2 id="status-answer" className="text-2xl">
            Our answer
          </h2>
          <p className="mt-1 text-sm text-ink-soft">
            Sent <time dateTime={view.reply.sentAt}>{dateFormat.format(new Date(view.reply.sentAt))}</time>
          </p>
          <Markdown source={view.reply.bodyMarkdown} className="mt-3" />
          {topicCaution ? (
            <Caution title={topicCaution.title}>
              <p>{topicCaution.text}</p>
            </Caution>
          ) : null}
        </section>
      ) : null}

      <section aria-labelledby="status-question" className="mt-8">
        <h2 id="status-question" className="text-2xl">
          What you asked
        </h2>
        <dl className="mt-3 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1">
          <dt className="font-bold">Sent</dt>
          <dd>
            <time dateTime={view.receivedAt}>{dateFormat.format(new Date(view.receivedAt))}</time>
          </dd>
          <dt className="font-bold">School</dt>
          <dd>{view.schoolName ?? "All schools (the whole district)"}</dd>
          <dt className="font-bold">Topic</dt>
          <dd>{view.topicLabel}</dd>
          {view.room ? (
            <>
              <dt className="font-bold">Room or grade</dt>
              <dd>{view.room}</dd>
            </>
          ) : null}
        </dl>
        <blockquote className="mt-4 whitespace-pre-wrap rounded-plate border-l-8 border-harbour-line bg-white p-4">{view.question}</blockquote>
      </section>

      <p className="mt-8 text-sm text-ink-soft">
        Keep this page&apos;s address to yourself: anyone who has it can read your question. It never shows your name or e-mail
        address.
      </p>
      <p className="mt-4 flex flex-wrap gap-x-6 gap-y-2">
        <Link href="/ask">Ask another question</Link>
        <Link href="/">Reopening home page</Link>
      </p>
    </div>
  );
}
