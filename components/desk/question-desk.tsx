"use client";

import Link from "next/link";
import { useCallback, useId, useMemo, useRef } from "react";
import { Markdown } from "@/components/ui/markdown";
import { Notice } from "@/components/ui/notice";
import type { QuestionDetail, SchoolRef, StaffRef } from "@/lib/questions/desk-types";
import { TOPIC_LABELS } from "@/lib/questions/labels";
import { findPersonalDetails } from "@/lib/questions/personal-details";
import type { QuestionState } from "@/lib/questions/state-machine";
import { DeskApiError } from "./api";
import { AnswerEditor, lastEventTo, Revisions } from "./answer-editor";
import { AssignmentPanel } from "./assignment-panel";
import { DeclinePanel } from "./decline-panel";
import { DeskMessagesProvider } from "./desk-messages";
import { formatDateTime, formatDay, schoolDaysLeftLabel, urgencyOf } from "./format";
import { HistoryList } from "./history-list";
import { MergePanel } from "./merge-panel";
import { NotesPanel } from "./notes-panel";
import { mergeWarnings, PersonalDetailWarnings } from "./personal-detail-warnings";
import { PlainLanguageScore } from "./plain-language-score";
import { PublishPanel } from "./publish-panel";
import { ReviewPanel } from "./review-panel";
import { StateBadge } from "./state-badge";
import { TechnicalToggle } from "./technical-toggle";
import { useQuestion } from "./use-question";

export interface QuestionDeskProps {
  questionId: number;
  me: StaffRef;
  schools: SchoolRef[];
  timeZone: string;
  /** Where "back" goes: the queue for communications, the check list for facilities. */
  backHref: string;
  backLabel: string;
}

const EDITABLE: readonly QuestionState[] = ["received", "drafting", "changes_requested", "approved"];

export function QuestionDesk(props: QuestionDeskProps) {
  return (
    <DeskMessagesProvider>
      <QuestionDeskBody {...props} />
    </DeskMessagesProvider>
  );
}

function QuestionDeskBody({ questionId, me, schools, timeZone, backHref, backLabel }: QuestionDeskProps) {
  const query = useQuestion(questionId);
  const stateHeading = useRef<HTMLHeadingElement>(null);
  const historyId = useId();
  // After a step that moves the question, start reading again from where it now is.
  const onMoved = useCallback(() => {
    window.setTimeout(() => stateHeading.current?.focus(), 0);
  }, []);

  const back = (
    <p className="mb-3">
      <Link href={backHref}>
        <span aria-hidden="true">← </span>
        {backLabel}
      </Link>
    </p>
  );

  if (query.isPending) {
    return (
      <>
        {back}
        <p role="status">Loading the question…</p>
      </>
    );
  }
  if (query.isError) {
    const missing = query.error instanceof DeskApiError && query.error.status === 404;
    return (
      <>
        {back}
        <h1 className="text-2xl">{missing ? "No such question" : "The question could not be loaded"}</h1>
        <p className="mt-2" role="alert">
          {query.error.message}
        </p>
        {missing ? null : (
          <button type="button" onClick={() => query.refetch()} className="mt-2 min-h-11 font-bold text-harbour underline underline-offset-4">
            Try again
          </button>
        )}
      </>
    );
  }

  const q = query.data;
  const urgency = urgencyOf(q.schoolDaysLeft);
  const editing = q.can.edit && EDITABLE.includes(q.state);
  const mergeable = q.can.edit && q.nextStates.includes("merged");
  const declinable = q.can.edit && q.nextStates.includes("declined");

  return (
    <>
      <title>{`${q.reference} — Staff`}</title>
      {back}
      <div className="flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1">
        <h1 className="text-2xl">
          {q.reference}
          <span className="sr-only">: </span>
          <span className="ml-3 text-lg font-normal text-ink-soft">{TOPIC_LABELS[q.topic] ?? q.topic}</span>
        </h1>
      </div>
      <p className="mt-1 text-ink-soft">
        {q.school?.name ?? "All schools"}
        {q.room ? ` · ${q.room}` : ""} · received {formatDateTime(q.receivedAt, timeZone)}
      </p>

      <div className="mt-3 flex flex-wrap items-center gap-x-4 gap-y-2 rounded-plate border-2 border-paper-line bg-white p-3">
        <h2 ref={stateHeading} tabIndex={-1} className="text-base focus:outline-none focus-visible:outline-3" data-testid="question-state">
          <span className="sr-only">Where it is: </span>
          <StateBadge state={q.state} />
        </h2>
        <p className={urgency === "late" || urgency === "today" ? "font-bold text-ember-deep" : ""}>
          {urgency === "late" || urgency === "today" ? <span aria-hidden="true">! </span> : null}
          {schoolDaysLeftLabel(q.schoolDaysLeft)}
          {q.schoolDaysLeft !== null ? <span className="font-normal text-ink-soft"> (reply target {formatDay(q.dueDate)})</span> : null}
        </p>
        <p>{q.technical ? "Technical: facilities check needed" : "No facilities check needed"}</p>
      </div>

      <div className="mt-4">
        <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_22rem]">
          <div className="min-w-0">
            <section aria-labelledby="the-question" className="rounded-plate border-2 border-harbour-line bg-white p-4">
              <h2 id="the-question" className="text-xl">
                The question
              </h2>
              <p className="mt-1 text-sm text-ink-soft">
                From {q.askerName ?? "someone who gave no name"} &lt;{q.askerEmail}&gt;
                {q.language !== "en" ? ` · reply language: ${q.language}` : ""}
              </p>
              <p lang={q.language} className="mt-2 whitespace-pre-wrap text-lg" data-testid="question-body">
                {q.body}
              </p>
            </section>

            {q.mergedInto ? (
              <Notice tone="info" title={`Joined to ${q.mergedInto.reference}`}>
                <p>
                  The reply written on <Link href={`/staff/desk/${q.mergedInto.id}`}>{q.mergedInto.reference}</Link> goes to this asker as well.
                </p>
              </Notice>
            ) : null}
            {q.mergedFrom.length > 0 ? (
              <Notice tone="info" title={q.mergedFrom.length === 1 ? "1 question is joined to this one" : `${q.mergedFrom.length} questions are joined to this one`}>
                <p>Their askers get this reply too:</p>
                <ul className="mt-1 list-disc pl-6" data-testid="merged-from">
                  {q.mergedFrom.map((m) => (
                    <li key={m.id}>
                      <Link href={`/staff/desk/${m.id}`}>{m.reference}</Link>: {m.excerpt}
                    </li>
                  ))}
                </ul>
              </Notice>
            ) : null}

            {editing ? <AnswerEditor key={q.id} question={q} timeZone={timeZone} onMoved={onMoved} /> : <AnswerReadOnly question={q} timeZone={timeZone} />}
            {q.state === "facilities_check" && q.can.review ? <ReviewPanel question={q} onMoved={onMoved} /> : null}
            {q.state === "answered" || q.publications.length > 0 ? <PublishPanel question={q} schools={schools} timeZone={timeZone} /> : null}
          </div>

          <div className="space-y-4">
            <AssignmentPanel question={q} me={me} />
            <TechnicalToggle question={q} />
            {mergeable ? <MergePanel question={q} onMoved={onMoved} /> : null}
            <RelatedLists question={q} timeZone={timeZone} />
            <NotesPanel question={q} timeZone={timeZone} />
            {declinable ? <DeclinePanel question={q} onMoved={onMoved} /> : null}
          </div>
        </div>
        <HistoryList events={q.events} timeZone={timeZone} id={historyId} />
      </div>
    </>
  );
}

/** What the page shows in place of the editor: the draft under check, the reply sent, or why it closed. */
function AnswerReadOnly({ question: q, timeZone }: { question: QuestionDetail; timeZone: string }) {
  const latest = q.drafts[0];
  const warnings = useMemo(
    () => (latest ? mergeWarnings(findPersonalDetails(latest.bodyMarkdown, "answer"), findPersonalDetails(latest.publicQuestion, "publicQuestion")) : []),
    [latest],
  );

  if ((q.state === "answered" || q.state === "merged") && q.reply) {
    return (
      <section aria-labelledby="the-reply" className="mt-6">
        <h2 id="the-reply" className="text-xl">
          The reply sent
        </h2>
        <p className="mt-1" data-testid="reply-sent">
          <span aria-hidden="true">✓ </span>
          Sent {q.state === "merged" && q.mergedInto ? `with the answer to ${q.mergedInto.reference}, ` : ""}
          {formatDateTime(q.reply.sentAt, timeZone)}
          {q.reply.sentBy ? ` by ${q.reply.sentBy.name}` : ""} to {q.askerEmail}
          {q.state === "answered" && q.mergedFrom.length ? ` and the askers of ${q.mergedFrom.map((m) => m.reference).join(", ")}` : ""}.
        </p>
        <div className="mt-2 rounded-plate border-2 border-leaf bg-white p-4">
          <Markdown source={q.reply.bodyMarkdown} />
        </div>
      </section>
    );
  }
  if (q.state === "declined") {
    const declined = lastEventTo(q.events, "declined");
    return (
      <section aria-labelledby="declined" className="mt-6">
        <h2 id="declined" className="text-xl">
          Declined
        </h2>
        <p className="mt-1">
          {declined ? `${declined.actor?.name ?? "Staff"} declined it on ${formatDateTime(declined.createdAt, timeZone)}. ` : ""}The asker was told by
          e-mail, with this reason:
        </p>
        {declined?.comment ? <blockquote className="mt-2 whitespace-pre-wrap border-l-4 border-ink-soft bg-white p-3">{declined.comment}</blockquote> : null}
      </section>
    );
  }
  if (q.state === "merged") return null;

  return (
    <section aria-labelledby="draft-read" className="mt-6">
      <h2 id="draft-read" className="text-xl">
        {q.state === "facilities_check" ? "The answer waiting for a check" : "The answer so far"}
      </h2>
      {q.state === "facilities_check" && !q.can.review ? (
        <p className="mt-1 max-w-prose">Facilities are checking this answer. It can be changed again once they approve it or send it back.</p>
      ) : null}
      {latest ? (
        <>
          <p className="mt-1 text-sm text-ink-soft">
            Draft saved {formatDateTime(latest.createdAt, timeZone)}
            {latest.author ? ` by ${latest.author.name}` : ""}
          </p>
          <div className="mt-2 rounded-plate border-2 border-harbour-line bg-white p-4" data-testid="draft-read">
            <Markdown source={latest.bodyMarkdown} />
          </div>
          {latest.publicQuestion ? (
            <p className="mt-2">
              <strong>Question for the answers page:</strong> {latest.publicQuestion}
            </p>
          ) : null}
          <div className="mt-3 grid gap-3 md:grid-cols-2">
            <PlainLanguageScore markdown={latest.bodyMarkdown} id="read-score" />
            <PersonalDetailWarnings warnings={warnings} id="read-warnings" />
          </div>
          <Revisions drafts={q.drafts} timeZone={timeZone} />
        </>
      ) : (
        <p className="mt-1">No answer has been drafted yet.</p>
      )}
    </section>
  );
}

function RelatedLists({ question: q, timeZone }: { question: QuestionDetail; timeZone: string }) {
  return (
    <>
      <section aria-labelledby="asker-other" className="rounded-plate border-2 border-paper-line bg-white p-4">
        <h2 id="asker-other" className="text-lg">
          This asker&apos;s other questions
        </h2>
        {q.otherFromAsker.length === 0 ? (
          <p className="mt-1 text-sm">None.</p>
        ) : (
          <ul className="mt-1 space-y-2 text-sm" data-testid="asker-other">
            {q.otherFromAsker.map((o) => (
              <li key={o.id}>
                <Link href={`/staff/desk/${o.id}`} className="font-bold">
                  {o.reference}
                </Link>{" "}
                <span className="text-ink-soft">({formatDateTime(o.receivedAt, timeZone)})</span>
                <span className="block">
                  <StateBadge state={o.state} />
                </span>
                <span className="block">{o.excerpt}</span>
              </li>
            ))}
          </ul>
        )}
      </section>
      <section aria-labelledby="similar-answers" className="rounded-plate border-2 border-paper-line bg-white p-4">
        <h2 id="similar-answers" className="text-lg">
          Published answers that look similar
        </h2>
        {q.similarAnswers.length === 0 ? (
          <p className="mt-1 text-sm">None found.</p>
        ) : (
          <ul className="mt-1 list-disc space-y-1 pl-5 text-sm" data-testid="similar-answers">
            {q.similarAnswers.map((a) => (
              <li key={a.id}>
                <a href={a.url} target="_blank" rel="noopener">
                  {a.question}
                  <span className="sr-only"> (opens in a new tab)</span>
                </a>{" "}
                <span className="text-ink-soft">
                  {a.school ?? "All schools"} · {TOPIC_LABELS[a.topic] ?? a.topic}
                </span>
              </li>
            ))}
          </ul>
        )}
      </section>
    </>
  );
}
