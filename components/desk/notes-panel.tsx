"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useId } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import type { QuestionDetail } from "@/lib/questions/desk-types";
import { noteSchema } from "@/lib/validation/desk";
import { deskApi } from "./api";
import { formatDateTime } from "./format";
import { useQuestionMutation } from "./use-question";

/** Notes for colleagues; never sent to the asker and never published. */
export function NotesPanel({ question, timeZone }: { question: QuestionDetail; timeZone: string }) {
  const id = useId();
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors },
  } = useForm<z.input<typeof noteSchema>, unknown, z.output<typeof noteSchema>>({ resolver: zodResolver(noteSchema), defaultValues: { body: "" } });
  const add = useQuestionMutation(question.id, (body: string) => deskApi.note(question.id, body), {
    success: () => "Note added.",
    onFieldErrors: (fields) => {
      if (fields.body) setError("body", { type: "server", message: fields.body }, { shouldFocus: true });
    },
    onDone: () => reset({ body: "" }),
  });
  const notes = [...question.notes].sort((a, b) => a.createdAt.localeCompare(b.createdAt) || a.id - b.id);
  return (
    <section aria-labelledby={`${id}-title`} className="rounded-plate border-2 border-paper-line bg-white p-4" data-testid="notes">
      <h2 id={`${id}-title`} className="text-lg">
        Notes for staff
      </h2>
      <p className="mt-1 text-sm text-ink-soft">Only staff read these. They are never sent or published.</p>
      {notes.length > 0 ? (
        <ol className="mt-2 space-y-2">
          {notes.map((n) => (
            <li key={n.id} className="border-l-4 border-harbour-line pl-3">
              <p className="text-sm text-ink-soft">
                {n.author?.name ?? "Former staff"}, {formatDateTime(n.createdAt, timeZone)}
              </p>
              <p className="whitespace-pre-wrap">{n.body}</p>
            </li>
          ))}
        </ol>
      ) : (
        <p className="mt-2 text-sm">No notes yet.</p>
      )}
      <form onSubmit={handleSubmit((v) => !add.isPending && add.mutate(v.body))} noValidate className="mt-3">
        <label htmlFor={`${id}-body`} className="block font-bold">
          Add a note
        </label>
        <textarea
          id={`${id}-body`}
          rows={3}
          aria-invalid={errors.body ? true : undefined}
          aria-describedby={errors.body ? `${id}-error` : undefined}
          className="mt-1 block w-full rounded-plate border-2 border-ink-soft bg-white px-3 py-2 text-base text-ink aria-[invalid=true]:border-ember"
          {...register("body")}
        />
        {errors.body?.message ? (
          <p id={`${id}-error`} className="mt-1 font-bold text-ember-deep">
            <span aria-hidden="true">! </span>
            {errors.body.message}
          </p>
        ) : null}
        <button
          type="submit"
          aria-disabled={add.isPending || undefined}
          className="mt-2 min-h-11 rounded-plate border-2 border-harbour bg-paper px-3 font-bold text-harbour-deep hover:bg-harbour-soft aria-disabled:opacity-60"
        >
          {add.isPending ? "Adding…" : "Add note"}
        </button>
      </form>
    </section>
  );
}
