"use client";

import { useActionState } from "react";
import { updateAccountAction, type ActionResult } from "@/app/(staff)/staff/users/actions";
import { ROLES, type Role } from "@/db/types";
import { ROLE_LABELS } from "@/lib/auth/roles";

export interface AccountControlsProps {
  id: number;
  name: string;
  role: Role;
  disabled: boolean;
}

export function AccountControls({ id, name, role, disabled }: AccountControlsProps) {
  const [state, action, pending] = useActionState<ActionResult | null, FormData>(updateAccountAction, null);
  return (
    <div className="flex flex-wrap items-end gap-2">
      <form action={action} className="flex items-end gap-2">
        <input type="hidden" name="id" value={id} />
        <label className="text-sm">
          <span className="block font-bold">Role for {name}</span>
          <select name="role" defaultValue={role} className="min-h-11 rounded-plate border-2 border-ink-soft bg-white px-2">
            {ROLES.map((r) => (
              <option key={r} value={r}>
                {ROLE_LABELS[r]}
              </option>
            ))}
          </select>
        </label>
        <button type="submit" disabled={pending} className="min-h-11 rounded-plate border-2 border-harbour px-3 font-bold text-harbour-deep">
          Save role
        </button>
      </form>
      <form action={action}>
        <input type="hidden" name="id" value={id} />
        <input type="hidden" name="disabled" value={disabled ? "false" : "true"} />
        <button
          type="submit"
          disabled={pending}
          className={`min-h-11 rounded-plate border-2 px-3 font-bold ${disabled ? "border-harbour text-harbour-deep" : "border-ember text-ember-deep"}`}
        >
          {disabled ? `Turn on ${name}'s account` : `Turn off ${name}'s account`}
        </button>
      </form>
      <p role="status" aria-live="polite" className={state ? `w-full text-sm font-bold ${state.ok ? "text-leaf" : "text-ember-deep"}` : "sr-only"}>
        {state?.message}
      </p>
    </div>
  );
}
