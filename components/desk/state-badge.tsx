import { STATE_LABELS } from "@/lib/questions/labels";
import type { QuestionState } from "@/lib/questions/state-machine";

// The label is always written out; the border only repeats it for a quick scan.
const STYLE: Record<QuestionState, string> = {
  received: "border-harbour bg-harbour-soft text-harbour-deep",
  drafting: "border-harbour-line bg-white text-harbour-deep",
  facilities_check: "border-harbour-line bg-white text-harbour-deep",
  changes_requested: "border-ember bg-ember-soft text-ember-deep",
  approved: "border-leaf bg-leaf-soft text-ink",
  answered: "border-leaf bg-leaf-soft text-ink",
  declined: "border-paper-line bg-paper-deep text-ink",
  merged: "border-paper-line bg-paper-deep text-ink",
};

export function StateBadge({ state }: { state: QuestionState }) {
  return (
    <span className={`inline-block rounded-plate border-2 px-2 py-0.5 text-sm font-bold ${STYLE[state] ?? ""}`} data-state={state}>
      {STATE_LABELS[state] ?? state}
    </span>
  );
}
