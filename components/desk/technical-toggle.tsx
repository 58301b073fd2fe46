"use client";

import { useId } from "react";
import type { QuestionDetail } from "@/lib/questions/desk-types";
import { TOPIC_LABELS } from "@/lib/questions/labels";
import { deskApi } from "./api";
import { useQuestionMutation } from "./use-question";

/** Staff can ask for a facilities check on any question; a technical topic always has one. */
export function TechnicalToggle({ question }: { question: QuestionDetail }) {
  const id = useId();
  const toggle = useQuestionMutation(question.id, (technical: boolean) => deskApi.technical(question.id, technical), {
    success: (q) => (q.technical ? "Marked technical: the answer goes to facilities for a check before it is sent." : "No facilities check needed now."),
  });
  const editable = question.can.edit && ["received", "drafting", "changes_requested", "approved"].includes(question.state);
  const locked = question.technicalByTopic;
  return (
    <section aria-labelledby={`${id}-title`} className="rounded-plate border-2 border-paper-line bg-white p-4" data-testid="technical">
      <h2 id={`${id}-title`} className="text-lg">
        Facilities check
      </h2>
      <p className="mt-1">
        <strong>{question.technical ? "Needed" : "Not needed"}</strong>
        {locked ? ` — ${TOPIC_LABELS[question.topic] ?? question.topic} questions always need one.` : null}
      </p>
      {editable ? (
        <div className="mt-2 flex items-start gap-3">
          <input
            id={`${id}-box`}
            type="checkbox"
            checked={question.technical}
            disabled={locked}
            aria-busy={toggle.isPending || undefined}
            aria-describedby={`${id}-hint`}
            onChange={(e) => !toggle.isPending && toggle.mutate(e.target.checked)}
            className="mt-1 size-6 shrink-0 accent-harbour"
          />
          <div>
            <label htmlFor={`${id}-box`} className="font-bold">
              Technical: facilities check the answer first
            </label>
            <p id={`${id}-hint`} className="text-sm text-ink-soft">
              {locked
                ? "Set by the topic; it cannot be turned off."
                : "Tick it when the answer speaks about air, equipment, chemicals or building work."}
            </p>
          </div>
        </div>
      ) : null}
    </section>
  );
}
