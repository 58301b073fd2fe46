"use client";

import Link from "next/link";
import { usePathname } from "next/navigation";

export function StaffNav({ items }: { items: { href: string; label: string }[] }) {
  const pathname = usePathname();
  return (
    <nav aria-label="Staff">
      <ul className="flex flex-wrap gap-x-1 gap-y-1">
        {items.map((item) => {
          const current = item.href === "/staff" ? pathname === "/staff" : pathname.startsWith(item.href);
          return (
            <li key={item.href}>
              <Link
                href={item.href}
                aria-current={current ? "page" : undefined}
                className={`inline-block rounded-plate px-3 py-2 font-bold no-underline ${
                  current ? "bg-paper text-harbour-deep" : "text-paper hover:underline"
                }`}
              >
                {item.label}
              </Link>
            </li>
          );
        })}
      </ul>
    </nav>
  );
}
