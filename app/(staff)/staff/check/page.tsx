import { CheckList } from "@/components/desk/check-list";
import { QueryProvider } from "@/components/staff/query-provider";
import { db } from "@/db/client";
import { requireStaffPage } from "@/lib/auth/guard";
import { STAFF_PAGE_ROLES } from "@/lib/auth/staff-nav";
import { districtTimeZone } from "@/lib/settings/district";

export const metadata = { title: "Facilities check" };

export default async function CheckPage() {
  await requireStaffPage(STAFF_PAGE_ROLES.check, "/staff/check");
  const timeZone = await districtTimeZone(db());
  return (
    <>
      <h1 className="text-2xl">Answers waiting for your check</h1>
      <p className="mt-2 max-w-prose text-ink-soft">
        Answers about air, equipment, chemicals and building work go out only after facilities approve them. Open one, read the draft as a family
        would, then approve it or send it back with a comment.
      </p>
      <div className="mt-4">
        <QueryProvider>
          <CheckList timeZone={timeZone} />
        </QueryProvider>
      </div>
    </>
  );
}
