import { notFound } from "next/navigation";
import { QuestionDesk } from "@/components/desk/question-desk";
import { QueryProvider } from "@/components/staff/query-provider";
import { db } from "@/db/client";
import { requireStaffPage } from "@/lib/auth/guard";
import { STAFF_PAGE_ROLES } from "@/lib/auth/staff-nav";
import { listSchools } from "@/lib/schools/repository";
import { districtTimeZone } from "@/lib/settings/district";

type Params = { params: Promise<{ id: string }> };

export const metadata = { title: "Question" };

export default async function QuestionPage({ params }: Params) {
  const raw = (await params).id;
  const user = await requireStaffPage(STAFF_PAGE_ROLES.question, `/staff/desk/${encodeURIComponent(raw)}`);
  if (!/^[1-9]\d{0,9}$/.test(raw)) notFound();
  const [schools, timeZone] = await Promise.all([listSchools(db()), districtTimeZone(db())]);
  const checker = user.role === "facilities";
  return (
    <QueryProvider>
      <QuestionDesk
        questionId={Number(raw)}
        me={{ id: user.id, name: user.name }}
        schools={schools.map((s) => ({ id: s.id, slug: s.slug, name: s.name }))}
        timeZone={timeZone}
        backHref={checker ? "/staff/check" : "/staff/desk"}
        backLabel={checker ? "All answers waiting for a check" : "All questions"}
      />
    </QueryProvider>
  );
}
