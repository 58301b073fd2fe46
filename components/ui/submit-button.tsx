import type { ReactNode } from "react";

export interface SubmitButtonProps {
  /** While the form is being sent: the button is disabled and says so in words. */
  busy: boolean;
  busyLabel: string;
  children: ReactNode;
  /** Added to the classes, e.g. "w-full". */
  className?: string;
}

// The forms' own submit look, plainer than buttonClasses("primary") (no inline-flex or padding
// above and below); kept as the forms had it so nothing moves.
const CLASSES = "min-h-11 rounded-plate border-2 border-harbour bg-harbour px-4 font-bold text-paper hover:bg-harbour-deep disabled:opacity-60";

/** A form's main button: disabled while sending, so a second press cannot send twice. */
export function SubmitButton({ busy, busyLabel, children, className }: SubmitButtonProps) {
  return (
    <button type="submit" disabled={busy} className={className ? `${CLASSES} ${className}` : CLASSES}>
      {busy ? busyLabel : children}
    </button>
  );
}
