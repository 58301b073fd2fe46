import type { Metadata } from "next";
import { AskForm } from "@/components/ask/ask-form";
import { Breadcrumbs } from "@/components/site/breadcrumbs";
import { Notice } from "@/components/ui/notice";
import { db } from "@/db/client";
import { isQuestionTopic } from "@/lib/questions/state-machine";
import { listSchools } from "@/lib/schools/repository";
import { replyTargetSchoolDays } from "@/lib/settings/district";
import { DISTRICT_WIDE } from "@/lib/validation/question";

export const metadata: Metadata = {
  title: "Ask a question",
  description: "Ask the district about cleaning, fresh air, building work, signs, classrooms or reported cases. We reply by e-mail.",
};

type Props = { searchParams: Promise<Record<string, string | string[] | undefined>> };

function one(value: string | string[] | undefined): string | undefined {
  return typeof value === "string" ? value : undefined;
}

export default async function AskPage({ searchParams }: Props) {
  const params = await searchParams;
  const [schools, target] = await Promise.all([listSchools(db()), replyTargetSchoolDays(db())]);
  // Pre-filled only from values the form offers; anything else is ignored, not echoed.
  const school = one(params.school);
  const topic = one(params.topic);
  const initialSchool = school === DISTRICT_WIDE || schools.some((s) => s.slug === school) ? school : undefined;
  const initialTopic = topic && isQuestionTopic(topic) ? topic : undefined;
  const days = target === 1 ? "1 school day" : `${target} school days`;

  return (
    <>
      <Breadcrumbs items={[{ href: "/", label: "Home" }, { label: "Ask a question" }]} />
      <div className="grid gap-x-12 gap-y-8 lg:grid-cols-[minmax(0,42rem)_minmax(0,1fr)]">
        <div>
          <h1 className="text-3xl">Ask us a question</h1>
          <p className="mt-3 text-lg">
            Ask about cleaning, fresh air, building work, signs and routes, classrooms, or what happens when a case is reported.
            Staff who know the topic read every question, and we reply by e-mail within {days}.
          </p>
          <Notice tone="warning" title="Is a child sick now, or is it an emergency?">
            Please do not wait for our reply. Call the school nurse through your school&apos;s front office, or your doctor. In an
            emergency, call 911.
          </Notice>
          <div className="mt-8">
            <AskForm schools={schools.map((s) => ({ slug: s.slug, name: s.name }))} initialSchool={initialSchool} initialTopic={initialTopic} />
          </div>
        </div>
        <aside aria-labelledby="ask-next" className="self-start rounded-plate border-2 border-paper-line bg-white p-5 lg:mt-16">
          <h2 id="ask-next" className="text-xl">
            What happens next
          </h2>
          <ol className="mt-3 list-decimal space-y-2 pl-6">
            <li>We send you an e-mail with your question&apos;s reference and a private link to follow it.</li>
            <li>A staff member who knows the topic writes the answer.</li>
            <li>Answers about air, building work or cleaning are checked by our facilities team first.</li>
            <li>We e-mail you the answer within {days}. Weekends and district holidays do not count.</li>
          </ol>
          <h2 className="mt-6 text-xl">Your details</h2>
          <p className="mt-2">
            Only district staff who help answer your question see your e-mail address and name. We never show them on the website.
            If we publish the answer for other families, we rewrite the question without any personal details.
          </p>
        </aside>
      </div>
    </>
  );
}
