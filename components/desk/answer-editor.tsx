"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useEffect, useId, useMemo, useRef, useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import { Markdown } from "@/components/ui/markdown";
import { Notice } from "@/components/ui/notice";
import type { DraftView, PersonalDetailWarning, QuestionDetail, QuestionEventView } from "@/lib/questions/desk-types";
import { findPersonalDetails } from "@/lib/questions/personal-details";
import { nextStates, type QuestionState } from "@/lib/questions/state-machine";
import { draftSchema } from "@/lib/validation/desk";
import { z } from "zod";
import { deskApi } from "./api";
import { useDeskMessages } from "./desk-messages";
import { formatDateTime, plural } from "./format";
import { mergeWarnings, PersonalDetailWarnings } from "./personal-detail-warnings";
import { PlainLanguageScore } from "./plain-language-score";
import { SnippetPicker } from "./snippet-picker";
import { useQuestionMutation } from "./use-question";

type DraftFormInput = z.input<typeof draftSchema>;
type DraftFormValues = z.output<typeof draftSchema>;

const TEXTAREA =
  "mt-1 block w-full rounded-plate border-2 border-ink-soft bg-white px-3 py-2 font-mono text-base text-ink aria-[invalid=true]:border-ember";

// Saving a draft moves these states to "being written" (the state machine's edges).
const SAVE_MOVES_TO_DRAFTING: readonly QuestionState[] = ["received", "changes_requested", "approved"];

export interface AnswerEditorProps {
  question: QuestionDetail;
  timeZone: string;
  /** Called after a step that changes where the question is, so the page can move focus. */
  onMoved: () => void;
}

export function lastEventTo(events: QuestionEventView[], state: QuestionState): QuestionEventView | undefined {
  return [...events].filter((e) => e.toState === state).sort((a, b) => b.createdAt.localeCompare(a.createdAt) || b.id - a.id)[0];
}

export function AnswerEditor({ question, timeZone, onMoved }: AnswerEditorProps) {
  const id = useId();
  const messages = useDeskMessages();
  const latest = question.drafts[0];
  const [serverWarnings, setServerWarnings] = useState<PersonalDetailWarning[]>([]);
  const [confirmingSend, setConfirmingSend] = useState(false);
  const textarea = useRef<HTMLTextAreaElement | null>(null);
  const confirmBox = useRef<HTMLDivElement>(null);

  const latestBody = latest?.bodyMarkdown ?? "";
  const latestPublic = latest?.publicQuestion ?? "";
  const formValues = useMemo(() => ({ bodyMarkdown: latestBody, publicQuestion: latestPublic }), [latestBody, latestPublic]);
  const {
    register,
    handleSubmit,
    setError,
    setValue,
    reset,
    control,
    getValues,
    formState: { errors, isDirty },
  } = useForm<DraftFormInput, unknown, DraftFormValues>({
    resolver: zodResolver(draftSchema),
    // A newer draft (saved by a colleague) replaces the text, except fields with unsaved edits here.
    values: formValues,
    resetOptions: { keepDirtyValues: true },
  });
  const body = useWatch({ control, name: "bodyMarkdown" }) ?? "";
  const publicQuestion = useWatch({ control, name: "publicQuestion" }) ?? "";

  useEffect(() => {
    if (confirmingSend) confirmBox.current?.focus();
  }, [confirmingSend]);

  const fieldErrors = (fields: Record<string, string>) => {
    for (const [name, message] of Object.entries(fields)) {
      if (name === "bodyMarkdown" || name === "publicQuestion") setError(name, { type: "server", message }, { shouldFocus: true });
      else messages.alert(message);
    }
  };

  const save = useQuestionMutation(question.id, (v: DraftFormValues) => deskApi.draft(question.id, v.bodyMarkdown, v.publicQuestion), {
    success: (q, _v, result) => {
      const at = q.drafts[0]?.createdAt;
      const found = result.warnings.length > 0 ? ` ${plural(result.warnings.length, "possible personal detail")} to look at.` : "";
      return `Draft saved${at ? ` at ${formatDateTime(at, timeZone)}` : ""}.${found}`;
    },
    onFieldErrors: fieldErrors,
    onDone: (_q, v, result) => {
      setServerWarnings(result.warnings);
      reset(v);
    },
  });
  const check = useQuestionMutation(question.id, () => deskApi.check(question.id), {
    success: () => "Sent to facilities for a check. They have been told by e-mail.",
    onDone: onMoved,
  });
  const send = useQuestionMutation(question.id, () => deskApi.send(question.id), {
    success: (q) => `Reply sent to ${q.askerEmail}${q.mergedFrom.length ? ` and ${plural(q.mergedFrom.length, "other asker")}` : ""}.`,
    onDone: () => {
      setConfirmingSend(false);
      onMoved();
    },
  });
  const busy = save.isPending || check.isPending || send.isPending;

  const technical = question.technical;
  const needsSave = isDirty || !latest;
  const stateAfterSave: QuestionState = needsSave && SAVE_MOVES_TO_DRAFTING.includes(question.state) ? "drafting" : question.state;
  // The server's own list when nothing has to be saved first; otherwise what the state machine allows after the save. The server decides either way.
  const next = needsSave ? nextStates(stateAfterSave, { technical }) : question.nextStates;
  const showCheck = technical && next.includes("facilities_check");
  const showSend = next.includes("answered") && (needsSave ? question.can.edit : question.can.send);

  async function saveIfNeeded(values: DraftFormValues): Promise<boolean> {
    if (!needsSave) return true;
    try {
      await save.mutateAsync(values);
      return true;
    } catch {
      return false;
    }
  }

  // Buttons stay focusable while a step runs (aria-disabled), so focus is never dropped; these guards stop a second request.
  const onSave = handleSubmit((values) => {
    if (!busy) save.mutate(values);
  });
  const onCheck = handleSubmit(async (values) => {
    if (busy) return;
    if (!(await saveIfNeeded(values))) return;
    check.mutate(undefined);
  });
  const onSendAsked = handleSubmit(() => {
    if (!busy) setConfirmingSend(true);
  });
  const onSendConfirmed = handleSubmit(async (values) => {
    if (busy) return;
    if (!(await saveIfNeeded(values))) return;
    send.mutate(undefined);
  });

  function insertSnippet(markdown: string, title: string) {
    const el = textarea.current;
    const current = getValues("bodyMarkdown") ?? "";
    const start = el?.selectionStart ?? current.length;
    const end = el?.selectionEnd ?? current.length;
    const before = current.slice(0, start);
    const after = current.slice(end);
    const gapBefore = before === "" || before.endsWith("\n\n") ? "" : before.endsWith("\n") ? "\n" : "\n\n";
    const gapAfter = after === "" || after.startsWith("\n\n") ? "" : after.startsWith("\n") ? "\n" : "\n\n";
    const text = `${before}${gapBefore}${markdown}${gapAfter}${after}`;
    setValue("bodyMarkdown", text, { shouldDirty: true, shouldValidate: Boolean(errors.bodyMarkdown) });
    messages.announce(`Snippet “${title}” inserted into the answer.`);
    const caret = before.length + gapBefore.length + markdown.length;
    window.setTimeout(() => {
      el?.focus();
      el?.setSelectionRange(caret, caret);
    }, 0);
  }

  function restore(draft: DraftView) {
    setValue("bodyMarkdown", draft.bodyMarkdown, { shouldDirty: true });
    setValue("publicQuestion", draft.publicQuestion, { shouldDirty: true });
    messages.announce(`The revision from ${formatDateTime(draft.createdAt, timeZone)} is in the editor. Save the draft to keep it.`);
    textarea.current?.focus();
  }

  const liveWarnings = useMemo(
    () => mergeWarnings(findPersonalDetails(body, "answer"), findPersonalDetails(publicQuestion, "publicQuestion")),
    [body, publicQuestion],
  );
  // The server's findings count only for the text it saw.
  const warnings = isDirty ? liveWarnings : mergeWarnings(liveWarnings, serverWarnings);

  const sentBack = question.state === "changes_requested" ? lastEventTo(question.events, "changes_requested") : undefined;
  const approvedBy = question.state === "approved" ? lastEventTo(question.events, "approved") : undefined;
  const { ref: bodyRef, ...bodyField } = register("bodyMarkdown");
  const bodyDescribedBy = [`${id}-body-hint`, errors.bodyMarkdown ? `${id}-body-error` : null].filter(Boolean).join(" ");
  const publicDescribedBy = [`${id}-public-hint`, errors.publicQuestion ? `${id}-public-error` : null].filter(Boolean).join(" ");

  return (
    <section aria-labelledby={`${id}-title`} className="mt-6">
      <h2 id={`${id}-title`} className="text-xl">
        Your answer
      </h2>
      {technical ? (
        <p className="mt-1 max-w-prose">
          This question is technical, so facilities check the answer before it is sent.
        </p>
      ) : null}
      {sentBack ? (
        <Notice tone="warning" title={`Facilities sent the answer back${sentBack.actor ? ` (${sentBack.actor.name}, ${formatDateTime(sentBack.createdAt, timeZone)})` : ""}`}>
          <p className="whitespace-pre-wrap" data-testid="sent-back-comment">
            {sentBack.comment ?? "No comment was given."}
          </p>
          <p className="mt-1 text-sm">Change the answer, save it, and send it to facilities again.</p>
        </Notice>
      ) : null}
      {approvedBy ? (
        <Notice tone="success" title={`Checked by facilities${approvedBy.actor ? ` (${approvedBy.actor.name}, ${formatDateTime(approvedBy.createdAt, timeZone)})` : ""}`}>
          {approvedBy.comment ? <p className="whitespace-pre-wrap">{approvedBy.comment}</p> : null}
          <p className={approvedBy.comment ? "mt-1 text-sm" : "text-sm"}>Send the reply now. If you change the answer, it needs a new check.</p>
        </Notice>
      ) : null}
      <form onSubmit={onSave} noValidate className="mt-3">
        <SnippetPicker onInsert={insertSnippet} disabled={busy} />
        <div className="mt-4">
          <label htmlFor={`${id}-body`} className="block font-bold">
            Answer (Markdown)
          </label>
          <p id={`${id}-body-hint`} className="text-sm text-ink-soft">
            Plain words, short sentences. Markdown works: a blank line starts a paragraph, **bold**, - for a list, [words](https://…) for a link.
          </p>
          <textarea
            id={`${id}-body`}
            rows={12}
            aria-invalid={errors.bodyMarkdown ? true : undefined}
            aria-describedby={bodyDescribedBy}
            className={TEXTAREA}
            readOnly={busy}
            {...bodyField}
            ref={(el) => {
              bodyRef(el);
              textarea.current = el;
            }}
          />
          {errors.bodyMarkdown?.message ? (
            <p id={`${id}-body-error`} className="mt-1 font-bold text-ember-deep">
              <span aria-hidden="true">! </span>
              {errors.bodyMarkdown.message}
            </p>
          ) : null}
        </div>

        <section aria-labelledby={`${id}-preview-title`} className="mt-4">
          <h3 id={`${id}-preview-title`} className="text-base">
            Preview: what the family will read
          </h3>
          <div className="mt-1 rounded-plate border-2 border-dashed border-harbour-line bg-white p-4" data-testid="answer-preview">
            {body.trim() ? <Markdown source={body} /> : <p className="text-ink-soft">The answer appears here as you write it.</p>}
          </div>
        </section>

        <div className="mt-4 grid gap-3 md:grid-cols-2">
          <PlainLanguageScore markdown={body} id={`${id}-score`} />
          <PersonalDetailWarnings warnings={warnings} id={`${id}-warnings`} />
        </div>

        <div className="mt-4">
          <label htmlFor={`${id}-public`} className="block font-bold">
            The question for the answers page (optional until you publish)
          </label>
          <p id={`${id}-public-hint`} className="text-sm text-ink-soft">
            Rewrite the family&apos;s question as anyone could have asked it: no names, no contact details, nothing about one child&apos;s health.
          </p>
          <textarea
            id={`${id}-public`}
            rows={3}
            aria-invalid={errors.publicQuestion ? true : undefined}
            aria-describedby={publicDescribedBy}
            className={TEXTAREA.replace("font-mono ", "")}
            readOnly={busy}
            {...register("publicQuestion")}
          />
          {errors.publicQuestion?.message ? (
            <p id={`${id}-public-error`} className="mt-1 font-bold text-ember-deep">
              <span aria-hidden="true">! </span>
              {errors.publicQuestion.message}
            </p>
          ) : null}
        </div>

        <div className="mt-4 flex flex-wrap items-center gap-3">
          <button type="submit" aria-disabled={busy || undefined} className="min-h-11 rounded-plate border-2 border-harbour bg-paper px-4 font-bold text-harbour-deep hover:bg-harbour-soft aria-disabled:opacity-60">
            {save.isPending ? "Saving…" : "Save draft"}
          </button>
          {showCheck ? (
            <button type="button" aria-disabled={busy || undefined} onClick={() => void onCheck()} className="min-h-11 rounded-plate border-2 border-harbour bg-harbour px-4 font-bold text-paper hover:bg-harbour-deep aria-disabled:opacity-60">
              {check.isPending ? "Sending to facilities…" : question.state === "approved" ? "Save and send to facilities again" : "Send to facilities for a check"}
            </button>
          ) : null}
          {showSend && !confirmingSend ? (
            <button type="button" aria-disabled={busy || undefined} onClick={() => void onSendAsked()} className="min-h-11 rounded-plate border-2 border-harbour bg-harbour px-4 font-bold text-paper hover:bg-harbour-deep aria-disabled:opacity-60">
              Send reply
            </button>
          ) : null}
          <span className="text-sm text-ink-soft" data-testid="draft-state">
            {isDirty ? "Unsaved changes" : latest ? `Saved ${formatDateTime(latest.createdAt, timeZone)}` : "Not saved yet"}
          </span>
        </div>
        {technical && !showCheck && !showSend && question.state !== "facilities_check" ? (
          <p className="mt-2 text-sm text-ink-soft">Save the draft first; then it can go to facilities.</p>
        ) : null}

        {confirmingSend ? (
          <div
            ref={confirmBox}
            tabIndex={-1}
            role="group"
            aria-labelledby={`${id}-confirm-title`}
            className="mt-4 rounded-plate border-2 border-harbour bg-harbour-soft p-4 focus:outline-none focus-visible:outline-3"
          >
            <h3 id={`${id}-confirm-title`} className="text-base">
              Send the reply now?
            </h3>
            <p className="mt-1">
              This e-mails the answer to <strong>{question.askerEmail}</strong>
              {question.mergedFrom.length ? ` and to the ${plural(question.mergedFrom.length, "asker")} of the questions joined to this one` : ""}. An
              e-mail cannot be taken back.
              {needsSave ? " Your changes are saved first." : ""}
            </p>
            <div className="mt-3 flex flex-wrap gap-3">
              <button type="button" aria-disabled={busy || undefined} onClick={() => void onSendConfirmed()} className="min-h-11 rounded-plate border-2 border-harbour bg-harbour px-4 font-bold text-paper hover:bg-harbour-deep aria-disabled:opacity-60">
                {send.isPending ? "Sending…" : "Yes, send the reply"}
              </button>
              <button type="button" aria-disabled={busy || undefined} onClick={() => !busy && setConfirmingSend(false)} className="min-h-11 rounded-plate border-2 border-harbour bg-paper px-4 font-bold text-harbour-deep hover:bg-harbour-soft">
                Not yet
              </button>
            </div>
          </div>
        ) : null}
      </form>

      <Revisions drafts={question.drafts} timeZone={timeZone} onRestore={restore} disabled={busy} />
    </section>
  );
}

export function Revisions({
  drafts,
  timeZone,
  onRestore,
  disabled,
}: {
  drafts: DraftView[];
  timeZone: string;
  onRestore?: (draft: DraftView) => void;
  disabled?: boolean;
}) {
  const id = useId();
  if (drafts.length === 0) return null;
  return (
    <section aria-labelledby={`${id}-title`} className="mt-6">
      <h3 id={`${id}-title`} className="text-lg">
        Saved revisions ({drafts.length})
      </h3>
      <ol className="mt-2 space-y-2" data-testid="revisions">
        {drafts.map((d, i) => (
          <li key={d.id} className="rounded-plate border-2 border-paper-line bg-white p-3">
            <details>
              <summary className="cursor-pointer">
                <span className="font-bold">{formatDateTime(d.createdAt, timeZone)}</span> by {d.author?.name ?? "someone no longer on staff"}
                {i === 0 ? <span className="ml-2 text-sm text-ink-soft">(latest)</span> : null}
              </summary>
              <div className="mt-2 rounded-plate bg-paper-deep p-3">
                <Markdown source={d.bodyMarkdown} />
              </div>
              {d.publicQuestion ? (
                <p className="mt-2 text-sm">
                  <strong>Public question:</strong> {d.publicQuestion}
                </p>
              ) : null}
            </details>
            {onRestore ? (
              <button
                type="button"
                aria-disabled={disabled || undefined}
                onClick={() => !disabled && onRestore(d)}
                className="mt-2 min-h-11 rounded-plate border-2 border-harbour bg-paper px-3 text-sm font-bold text-harbour-deep hover:bg-harbour-soft aria-disabled:opacity-60"
              >
                Restore into the editor<span className="sr-only"> (revision of {formatDateTime(d.createdAt, timeZone)})</span>
              </button>
            ) : null}
          </li>
        ))}
      </ol>
    </section>
  );
}
