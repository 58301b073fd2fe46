import type { Metadata } from "next";
import Link from "next/link";
import { Notice } from "@/components/ui/notice";
import { db } from "@/db/client";
import { env } from "@/lib/env";
import { isQuestionReference } from "@/lib/questions/reference";
import { replyTargetSchoolDays } from "@/lib/settings/district";

export const metadata: Metadata = { title: "Question sent", robots: { index: false, follow: false } };

type Props = { searchParams: Promise<Record<string, string | string[] | undefined>> };

export default async function AskSentPage({ searchParams }: Props) {
  const { ref } = await searchParams;
  const reference = typeof ref === "string" && isQuestionReference(ref) ? ref : null;
  const target = await replyTargetSchoolDays(db());
  const days = target === 1 ? "1 school day" : `${target} school days`;
  const from = env().MAIL_FROM;
  const sender = /<([^>]+)>/.exec(from)?.[1] ?? from;
  return (
    <div className="max-w-prose">
      <h1 className="text-3xl">Thank you, your question has reached us</h1>
      <Notice tone="success" title={reference ? `Your reference is ${reference}` : "We have your question"}>
        {reference ? "Please quote it if you contact us about this question." : null}
      </Notice>
      <h2 className="mt-8 text-2xl">What happens next</h2>
      <ol className="mt-3 list-decimal space-y-2 pl-6">
        <li>
          In a few minutes we send you an e-mail with a copy of your question and a <strong>private link</strong> where you can
          see how it is going.
        </li>
        <li>A staff member who knows the topic writes the answer. Answers about air, building work or cleaning are checked by our facilities team first.</li>
        <li>We e-mail you the answer within {days}. Weekends and district holidays do not count.</li>
      </ol>
      <h2 className="mt-8 text-2xl">No e-mail from us?</h2>
      <p className="mt-2">
        Please look in your spam or junk folder, and add <strong>{sender}</strong> to your contacts. If nothing has
        arrived within an hour, the address may have had a typing mistake: you are welcome to ask again.
      </p>
      <p className="mt-8 flex flex-wrap gap-x-6 gap-y-2">
        <Link href="/ask">Ask another question</Link>
        <Link href="/">Back to the reopening home page</Link>
      </p>
    </div>
  );
}
