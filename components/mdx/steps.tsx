import type { ReactNode } from "react";

export function Steps({ children }: { children?: ReactNode }) {
  return <ol className="my-6 list-none space-y-4 pl-0 [counter-reset:step]">{children}</ol>;
}

export function Step({ title, children }: { title?: string; children?: ReactNode }) {
  return (
    <li className="relative rounded-plate border-2 border-paper-line bg-white py-4 pr-4 pl-16 [counter-increment:step] before:absolute before:top-4 before:left-4 before:flex before:h-8 before:w-8 before:items-center before:justify-center before:rounded-full before:bg-harbour before:font-bold before:text-paper before:content-[counter(step)]">
      {title ? <p className="mb-1 font-bold text-harbour-deep">{title}</p> : null}
      <div className="[&>p:last-child]:mb-0">{children}</div>
    </li>
  );
}
