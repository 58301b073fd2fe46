import Link from "next/link";
import { db } from "@/db/client";
import { listSchools } from "@/lib/schools/repository";
import { districtName } from "@/lib/settings/district";
import { PUBLIC_NAV } from "./public-nav";
import { SchoolPicker } from "./school-picker";

export async function SiteHeader({ currentSchool }: { currentSchool?: string }) {
  const [schools, district] = await Promise.all([listSchools(db()), districtName(db())]);
  return (
    <header className="border-b-4 border-harbour bg-paper-deep no-print">
      <div className="mx-auto flex max-w-page flex-wrap items-end justify-between gap-4 px-gutter py-4">
        <div>
          <Link href="/" className="text-xl font-bold text-harbour-deep no-underline hover:underline">
            {district}
          </Link>
          <p className="text-sm text-ink-soft">Reopening our school buildings</p>
        </div>
        <SchoolPicker schools={schools} current={currentSchool} />
      </div>
      <nav aria-label="Main" className="bg-harbour">
        <ul className="mx-auto flex max-w-page flex-wrap gap-x-6 gap-y-1 px-gutter py-2">
          {PUBLIC_NAV.map((item) => (
            <li key={item.href}>
              <Link href={item.href} className="inline-block py-2 font-bold text-paper">
                {item.label}
              </Link>
            </li>
          ))}
        </ul>
      </nav>
    </header>
  );
}
