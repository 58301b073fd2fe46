"use client";

import { useActionState } from "react";
import { updateProjectAction, type ProjectActionResult } from "@/app/(staff)/staff/projects/actions";
import { PROJECT_STATUSES, type ProjectStatus } from "@/db/types";

const LABELS: Record<ProjectStatus, string> = { planned: "Planned", under_way: "Under way", finished: "Finished" };

export function ProjectStatusForm({ id, title, status, statusDate }: { id: number; title: string; status: ProjectStatus; statusDate: string }) {
  const [state, action, pending] = useActionState<ProjectActionResult | null, FormData>(updateProjectAction, null);
  return (
    <form action={action} className="flex flex-wrap items-end gap-3">
      <input type="hidden" name="id" value={id} />
      <label className="text-sm">
        <span className="block font-bold">Status of {title}</span>
        <select name="status" defaultValue={status} className="min-h-11 rounded-plate border-2 border-ink-soft bg-white px-2">
          {PROJECT_STATUSES.map((s) => (
            <option key={s} value={s}>
              {LABELS[s]}
            </option>
          ))}
        </select>
      </label>
      <label className="text-sm">
        <span className="block font-bold">Date (finished, or expected)</span>
        <input type="date" name="statusDate" defaultValue={statusDate} required className="min-h-11 rounded-plate border-2 border-ink-soft bg-white px-2" />
      </label>
      <button type="submit" disabled={pending} className="min-h-11 rounded-plate border-2 border-harbour bg-harbour px-3 font-bold text-paper">
        Save
      </button>
      <p role="status" aria-live="polite" className={state ? `w-full text-sm font-bold ${state.ok ? "text-leaf" : "text-ember-deep"}` : "sr-only"}>
        {state?.message}
      </p>
    </form>
  );
}
