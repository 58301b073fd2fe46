"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useId, useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import type { QuestionDetail } from "@/lib/questions/desk-types";
import { declineSchema } from "@/lib/validation/desk";
import { deskApi } from "./api";
import { ConfirmBox } from "@/components/ui/confirm-box";
import { useQuestionMutation } from "./use-question";

type DeclineValues = z.output<typeof declineSchema>;

/** Declining takes two steps: write the reason, then confirm, because the asker is e-mailed at once. */
export function DeclinePanel({ question, onMoved }: { question: QuestionDetail; onMoved: () => void }) {
  const id = useId();
  const [confirming, setConfirming] = useState<DeclineValues | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    setFocus,
    formState: { errors },
  } = useForm<z.input<typeof declineSchema>, unknown, DeclineValues>({ resolver: zodResolver(declineSchema), defaultValues: { reason: "" } });
  const decline = useQuestionMutation(question.id, (v: DeclineValues) => deskApi.decline(question.id, v.reason), {
    success: () => `Declined. ${question.askerEmail} has been sent a polite e-mail with your reason.`,
    onFieldErrors: (fields) => {
      setConfirming(null);
      if (fields.reason) setError("reason", { type: "server", message: fields.reason }, { shouldFocus: true });
    },
    onDone: onMoved,
  });

  const describedBy = [`${id}-hint`, errors.reason ? `${id}-error` : null].filter(Boolean).join(" ");
  return (
    <section aria-labelledby={`${id}-title`} className="rounded-plate border-2 border-paper-line bg-white p-4" data-testid="decline-panel">
      <h2 id={`${id}-title`} className="text-lg">
        Decline the question
      </h2>
      <p className="mt-1 text-sm">
        For a question the desk cannot answer (not about the reopening, or for another office). The asker gets a short, polite e-mail that thanks
        them and gives your reason, in your words. Nothing else about them is shared.
      </p>
      <form onSubmit={handleSubmit((values) => setConfirming(values))} noValidate className="mt-3">
        <label htmlFor={`${id}-reason`} className="block font-bold">
          Reason, as the asker will read it
        </label>
        <p id={`${id}-hint`} className="text-sm text-ink-soft">
          For example: “Bus routes are handled by the transport office; please write to them at the address on the district home page.”
        </p>
        <textarea
          id={`${id}-reason`}
          rows={4}
          readOnly={Boolean(confirming)}
          aria-invalid={errors.reason ? true : undefined}
          aria-describedby={describedBy}
          className="mt-1 block w-full rounded-plate border-2 border-ink-soft bg-white px-3 py-2 text-base text-ink aria-[invalid=true]:border-ember"
          {...register("reason")}
        />
        {errors.reason?.message ? (
          <p id={`${id}-error`} className="mt-1 font-bold text-ember-deep">
            <span aria-hidden="true">! </span>
            {errors.reason.message}
          </p>
        ) : null}
        {confirming ? null : (
          <button type="submit" className="mt-3 min-h-11 rounded-plate border-2 border-ember bg-paper px-4 font-bold text-ember-deep hover:bg-ember-soft">
            Decline…
          </button>
        )}
      </form>
      {confirming ? (
        <ConfirmBox
          tone="danger"
          title={`Decline ${question.reference}?`}
          confirmLabel="Yes, decline and e-mail the asker"
          pendingLabel="Declining…"
          pending={decline.isPending}
          onConfirm={() => decline.mutate(confirming)}
          onCancel={() => {
            setConfirming(null);
            setFocus("reason");
          }}
        >
          <p className="mt-1 text-sm">
            {question.askerEmail} is e-mailed now, and the question is closed. This cannot be undone.
          </p>
        </ConfirmBox>
      ) : null}
    </section>
  );
}
