"use client";

import { useRouter } from "next/navigation";
import { useId, useRef, useState } from "react";
import type { RoomImportResult } from "@/lib/rooms/import";

type Answer = (RoomImportResult & { fileName: string; dryRun: boolean }) | { error: string };

const ACTION_LABELS = { new: "Adds this room", update: "Changes this room", unchanged: "No change" } as const;

/**
 * Upload a rooms CSV: first a check that shows every row (and every problem), then,
 * when the whole file is good, one button that imports it all at once.
 */
export function RoomImport() {
  const id = useId();
  const router = useRouter();
  const input = useRef<HTMLInputElement>(null);
  const [file, setFile] = useState<File | null>(null);
  const [preview, setPreview] = useState<Answer | null>(null);
  const [saved, setSaved] = useState<Answer | null>(null);
  const [busy, setBusy] = useState<"checking" | "importing" | null>(null);

  async function send(dryRun: boolean): Promise<Answer> {
    const body = new FormData();
    body.set("file", file!);
    try {
      const response = await fetch(`/api/staff/rooms/import${dryRun ? "?dryRun=1" : ""}`, { method: "POST", body });
      return (await response.json().catch(() => ({ error: `The server answered ${response.status} with no details.` }))) as Answer;
    } catch {
      return { error: "The file could not be sent: the connection failed. Nothing was saved; try again." };
    }
  }

  async function check() {
    if (!file) return;
    setBusy("checking");
    setSaved(null);
    setPreview(await send(true));
    setBusy(null);
  }

  async function importAll() {
    setBusy("importing");
    const answer = await send(false);
    setBusy(null);
    setSaved(answer);
    if (!("error" in answer) && answer.saved) {
      setPreview(null);
      setFile(null);
      if (input.current) input.current.value = "";
      router.refresh();
    } else {
      setPreview(answer);
    }
  }

  const result = preview && !("error" in preview) ? preview : null;
  const changes = result ? result.counts.new + result.counts.update : 0;

  return (
    <div>
      <form
        onSubmit={(e) => {
          e.preventDefault();
          void check();
        }}
        className="flex flex-wrap items-end gap-3"
      >
        <div className="min-w-0 max-w-full">
          <label htmlFor={`${id}-file`} className="block font-bold">
            Rooms file (CSV)
          </label>
          <input
            ref={input}
            id={`${id}-file`}
            type="file"
            accept=".csv,text/csv"
            onChange={(e) => {
              setFile(e.target.files?.[0] ?? null);
              setPreview(null);
              setSaved(null);
            }}
            className="mt-1 block min-h-11 w-full max-w-sm text-base"
          />
        </div>
        <button type="submit" disabled={!file || busy !== null} className="min-h-11 rounded-plate border-2 border-harbour bg-paper px-4 font-bold text-harbour-deep hover:bg-harbour-soft disabled:opacity-60">
          {busy === "checking" ? "Checking…" : "Check the file"}
        </button>
      </form>

      <div role="status" aria-live="polite" className="mt-4" data-testid="room-import-status">
        {saved && !("error" in saved) && saved.saved ? (
          <p className="font-bold text-leaf">
            ✓ Imported {saved.fileName}: {saved.counts.new} rooms added, {saved.counts.update} changed, {saved.counts.unchanged} already up to date. The public
            Fresh air pages show the new figures.
          </p>
        ) : null}
        {preview && "error" in preview ? <p className="font-bold text-ember-deep">! {preview.error}</p> : null}
        {result && !result.ok ? (
          <p className="font-bold text-ember-deep">
            ! Nothing was imported. {result.fileErrors.length ? result.fileErrors.join(" ") : `${result.counts.withErrors} of ${result.counts.rows} rows need a change (listed below). Fix them in the file and check it again.`}
          </p>
        ) : null}
        {result && result.ok ? (
          <p className="font-bold">
            The file is good: {result.counts.rows} rows ({result.units === "metric" ? "metric units, converted to feet and cfm" : "feet and cfm"}) — {result.counts.new} new rooms,{" "}
            {result.counts.update} changed, {result.counts.unchanged} unchanged. Nothing is saved until you import it.
          </p>
        ) : null}
      </div>

      {result && result.ok && changes > 0 ? (
        <button type="button" onClick={() => void importAll()} disabled={busy !== null} className="mt-3 min-h-11 rounded-plate border-2 border-harbour bg-harbour px-4 font-bold text-paper hover:bg-harbour-deep disabled:opacity-60">
          {busy === "importing" ? "Importing…" : `Import ${changes} ${changes === 1 ? "room" : "rooms"}`}
        </button>
      ) : null}

      {result && result.rows.length > 0 ? (
        <div className="mt-4 overflow-x-auto rounded-plate border-2 border-paper-line bg-white" role="region" aria-labelledby={`${id}-caption`} tabIndex={0}>
          <table className="w-full border-collapse text-left text-sm">
            <caption id={`${id}-caption`} className="p-2 text-left font-bold">
              Preview of {result.fileName}
            </caption>
            <thead>
              <tr className="border-b-2 border-harbour">
                <th scope="col" className="p-2">Line</th>
                <th scope="col" className="p-2">School</th>
                <th scope="col" className="p-2">Room</th>
                <th scope="col" className="p-2">What happens</th>
              </tr>
            </thead>
            <tbody>
              {result.rows.map((row) => (
                <tr key={row.line} className={`border-b border-paper-line ${row.errors.length ? "bg-ember-soft" : ""}`}>
                  <td className="p-2">{row.line}</td>
                  <td className="p-2">{row.school ?? "—"}</td>
                  <td className="p-2 font-bold">{row.room ?? "—"}</td>
                  <td className="p-2">
                    {row.errors.length ? (
                      <ul>
                        {row.errors.map((e, i) => (
                          <li key={i} className="font-bold text-ember-deep">
                            ! {e.column ? <code>{e.column}</code> : "Row"}: {e.message}
                          </li>
                        ))}
                      </ul>
                    ) : row.action ? (
                      <span>{row.action === "unchanged" ? "" : "✓ "}{ACTION_LABELS[row.action]}</span>
                    ) : null}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      ) : null}
    </div>
  );
}
