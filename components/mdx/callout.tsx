import type { ReactNode } from "react";

export function Callout({ title, children }: { title?: string; children?: ReactNode }) {
  return (
    <aside className="my-6 rounded-plate border-l-8 border-harbour bg-harbour-soft p-5 print:border print:bg-white">
      {title ? <p className="mb-1 text-lg font-bold text-harbour-deep">{title}</p> : null}
      <div className="[&>p:last-child]:mb-0">{children}</div>
    </aside>
  );
}
