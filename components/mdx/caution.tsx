import type { ReactNode } from "react";

/** Safety caution: the warm signal colour, a drawn mark and the word "Caution", never colour alone. */
export function Caution({ title, children }: { title?: string; children?: ReactNode }) {
  return (
    <aside className="my-6 rounded-plate border-2 border-ember bg-ember-soft p-5 print:bg-white" aria-label={title ? `Caution: ${title}` : "Caution"}>
      <p className="mb-1 flex items-center gap-2 text-lg font-bold text-ember-deep">
        <svg aria-hidden="true" viewBox="0 0 24 24" className="h-6 w-6 shrink-0" fill="none" stroke="currentColor" strokeWidth="2.2" strokeLinejoin="round">
          <path d="M12 3 2.5 20h19L12 3Z" />
          <path d="M12 10v4.5M12 17.2v.3" strokeLinecap="round" />
        </svg>
        <span>Caution{title ? `: ${title}` : ""}</span>
      </p>
      <div className="[&>p:last-child]:mb-0">{children}</div>
    </aside>
  );
}
