"use client";

import { useQuery } from "@tanstack/react-query";
import { useId, useRef, useState } from "react";
import type { QuestionDetail, StaffRef } from "@/lib/questions/desk-types";
import { deskApi, deskKeys } from "./api";
import { useQuestionMutation } from "./use-question";

const NOBODY = "none";

/** Who writes the answer: anyone in communications or an admin, or nobody yet. */
export function AssignmentPanel({ question, me }: { question: QuestionDetail; me: StaffRef }) {
  const id = useId();
  const who = useRef<HTMLParagraphElement>(null);
  const editable = question.can.edit && !["answered", "declined", "merged"].includes(question.state);
  const staff = useQuery({ queryKey: deskKeys.assignees, queryFn: deskApi.assignees, staleTime: 5 * 60_000, enabled: editable });
  const current = question.assignee ? String(question.assignee.id) : NOBODY;
  const [choice, setChoice] = useState<string | null>(null);
  const selected = choice ?? current;
  const assign = useQuestionMutation(question.id, (assigneeId: number | null) => deskApi.assign(question.id, assigneeId), {
    success: (q) => (q.assignee ? `Assigned to ${q.assignee.id === me.id ? "you" : q.assignee.name}.` : "Nobody is assigned now."),
    onDone: () => {
      setChoice(null);
      // "Assign to me" disappears once it is done: carry on from who has the question now.
      window.setTimeout(() => who.current?.focus(), 0);
    },
  });
  const people = staff.data?.staff ?? [];
  const options = people.some((p) => p.id === question.assignee?.id) || !question.assignee ? people : [question.assignee, ...people];

  return (
    <section aria-labelledby={`${id}-title`} className="rounded-plate border-2 border-paper-line bg-white p-4" data-testid="assignment">
      <h2 id={`${id}-title`} className="text-lg">
        Assigned to
      </h2>
      <p className="mt-1 focus:outline-none focus-visible:outline-3" data-testid="assignee" ref={who} tabIndex={-1}>
        {question.assignee ? (
          <strong>{question.assignee.id === me.id ? `You (${question.assignee.name})` : question.assignee.name}</strong>
        ) : (
          <span className="text-ink-soft">Nobody yet</span>
        )}
      </p>
      {editable ? (
        <form
          className="mt-2"
          onSubmit={(e) => {
            e.preventDefault();
            assign.mutate(selected === NOBODY ? null : Number(selected));
          }}
        >
          <label htmlFor={`${id}-who`} className="block text-sm font-bold">
            Give it to
          </label>
          <div className="mt-1 flex flex-wrap gap-2">
            <select
              id={`${id}-who`}
              value={selected}
              onChange={(e) => setChoice(e.target.value)}
              className="block min-h-11 min-w-0 flex-1 rounded-plate border-2 border-ink-soft bg-white px-2 text-base text-ink"
            >
              <option value={NOBODY}>Nobody</option>
              {options.map((p) => (
                <option key={p.id} value={String(p.id)}>
                  {p.id === me.id ? `${p.name} (me)` : p.name}
                </option>
              ))}
            </select>
            <button
              type="submit"
              disabled={assign.isPending || selected === current}
              className="min-h-11 rounded-plate border-2 border-harbour bg-paper px-3 font-bold text-harbour-deep hover:bg-harbour-soft disabled:opacity-60"
            >
              Assign
            </button>
          </div>
          {question.assignee?.id !== me.id ? (
            <button
              type="button"
              disabled={assign.isPending}
              onClick={() => assign.mutate(me.id)}
              className="mt-2 min-h-11 rounded-plate border-2 border-harbour bg-harbour px-3 font-bold text-paper hover:bg-harbour-deep disabled:opacity-60"
            >
              Assign to me
            </button>
          ) : null}
        </form>
      ) : null}
    </section>
  );
}
