"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useId, useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import type { QuestionDetail } from "@/lib/questions/desk-types";
import { reviewSchema } from "@/lib/validation/desk";
import { deskApi } from "./api";
import { useQuestionMutation } from "./use-question";

type ReviewFormInput = z.input<typeof reviewSchema>;
type ReviewFormValues = z.output<typeof reviewSchema>;

/** Facilities' check of a technical answer: approve it, or send it back saying what to change. */
export function ReviewPanel({ question, onMoved }: { question: QuestionDetail; onMoved: () => void }) {
  const id = useId();
  const [decision, setDecision] = useState<"approve" | "changes" | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    setValue,
    formState: { errors },
  } = useForm<ReviewFormInput, unknown, ReviewFormValues>({
    resolver: zodResolver(reviewSchema),
    defaultValues: { decision: "approve", comment: "" },
  });
  const review = useQuestionMutation(question.id, (v: ReviewFormValues) => deskApi.review(question.id, v.decision, v.comment), {
    success: (_q, v) =>
      v.decision === "approve" ? "Approved. Communications can now send the reply." : "Sent back to communications with your comment.",
    onFieldErrors: (fields) => {
      if (fields.comment) setError("comment", { type: "server", message: fields.comment }, { shouldFocus: true });
      if (fields.decision) setError("comment", { type: "server", message: fields.decision }, { shouldFocus: true });
    },
    onDone: onMoved,
  });

  const submit = (choice: "approve" | "changes") => {
    setDecision(choice);
    setValue("decision", choice);
    void handleSubmit((values) => review.mutate(values))();
  };
  const describedBy = [`${id}-hint`, errors.comment ? `${id}-error` : null].filter(Boolean).join(" ");

  return (
    <section aria-labelledby={`${id}-title`} className="mt-6 rounded-plate border-2 border-harbour bg-white p-4" data-testid="review-panel">
      <h2 id={`${id}-title`} className="text-xl">
        Your check
      </h2>
      <p className="mt-1 max-w-prose">
        Read the answer above as a family would. Approve it if every figure, product class and instruction is right, or send it back and say what
        needs to change.
      </p>
      <form noValidate onSubmit={(e) => e.preventDefault()} className="mt-3">
        <input type="hidden" {...register("decision")} />
        <label htmlFor={`${id}-comment`} className="block font-bold">
          Comment for communications
        </label>
        <p id={`${id}-hint`} className="text-sm text-ink-soft">
          Needed when you send the answer back; optional when you approve. It is kept in the question&apos;s history.
        </p>
        <textarea
          id={`${id}-comment`}
          rows={4}
          aria-invalid={errors.comment ? true : undefined}
          aria-describedby={describedBy}
          className="mt-1 block w-full rounded-plate border-2 border-ink-soft bg-white px-3 py-2 text-base text-ink aria-[invalid=true]:border-ember"
          {...register("comment")}
        />
        {errors.comment?.message ? (
          <p id={`${id}-error`} className="mt-1 font-bold text-ember-deep">
            <span aria-hidden="true">! </span>
            {errors.comment.message}
          </p>
        ) : null}
        <div className="mt-3 flex flex-wrap gap-3">
          <button
            type="button"
            disabled={review.isPending}
            onClick={() => submit("approve")}
            className="min-h-11 rounded-plate border-2 border-harbour bg-harbour px-4 font-bold text-paper hover:bg-harbour-deep disabled:opacity-60"
          >
            {review.isPending && decision === "approve" ? "Approving…" : "Approve the answer"}
          </button>
          <button
            type="button"
            disabled={review.isPending}
            onClick={() => submit("changes")}
            className="min-h-11 rounded-plate border-2 border-ember bg-paper px-4 font-bold text-ember-deep hover:bg-ember-soft disabled:opacity-60"
          >
            {review.isPending && decision === "changes" ? "Sending back…" : "Send back with a comment"}
          </button>
        </div>
      </form>
    </section>
  );
}
