import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import type { ReactNode } from "react";
import { SignOutButton } from "@/components/auth/sign-out-button";
import { StaffNav } from "@/components/staff/staff-nav";
import { currentStaff } from "@/lib/auth/guard";
import { ROLE_LABELS } from "@/lib/auth/roles";
import { staffNavFor } from "@/lib/auth/staff-nav";

export const metadata: Metadata = { title: { default: "Staff", template: "%s — Staff" }, robots: { index: false, follow: false } };

export default async function StaffLayout({ children }: { children: ReactNode }) {
  // Each page checks its own roles too: layouts and pages render independently.
  const user = await currentStaff();
  if (!user) redirect("/signin?callbackUrl=%2Fstaff");
  const items = staffNavFor(user.role).map(({ href, label }) => ({ href, label }));
  return (
    <>
      <header className="bg-harbour text-paper">
        <div className="mx-auto flex max-w-page flex-wrap items-center justify-between gap-3 px-gutter py-3">
          <div>
            <Link href="/staff" className="text-lg font-bold text-paper no-underline">
              Question desk
            </Link>
            <p className="text-sm">
              {user.name} · <span data-testid="staff-role">{ROLE_LABELS[user.role]}</span>
            </p>
          </div>
          <div className="flex items-center gap-3">
            <Link href="/" className="text-paper">
              Public site
            </Link>
            <SignOutButton />
          </div>
        </div>
        <div className="mx-auto max-w-page px-gutter pb-2">
          <StaffNav items={items} />
        </div>
      </header>
      <main id="main" tabIndex={-1} className="mx-auto w-full max-w-page flex-1 px-gutter py-6 focus:outline-none">
        {children}
      </main>
    </>
  );
}
