"use client";

import { useState, type FormEvent } from "react";
import { buttonClasses } from "@/components/ui/button";
import type { Vote, VoteCounts } from "@/lib/answers/votes";

export interface HelpfulVoteProps {
  answerId: number;
  counts: VoteCounts;
  /** This browser's vote, if it has voted. */
  vote: Vote | null;
}

function countLine({ helpful, notHelpful }: VoteCounts): string {
  const total = helpful + notHelpful;
  if (total === 0) return "No one has voted yet.";
  const people = total === 1 ? "person" : "people";
  return `${helpful.toLocaleString("en-US")} of ${total.toLocaleString("en-US")} ${people} who voted found this helpful.`;
}

/**
 * "Was this helpful?" A form that posts to /api/answers/<id>/helpful and comes back here
 * without JavaScript; with it, the vote is sent in the background and the count updates.
 */
export function HelpfulVote({ answerId, counts: initialCounts, vote: initialVote }: HelpfulVoteProps) {
  const [counts, setCounts] = useState(initialCounts);
  const [vote, setVote] = useState(initialVote);
  const [message, setMessage] = useState("");
  const [pending, setPending] = useState(false);
  const action = `/api/answers/${answerId}/helpful`;

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    const submitter = (event.nativeEvent as SubmitEvent).submitter as HTMLButtonElement | null;
    const chosen = submitter?.value === "yes" || submitter?.value === "no" ? submitter.value : null;
    if (!chosen) return;
    event.preventDefault();
    setPending(true);
    try {
      const response = await fetch(action, {
        method: "POST",
        headers: { "content-type": "application/json" },
        body: JSON.stringify({ vote: chosen }),
      });
      if (!response.ok) {
        setMessage(response.status === 404 ? "This answer has been taken down, so your vote was not counted." : "Your vote could not be counted. Please try again.");
        return;
      }
      const body = (await response.json()) as VoteCounts & { vote: Vote };
      setCounts({ helpful: body.helpful, notHelpful: body.notHelpful });
      setVote(body.vote);
      setMessage("Thank you. Your answer is counted.");
    } catch {
      setMessage("Your vote could not be sent. Check your connection and try again.");
    } finally {
      setPending(false);
    }
  }

  return (
    <section aria-labelledby="helpful" className="my-8 rounded-plate border-2 border-paper-line bg-white p-5">
      <h2 id="helpful" className="scroll-mt-4 text-xl">
        Was this answer helpful?
      </h2>
      {vote ? (
        <p className="mt-1" data-testid="your-vote">
          You said this answer {vote === "yes" ? "helped" : "did not help"}. You can change your answer.
        </p>
      ) : null}
      <form method="post" action={action} onSubmit={onSubmit} className="mt-3 flex flex-wrap gap-3">
        <button type="submit" name="vote" value="yes" aria-pressed={vote === "yes"} disabled={pending} className={buttonClasses(vote === "yes" ? "primary" : "secondary")}>
          Yes, it helped
        </button>
        <button type="submit" name="vote" value="no" aria-pressed={vote === "no"} disabled={pending} className={buttonClasses(vote === "no" ? "primary" : "secondary")}>
          No
        </button>
      </form>
      <p className="mt-3" data-testid="helpful-count">
        {countLine(counts)}
      </p>
      <p className="mt-1 font-bold" role="status" aria-live="polite">
        {message}
      </p>
      <p className="mt-2 text-sm text-ink-soft">
        Each browser counts once: a cookie holds a random number, and we keep only a scrambled form of it. It does not tell us who you are.
      </p>
    </section>
  );
}
