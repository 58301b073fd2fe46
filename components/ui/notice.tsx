import type { ReactNode } from "react";

export type NoticeTone = "info" | "success" | "warning";

const TONES: Record<NoticeTone, { box: string; mark: string; label: string }> = {
  info: { box: "border-harbour bg-harbour-soft", mark: "i", label: "Note" },
  success: { box: "border-leaf bg-leaf-soft", mark: "✓", label: "Done" },
  warning: { box: "border-ember bg-ember-soft", mark: "!", label: "Attention" },
};

/** A boxed message; the tone is spelled out in words too, never by colour alone. */
export function Notice({ tone = "info", title, children }: { tone?: NoticeTone; title?: string; children?: ReactNode }) {
  const t = TONES[tone];
  return (
    <div className={`my-4 rounded-plate border-l-8 p-4 ${t.box}`}>
      <p className="font-bold">
        <span aria-hidden="true" className="mr-2 inline-block w-5 text-center">
          {t.mark}
        </span>
        <span className="sr-only">{t.label}: </span>
        {title}
      </p>
      {children ? <div className="mt-1">{children}</div> : null}
    </div>
  );
}
