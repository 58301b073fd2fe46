"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useEffect, useId, useRef, useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import type { z } from "zod";
import { Markdown } from "@/components/ui/markdown";
import type { SnippetView } from "@/lib/questions/desk-types";
import { snippetSchema } from "@/lib/validation/desk";
import { DeskApiError, deskApi, deskKeys } from "./api";
import { DeskMessagesProvider, useDeskMessages } from "./desk-messages";
import { formatDateTime, plural } from "./format";

type SnippetInput = z.input<typeof snippetSchema>;
type SnippetValues = z.output<typeof snippetSchema>;

const CONTROL = "mt-1 block w-full rounded-plate border-2 border-ink-soft bg-white px-3 py-2 text-base text-ink aria-[invalid=true]:border-ember";

export function SnippetManager({ timeZone }: { timeZone: string }) {
  return (
    <DeskMessagesProvider>
      <SnippetManagerBody timeZone={timeZone} />
    </DeskMessagesProvider>
  );
}

function SnippetManagerBody({ timeZone }: { timeZone: string }) {
  const snippets = useQuery({ queryKey: deskKeys.snippets, queryFn: deskApi.snippets });
  const [editing, setEditing] = useState<number | null>(null);
  const list = snippets.data?.snippets ?? [];
  const listHeading = useRef<HTMLHeadingElement>(null);
  return (
    <div className="grid gap-8 lg:grid-cols-[minmax(0,1fr)_24rem]">
      <section aria-labelledby="snippet-list-title" className="min-w-0">
        <h2 id="snippet-list-title" ref={listHeading} tabIndex={-1} className="text-xl focus:outline-none focus-visible:outline-3">
          Snippets {snippets.data ? `(${list.length})` : ""}
        </h2>
        {snippets.isPending ? <p role="status">Loading snippets…</p> : null}
        {snippets.isError ? (
          <p role="alert" className="mt-2 font-bold text-ember-deep">
            {snippets.error.message}
          </p>
        ) : null}
        {snippets.data && list.length === 0 ? <p className="mt-2">No snippets yet. Add the first one with the form.</p> : null}
        <ul className="mt-3 space-y-4" data-testid="snippet-list">
          {list.map((s) =>
            editing === s.id ? (
              <li key={s.id} className="rounded-plate border-2 border-harbour bg-white p-4">
                <SnippetForm
                  snippet={s}
                  onDone={() => setEditing(null)}
                  onCancel={() => setEditing(null)}
                />
              </li>
            ) : (
              <SnippetItem key={s.id} snippet={s} timeZone={timeZone} onEdit={() => setEditing(s.id)} onDeleted={() => listHeading.current?.focus()} />
            ),
          )}
        </ul>
      </section>
      <section aria-labelledby="snippet-new-title" className="rounded-plate border-2 border-paper-line bg-white p-4 lg:self-start">
        <h2 id="snippet-new-title" className="text-xl">
          Add a snippet
        </h2>
        <p className="mt-1 text-sm">A paragraph the team writes often, such as the nurse&apos;s hours or where the cleaning products are listed.</p>
        <SnippetForm />
      </section>
    </div>
  );
}

function SnippetItem({ snippet, timeZone, onEdit, onDeleted }: { snippet: SnippetView; timeZone: string; onEdit: () => void; onDeleted: () => void }) {
  const id = useId();
  const queryClient = useQueryClient();
  const messages = useDeskMessages();
  const [confirming, setConfirming] = useState(false);
  const confirmRef = useRef<HTMLDivElement>(null);
  const remove = useMutation({
    mutationFn: () => deskApi.deleteSnippet(snippet.id),
    onSuccess: () => {
      queryClient.setQueryData<{ snippets: SnippetView[] }>(deskKeys.snippets, (old) => (old ? { snippets: old.snippets.filter((s) => s.id !== snippet.id) } : old));
      void queryClient.invalidateQueries({ queryKey: deskKeys.snippets });
      messages.announce(`Snippet “${snippet.title}” removed.`);
      onDeleted();
    },
    onError: (error) => messages.alert(error.message),
  });
  useEffect(() => {
    if (confirming) confirmRef.current?.focus();
  }, [confirming]);
  return (
    <li className="rounded-plate border-2 border-paper-line bg-white p-4" data-testid="snippet" aria-labelledby={`${id}-title`}>
      <h3 id={`${id}-title`} className="text-lg">
        {snippet.title}
      </h3>
      <p className="text-sm text-ink-soft">
        Changed {formatDateTime(snippet.updatedAt, timeZone)}
        {snippet.updatedBy ? ` by ${snippet.updatedBy.name}` : ""}
      </p>
      <div className="mt-2 rounded-plate bg-paper-deep p-3">
        <Markdown source={snippet.bodyMarkdown} />
      </div>
      {confirming ? (
        <div ref={confirmRef} tabIndex={-1} role="group" aria-labelledby={`${id}-confirm`} className="mt-3 rounded-plate border-2 border-ember bg-ember-soft p-3 focus:outline-none focus-visible:outline-3">
          <p id={`${id}-confirm`} className="font-bold">
            Remove “{snippet.title}” for everyone? Answers that already use its words keep them.
          </p>
          <div className="mt-2 flex flex-wrap gap-3">
            <button
              type="button"
              disabled={remove.isPending}
              onClick={() => remove.mutate()}
              className="min-h-11 rounded-plate border-2 border-ember bg-ember px-3 font-bold text-paper hover:bg-ember-deep disabled:opacity-60"
            >
              {remove.isPending ? "Removing…" : "Yes, remove it"}
            </button>
            <button type="button" onClick={() => setConfirming(false)} className="min-h-11 rounded-plate border-2 border-harbour bg-paper px-3 font-bold text-harbour-deep hover:bg-harbour-soft">
              Keep it
            </button>
          </div>
        </div>
      ) : (
        <div className="mt-3 flex flex-wrap gap-3">
          <button type="button" onClick={onEdit} className="min-h-11 rounded-plate border-2 border-harbour bg-paper px-3 font-bold text-harbour-deep hover:bg-harbour-soft">
            Edit<span className="sr-only"> “{snippet.title}”</span>
          </button>
          <button type="button" onClick={() => setConfirming(true)} className="min-h-11 rounded-plate border-2 border-ember bg-paper px-3 font-bold text-ember-deep hover:bg-ember-soft">
            Remove<span className="sr-only"> “{snippet.title}”</span>
          </button>
        </div>
      )}
    </li>
  );
}

function SnippetForm({ snippet, onDone, onCancel }: { snippet?: SnippetView; onDone?: () => void; onCancel?: () => void }) {
  const id = useId();
  const queryClient = useQueryClient();
  const messages = useDeskMessages();
  const {
    register,
    handleSubmit,
    setError,
    setFocus,
    reset,
    control,
    formState: { errors },
  } = useForm<SnippetInput, unknown, SnippetValues>({
    resolver: zodResolver(snippetSchema),
    defaultValues: { title: snippet?.title ?? "", bodyMarkdown: snippet?.bodyMarkdown ?? "" },
  });
  const body = useWatch({ control, name: "bodyMarkdown" }) ?? "";
  useEffect(() => {
    if (snippet) setFocus("title");
  }, [snippet, setFocus]);
  const save = useMutation({
    mutationFn: (v: SnippetValues) => (snippet ? deskApi.updateSnippet(snippet.id, v.title, v.bodyMarkdown) : deskApi.createSnippet(v.title, v.bodyMarkdown)),
    onSuccess: (result) => {
      queryClient.setQueryData<{ snippets: SnippetView[] }>(deskKeys.snippets, (old) => {
        if (!old) return old;
        const others = old.snippets.filter((s) => s.id !== result.snippet.id);
        return { snippets: snippet ? old.snippets.map((s) => (s.id === result.snippet.id ? result.snippet : s)) : [...others, result.snippet] };
      });
      void queryClient.invalidateQueries({ queryKey: deskKeys.snippets });
      messages.announce(snippet ? `Snippet “${result.snippet.title}” saved.` : `Snippet “${result.snippet.title}” added.`);
      if (!snippet) reset({ title: "", bodyMarkdown: "" });
      onDone?.();
    },
    onError: (error) => {
      if (error instanceof DeskApiError && error.status === 400 && Object.keys(error.fields).length > 0) {
        for (const [name, message] of Object.entries(error.fields)) {
          if (name === "title" || name === "bodyMarkdown") setError(name, { type: "server", message }, { shouldFocus: true });
          else messages.alert(message);
        }
        return;
      }
      messages.alert(error.message);
    },
  });
  const field = (name: "title" | "bodyMarkdown") => errors[name]?.message;
  return (
    <form onSubmit={handleSubmit((v) => !save.isPending && save.mutate(v))} noValidate className="mt-3" aria-label={snippet ? `Edit snippet ${snippet.title}` : undefined}>
      <label htmlFor={`${id}-title`} className="block font-bold">
        Title
      </label>
      <p id={`${id}-title-hint`} className="text-sm text-ink-soft">
        What the team picks from the list, e.g. “Nurse&apos;s office hours”.
      </p>
      <input
        id={`${id}-title`}
        maxLength={120}
        aria-invalid={field("title") ? true : undefined}
        aria-describedby={[`${id}-title-hint`, field("title") ? `${id}-title-error` : null].filter(Boolean).join(" ")}
        className={`${CONTROL} min-h-11`}
        {...register("title")}
      />
      {field("title") ? (
        <p id={`${id}-title-error`} className="mt-1 font-bold text-ember-deep">
          <span aria-hidden="true">! </span>
          {field("title")}
        </p>
      ) : null}
      <label htmlFor={`${id}-body`} className="mt-3 block font-bold">
        Text (Markdown)
      </label>
      <textarea
        id={`${id}-body`}
        rows={6}
        aria-invalid={field("bodyMarkdown") ? true : undefined}
        aria-describedby={field("bodyMarkdown") ? `${id}-body-error` : `${id}-body-count`}
        className={`${CONTROL} font-mono`}
        {...register("bodyMarkdown")}
      />
      {field("bodyMarkdown") ? (
        <p id={`${id}-body-error`} className="mt-1 font-bold text-ember-deep">
          <span aria-hidden="true">! </span>
          {field("bodyMarkdown")}
        </p>
      ) : (
        <p id={`${id}-body-count`} className="mt-1 text-sm text-ink-soft">
          {plural(body.length, "character")} of 5,000.
        </p>
      )}
      {body.trim() ? (
        <div className="mt-2">
          <p className="text-sm font-bold">Preview</p>
          <div className="mt-1 rounded-plate border-2 border-dashed border-harbour-line p-3">
            <Markdown source={body} />
          </div>
        </div>
      ) : null}
      <div className="mt-3 flex flex-wrap gap-3">
        <button type="submit" aria-disabled={save.isPending || undefined} className="min-h-11 rounded-plate border-2 border-harbour bg-harbour px-4 font-bold text-paper hover:bg-harbour-deep aria-disabled:opacity-60">
          {save.isPending ? "Saving…" : snippet ? "Save snippet" : "Add snippet"}
        </button>
        {onCancel ? (
          <button type="button" onClick={onCancel} className="min-h-11 rounded-plate border-2 border-harbour bg-paper px-4 font-bold text-harbour-deep hover:bg-harbour-soft">
            Cancel
          </button>
        ) : null}
      </div>
    </form>
  );
}
