"use client";

import Link from "next/link";
import { useId, useState, type FormEvent } from "react";
import type { QuestionDetail, RelatedQuestion } from "@/lib/questions/desk-types";
import { STATE_LABELS } from "@/lib/questions/labels";
import { deskApi } from "./api";
import { ConfirmBox } from "@/components/ui/confirm-box";
import { useQuestionMutation } from "./use-question";

interface Target {
  id: number;
  reference: string;
  excerpt: string;
}

/**
 * Joining: this question becomes part of another, so the other's reply goes to this asker too.
 * Candidates are the similar open questions; any other can be named by its reference.
 */
export function MergePanel({ question, onMoved }: { question: QuestionDetail; onMoved: () => void }) {
  const id = useId();
  const [target, setTarget] = useState<Target | null>(null);
  const [reference, setReference] = useState("");
  const [lookupError, setLookupError] = useState("");
  const [looking, setLooking] = useState(false);
  const merge = useQuestionMutation(question.id, (t: Target) => deskApi.merge(question.id, t.id), {
    success: (_q, t) => `${question.reference} is joined to ${t.reference}. The reply to ${t.reference} goes to this asker too.`,
    alsoChanges: (t) => [t.id],
    onDone: () => {
      setTarget(null);
      onMoved();
    },
  });

  const candidates = question.similarOpen.filter((q) => q.id !== question.id);

  async function findByReference(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const wanted = reference.trim().toUpperCase();
    if (!/^Q-\d{4}-\d{4,}$/.test(wanted)) {
      setLookupError("Write a reference like Q-2026-0004.");
      return;
    }
    if (wanted === question.reference) {
      setLookupError("That is this question. Write the reference of the question to join it to.");
      return;
    }
    setLooking(true);
    setLookupError("");
    try {
      const page = await deskApi.queue(new URLSearchParams({ q: wanted, state: "all", pageSize: "5" }).toString());
      const found = page.items.find((i) => i.reference.toUpperCase() === wanted);
      if (!found) setLookupError(`No question has the reference ${wanted}.`);
      else if (["answered", "declined", "merged"].includes(found.state))
        setLookupError(`${wanted} is closed (${STATE_LABELS[found.state] ?? found.state}); join to a question still waiting.`);
      else setTarget({ id: found.id, reference: found.reference, excerpt: found.excerpt });
    } catch (error) {
      setLookupError(error instanceof Error ? error.message : "The search did not work.");
    } finally {
      setLooking(false);
    }
  }

  return (
    <section aria-labelledby={`${id}-title`} className="rounded-plate border-2 border-paper-line bg-white p-4" data-testid="merge-panel">
      <h2 id={`${id}-title`} className="text-lg">
        Same question as another?
      </h2>
      <p className="mt-1 text-sm">
        Join this question to the other one: one answer then replies to both askers. This question closes and its history stays.
      </p>
      {candidates.length > 0 ? (
        <>
          <h3 className="mt-3 text-base">Similar questions still waiting</h3>
          <ul className="mt-1 space-y-2">
            {candidates.map((c) => (
              <SimilarCandidate key={c.id} candidate={c} onJoin={() => setTarget({ id: c.id, reference: c.reference, excerpt: c.excerpt })} disabled={merge.isPending} />
            ))}
          </ul>
        </>
      ) : (
        <p className="mt-2 text-sm text-ink-soft">No similar question is waiting.</p>
      )}
      <form onSubmit={findByReference} noValidate className="mt-3">
        <label htmlFor={`${id}-ref`} className="block font-bold">
          Join to a question by its reference
        </label>
        <div className="mt-1 flex gap-2">
          <input
            id={`${id}-ref`}
            value={reference}
            onChange={(e) => setReference(e.target.value)}
            placeholder="Q-2026-0004"
            autoComplete="off"
            aria-invalid={lookupError ? true : undefined}
            aria-describedby={lookupError ? `${id}-ref-error` : undefined}
            className="block min-h-11 w-full min-w-0 rounded-plate border-2 border-ink-soft bg-white px-3 text-base text-ink aria-[invalid=true]:border-ember"
          />
          <button type="submit" disabled={looking} className="min-h-11 shrink-0 rounded-plate border-2 border-harbour bg-paper px-3 font-bold text-harbour-deep hover:bg-harbour-soft disabled:opacity-60">
            {looking ? "Finding…" : "Find"}
          </button>
        </div>
        {lookupError ? (
          <p id={`${id}-ref-error`} className="mt-1 font-bold text-ember-deep">
            <span aria-hidden="true">! </span>
            {lookupError}
          </p>
        ) : null}
      </form>
      {target ? (
        <ConfirmBox
          title={`Join ${question.reference} to ${target.reference}?`}
          confirmLabel={`Yes, join to ${target.reference}`}
          pendingLabel="Joining…"
          pending={merge.isPending}
          onConfirm={() => merge.mutate(target)}
          onCancel={() => setTarget(null)}
        >
          <p className="mt-1 text-sm">“{target.excerpt}”</p>
          <p className="mt-1 text-sm">The reply written on {target.reference} will go to this asker as well. This cannot be undone.</p>
        </ConfirmBox>
      ) : null}
    </section>
  );
}

function SimilarCandidate({ candidate, onJoin, disabled }: { candidate: RelatedQuestion; onJoin: () => void; disabled: boolean }) {
  return (
    <li className="rounded-plate border border-paper-line p-2">
      <p className="text-sm">
        <Link href={`/staff/desk/${candidate.id}`} className="font-bold">
          {candidate.reference}
        </Link>{" "}
        <span className="text-ink-soft">({STATE_LABELS[candidate.state] ?? candidate.state})</span>
      </p>
      <p className="text-sm">{candidate.excerpt}</p>
      <button
        type="button"
        disabled={disabled}
        onClick={onJoin}
        className="mt-1 min-h-11 rounded-plate border-2 border-harbour bg-paper px-3 text-sm font-bold text-harbour-deep hover:bg-harbour-soft disabled:opacity-60"
      >
        Join to this question<span className="sr-only"> ({candidate.reference})</span>
      </button>
    </li>
  );
}
