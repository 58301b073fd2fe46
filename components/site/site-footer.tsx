import Link from "next/link";
import { db } from "@/db/client";
import { districtName } from "@/lib/settings/district";

export async function SiteFooter() {
  const district = await districtName(db());
  return (
    <footer className="mt-section border-t-2 border-paper-line bg-paper-deep">
      <div className="mx-auto grid max-w-page gap-4 px-gutter py-8 text-sm sm:grid-cols-2">
        <div>
          <p className="font-bold">{district}</p>
          <p>
            Health questions about your own child: call your school nurse or your doctor. Public health decisions, such as
            quarantine, are made by the local health department.
          </p>
        </div>
        <div className="sm:text-right">
          <p>
            <Link href="/staff">Staff sign-in</Link>
          </p>
          <p className="text-ink-soft">Reopening information runs on Clearhall.</p>
        </div>
      </div>
    </footer>
  );
}
