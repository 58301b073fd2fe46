"use client";

import { useEffect, useId, useRef, type ReactNode } from "react";

const TONES = {
  danger: {
    box: "border-ember bg-ember-soft",
    title: "text-ember-deep",
    confirm: "border-ember bg-ember hover:bg-ember-deep",
  },
  plain: {
    box: "border-harbour bg-harbour-soft",
    title: "",
    confirm: "border-harbour bg-harbour hover:bg-harbour-deep",
  },
} as const;

export interface ConfirmBoxProps {
  title: ReactNode;
  children: ReactNode;
  confirmLabel: string;
  pendingLabel: string;
  pending: boolean;
  onConfirm: () => void;
  onCancel: () => void;
  /** "danger" for a step that e-mails someone, closes a question for good or removes data. */
  tone?: keyof typeof TONES;
}

/**
 * The second step of a step that cannot be undone: shown in place, it takes the focus when it
 * opens, so a keyboard or screen-reader user lands on the question it asks.
 */
export function ConfirmBox({ title, children, confirmLabel, pendingLabel, pending, onConfirm, onCancel, tone = "plain" }: ConfirmBoxProps) {
  const id = useId();
  const ref = useRef<HTMLDivElement>(null);
  useEffect(() => ref.current?.focus(), []);
  const t = TONES[tone];
  return (
    <div
      ref={ref}
      tabIndex={-1}
      role="group"
      aria-labelledby={`${id}-title`}
      className={`mt-3 rounded-plate border-2 p-3 focus:outline-none focus-visible:outline-3 ${t.box}`}
    >
      <h3 id={`${id}-title`} className={`text-base ${t.title}`}>
        {title}
      </h3>
      {children}
      <div className="mt-2 flex flex-wrap gap-3">
        <button type="button" disabled={pending} onClick={onConfirm} className={`min-h-11 rounded-plate border-2 px-4 font-bold text-paper disabled:opacity-60 ${t.confirm}`}>
          {pending ? pendingLabel : confirmLabel}
        </button>
        <button
          type="button"
          disabled={pending}
          onClick={onCancel}
          className="min-h-11 rounded-plate border-2 border-harbour bg-paper px-4 font-bold text-harbour-deep hover:bg-harbour-soft"
        >
          Cancel
        </button>
      </div>
    </div>
  );
}
