"use client";

import { useRouter } from "next/navigation";
import { useId, useRef, useState } from "react";
import type { Co2ImportResult } from "@/lib/co2/import";

type Answer = (Co2ImportResult & { fileName: string }) | { error: string };

const count = (n: number) => n.toLocaleString("en-US");

export function Co2Upload() {
  const id = useId();
  const router = useRouter();
  const input = useRef<HTMLInputElement>(null);
  const [file, setFile] = useState<File | null>(null);
  const [answer, setAnswer] = useState<Answer | null>(null);
  const [busy, setBusy] = useState(false);

  async function upload() {
    if (!file) return;
    setBusy(true);
    setAnswer(null);
    const body = new FormData();
    body.set("file", file);
    let next: Answer;
    try {
      const response = await fetch("/api/staff/co2/import", { method: "POST", body });
      next = (await response.json().catch(() => ({ error: `The server answered ${response.status} with no details.` }))) as Answer;
    } catch {
      next = { error: "The file could not be sent: the connection failed. Nothing was saved; try again." };
    }
    setBusy(false);
    setAnswer(next);
    if (!("error" in next) && next.saved) {
      setFile(null);
      if (input.current) input.current.value = "";
      router.refresh();
    }
  }

  return (
    <div>
      <form
        onSubmit={(e) => {
          e.preventDefault();
          void upload();
        }}
        className="flex flex-wrap items-end gap-3"
      >
        <div className="min-w-0 max-w-full">
          <label htmlFor={`${id}-file`} className="block font-bold">
            Sensor log (CSV)
          </label>
          <input
            ref={input}
            id={`${id}-file`}
            type="file"
            accept=".csv,text/csv"
            onChange={(e) => {
              setFile(e.target.files?.[0] ?? null);
              setAnswer(null);
            }}
            className="mt-1 block min-h-11 w-full max-w-sm text-base"
          />
        </div>
        <button type="submit" disabled={!file || busy} className="min-h-11 rounded-plate border-2 border-harbour bg-harbour px-4 font-bold text-paper hover:bg-harbour-deep disabled:opacity-60">
          {busy ? "Uploading and checking…" : "Upload readings"}
        </button>
      </form>
      <div role="status" aria-live="polite" className="mt-4" data-testid="co2-upload-status">
        {answer && "error" in answer ? <p className="font-bold text-ember-deep">! {answer.error}</p> : null}
        {answer && !("error" in answer) && answer.saved ? (
          <p className="font-bold text-leaf">
            ✓ {answer.fileName}: {count(answer.rowsRead)} readings read, {count(answer.rowsAdded)} added, {count(answer.duplicates)} already stored and ignored.
            Daily figures updated for {count(answer.roomDays)} room-days.
          </p>
        ) : null}
        {answer && !("error" in answer) && !answer.ok ? (
          <div>
            <p className="font-bold text-ember-deep">! Nothing was saved. {answer.fileErrors.join(" ")}</p>
            {answer.errors.length ? (
              <ul className="mt-2 list-disc pl-6 text-sm">
                {answer.errors.map((e, i) => (
                  <li key={i}>
                    Line {e.line}
                    {e.column ? (
                      <>
                        , <code>{e.column}</code>
                      </>
                    ) : null}
                    : {e.message}
                  </li>
                ))}
                {answer.moreErrors ? <li>…and {count(answer.moreErrors)} more rows with problems.</li> : null}
              </ul>
            ) : null}
          </div>
        ) : null}
      </div>
    </div>
  );
}
