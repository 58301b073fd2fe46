import Link from "next/link";

/** A way out of every page: ask what it did not answer, with school and topic filled in. */
export function AskAboutThis({ school = "district", topic = "other" }: { school?: string; topic?: string }) {
  const href = `/ask?${new URLSearchParams({ school, topic }).toString()}`;
  return (
    <aside className="my-8 rounded-plate border-2 border-harbour-line bg-paper-deep p-5 no-print">
      <p className="text-lg font-bold text-harbour-deep">Still have a question about this?</p>
      <p className="mt-1">
        Our staff read every question and reply by e-mail, usually within three school days.{" "}
        <Link href={href} className="font-bold">
          Ask us about this page
        </Link>
      </p>
    </aside>
  );
}
