import Link from "next/link";
import { db } from "@/db/client";
import { requireStaffPage } from "@/lib/auth/guard";
import { ROLE_DESCRIPTIONS, ROLE_LABELS } from "@/lib/auth/roles";
import { STAFF_PAGE_ROLES, staffNavFor } from "@/lib/auth/staff-nav";
import { countQuestionsByState } from "@/lib/questions/repository";
import { STATE_LABELS } from "@/lib/questions/labels";

export const metadata = { title: "Overview" };

export default async function StaffOverviewPage() {
  const user = await requireStaffPage(STAFF_PAGE_ROLES.overview, "/staff");
  const counts = await countQuestionsByState(db());
  const waiting = ["received", "drafting", "facilities_check", "changes_requested", "approved"] as const;
  return (
    <>
      <h1 className="text-2xl">Good to see you, {user.name.split(" ")[0]}</h1>
      <p className="mt-2 max-w-prose">
        You are signed in as <strong>{ROLE_LABELS[user.role]}</strong>. {ROLE_DESCRIPTIONS[user.role]}
      </p>
      <section aria-labelledby="waiting" className="mt-6">
        <h2 id="waiting" className="text-xl">
          Families&apos; questions
        </h2>
        <ul className="mt-3 grid gap-3 sm:grid-cols-3 lg:grid-cols-5">
          {waiting.map((state) => (
            <li key={state} className="rounded-plate border-2 border-paper-line bg-white p-3">
              <span className="block text-2xl font-bold text-harbour-deep">{counts[state] ?? 0}</span>
              <span>{STATE_LABELS[state]}</span>
            </li>
          ))}
        </ul>
      </section>
      <section aria-labelledby="your-pages" className="mt-6">
        <h2 id="your-pages" className="text-xl">
          Your pages
        </h2>
        <ul className="mt-2 list-disc pl-6">
          {staffNavFor(user.role)
            .filter((i) => i.href !== "/staff")
            .map((i) => (
              <li key={i.href}>
                <Link href={i.href}>{i.label}</Link>
              </li>
            ))}
        </ul>
      </section>
    </>
  );
}
