"use client";

import { useQuery } from "@tanstack/react-query";
import Link from "next/link";
import { useState } from "react";
import { deskApi, deskKeys } from "./api";

/** Puts a reply snippet's Markdown into the answer where the cursor is. */
export function SnippetPicker({ onInsert, disabled }: { onInsert: (markdown: string, title: string) => void; disabled?: boolean }) {
  const snippets = useQuery({ queryKey: deskKeys.snippets, queryFn: deskApi.snippets, staleTime: 60_000 });
  const [chosen, setChosen] = useState("");
  const list = snippets.data?.snippets ?? [];
  const snippet = list.find((s) => String(s.id) === chosen);
  return (
    <div className="flex flex-wrap items-end gap-2">
      <div className="min-w-0 flex-1">
        <label htmlFor="snippet-choice" className="block text-sm font-bold">
          Reply snippet
        </label>
        <select
          id="snippet-choice"
          value={chosen}
          onChange={(e) => setChosen(e.target.value)}
          disabled={disabled || list.length === 0}
          aria-describedby="snippet-choice-hint"
          className="mt-1 block min-h-11 w-full rounded-plate border-2 border-ink-soft bg-white px-2 text-base text-ink"
        >
          <option value="">{snippets.isPending ? "Loading snippets…" : list.length === 0 ? "No snippets yet" : "Choose a snippet…"}</option>
          {list.map((s) => (
            <option key={s.id} value={s.id}>
              {s.title}
            </option>
          ))}
        </select>
      </div>
      <button
        type="button"
        disabled={disabled || !snippet}
        onClick={() => {
          if (!snippet) return;
          onInsert(snippet.bodyMarkdown, snippet.title);
          setChosen("");
        }}
        className="min-h-11 rounded-plate border-2 border-harbour bg-paper px-3 font-bold text-harbour-deep hover:bg-harbour-soft disabled:cursor-not-allowed disabled:opacity-60"
      >
        Insert snippet
      </button>
      <p id="snippet-choice-hint" className="w-full text-sm text-ink-soft">
        {snippets.isError ? "The snippets could not be loaded. " : "Goes in where the cursor is in the answer. "}
        <Link href="/staff/snippets">Add or change snippets</Link>
      </p>
    </div>
  );
}
