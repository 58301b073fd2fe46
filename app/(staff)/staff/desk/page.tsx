import { Suspense } from "react";
import { QuestionQueue } from "@/components/desk/question-queue";
import { QueryProvider } from "@/components/staff/query-provider";
import { db } from "@/db/client";
import { requireStaffPage } from "@/lib/auth/guard";
import { STAFF_PAGE_ROLES } from "@/lib/auth/staff-nav";
import { listSchools } from "@/lib/schools/repository";
import { districtTimeZone } from "@/lib/settings/district";

export const metadata = { title: "Questions" };

export default async function DeskPage() {
  await requireStaffPage(STAFF_PAGE_ROLES.desk, "/staff/desk");
  const [schools, timeZone] = await Promise.all([listSchools(db()), districtTimeZone(db())]);
  return (
    <>
      <h1 className="text-2xl">Families&apos; questions</h1>
      <p className="mt-2 max-w-prose text-ink-soft">
        The questions still waiting come first, the most urgent at the top. Open one to write the answer. Technical questions (air, building work,
        cleaning, or marked by you) go to facilities for a check before the reply is sent.
      </p>
      <div className="mt-4">
        <QueryProvider>
          <Suspense fallback={<p role="status">Loading questions…</p>}>
            <QuestionQueue schools={schools.map((s) => ({ slug: s.slug, name: s.name }))} timeZone={timeZone} />
          </Suspense>
        </QueryProvider>
      </div>
    </>
  );
}
