import Link from "next/link";
import type { School } from "@/db/types";

const LEVEL_LABEL: Record<School["level"], string> = { elementary: "Elementary", middle: "Middle", high: "High" };

export function SchoolCard({ school }: { school: School }) {
  return (
    <li className="rounded-plate border-2 border-paper-line bg-white p-5">
      <h3 className="text-lg">
        <Link href={`/schools/${school.slug}`}>{school.name}</Link>
      </h3>
      <p className="text-ink-soft">
        {LEVEL_LABEL[school.level]} school · grades {school.grades}
      </p>
      <p className="text-sm text-ink-soft">{school.address}</p>
    </li>
  );
}
