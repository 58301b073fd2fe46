import { SnippetManager } from "@/components/desk/snippet-manager";
import { QueryProvider } from "@/components/staff/query-provider";
import { db } from "@/db/client";
import { requireStaffPage } from "@/lib/auth/guard";
import { STAFF_PAGE_ROLES } from "@/lib/auth/staff-nav";
import { districtTimeZone } from "@/lib/settings/district";

export const metadata = { title: "Reply snippets" };

export default async function SnippetsPage() {
  await requireStaffPage(STAFF_PAGE_ROLES.snippets, "/staff/snippets");
  const timeZone = await districtTimeZone(db());
  return (
    <>
      <h1 className="text-2xl">Reply snippets</h1>
      <p className="mt-2 mb-6 max-w-prose text-ink-soft">
        Paragraphs the whole team can put into an answer with “Insert snippet”. Changing a snippet here does not change answers already written.
      </p>
      <QueryProvider>
        <SnippetManager timeZone={timeZone} />
      </QueryProvider>
    </>
  );
}
