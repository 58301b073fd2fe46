import Link from "next/link";
import { db } from "@/db/client";
import { replyTargetSchoolDays } from "@/lib/settings/district";

/** A way out of every page: ask what it did not answer, with school and topic filled in. */
export async function AskAboutThis({ school = "district", topic = "other" }: { school?: string; topic?: string }) {
  const days = await replyTargetSchoolDays(db());
  const href = `/ask?${new URLSearchParams({ school, topic }).toString()}`;
  return (
    <aside className="my-8 rounded-plate border-2 border-harbour-line bg-paper-deep p-5 no-print">
      <p className="text-lg font-bold text-harbour-deep">Still have a question about this?</p>
      <p className="mt-1">
        Our staff read every question and reply by e-mail, usually within {days} school {days === 1 ? "day" : "days"}.{" "}
        <Link href={href} className="font-bold">
          Ask us about this page
        </Link>
      </p>
    </aside>
  );
}
