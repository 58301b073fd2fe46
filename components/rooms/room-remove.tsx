"use client";

import { useRouter } from "next/navigation";
import { useRef, useState } from "react";
import { plural } from "@/components/desk/format";
import { ConfirmBox } from "@/components/ui/confirm-box";

export interface RoomRemoveProps {
  id: number;
  name: string;
  school: string;
  /** What removing it takes away with it, so the question says so before anything happens. */
  readings: number;
  days: number;
}

/** Removes a room after a second, explicit step; then back to the rooms list, which says what went. */
export function RoomRemove({ id, name, school, readings, days }: RoomRemoveProps) {
  const router = useRouter();
  const [asking, setAsking] = useState(false);
  const [pending, setPending] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const opener = useRef<HTMLButtonElement>(null);

  async function remove() {
    setPending(true);
    setProblem(null);
    let response: Response;
    try {
      response = await fetch(`/api/staff/rooms/${id}`, { method: "DELETE" });
    } catch {
      setPending(false);
      setProblem("The room could not be removed: the connection failed. Nothing was changed; try again.");
      return;
    }
    if (response.ok) {
      router.push(`/staff/rooms?removed=${encodeURIComponent(`${name}, ${school}`)}`);
      return;
    }
    const answer = (await response.json().catch(() => ({}))) as { error?: string };
    setPending(false);
    setProblem(answer.error ?? `The room could not be removed (${response.status}). Nothing was changed.`);
  }

  const takes =
    readings > 0
      ? `its ${plural(readings, "CO2 reading")} over ${plural(days, "school day")} go with it`
      : "it has no CO2 readings";
  return (
    <div data-testid="room-remove">
      {asking ? (
        <ConfirmBox
          tone="danger"
          title={`Remove ${name}?`}
          confirmLabel="Remove the room"
          pendingLabel="Removing…"
          pending={pending}
          onConfirm={remove}
          onCancel={() => {
            setAsking(false);
            setProblem(null);
            requestAnimationFrame(() => opener.current?.focus());
          }}
        >
          <p className="mt-1 max-w-prose">
            {name} leaves the public Fresh air page of {school} at once, and {takes}. This cannot be undone. Export all rooms (CSV), on the
            rooms list, keeps a copy of the room&apos;s sizes and airflows first; the readings are not in that file.
          </p>
        </ConfirmBox>
      ) : (
        <button
          ref={opener}
          type="button"
          onClick={() => setAsking(true)}
          className="min-h-11 rounded-plate border-2 border-ember px-4 font-bold text-ember-deep hover:bg-ember-soft"
        >
          Remove this room…
        </button>
      )}
      <p role="alert" className={problem ? "mt-2 font-bold text-ember-deep" : "sr-only"}>
        {problem}
      </p>
    </div>
  );
}
