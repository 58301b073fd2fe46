import { isQuestionState, type QuestionState } from "./state-machine";

/** What an asker reads about their question: a short label and one or two plain sentences. */
export interface ParentStatus {
  label: string;
  explanation: string;
  /** Where the question is on the way to a reply, for the steps on the status page. */
  step: ParentStep;
}

export const PARENT_STEPS = ["received", "writing", "checking", "answered"] as const;
export type ParentStep = (typeof PARENT_STEPS)[number] | "closed";

export const PARENT_STEP_LABELS: Record<(typeof PARENT_STEPS)[number], string> = {
  received: "We have your question",
  writing: "A staff member writes the answer",
  checking: "Facilities checks the technical details",
  answered: "The answer is sent to you",
};

// Internal steps (sent back for changes, approved) are kept from families: they mean "still being checked".
export const PARENT_STATUS: Record<QuestionState, ParentStatus> = {
  received: {
    label: "Received",
    explanation: "We have your question. A staff member who knows the topic will read it soon.",
    step: "received",
  },
  drafting: {
    label: "Being answered",
    explanation: "A staff member is writing the answer to your question.",
    step: "writing",
  },
  facilities_check: {
    label: "Being checked",
    explanation: "The answer is written. Our facilities team is checking the technical details before we send it.",
    step: "checking",
  },
  changes_requested: {
    label: "Being checked",
    explanation: "The answer is written. Our facilities team is checking the technical details before we send it.",
    step: "checking",
  },
  approved: {
    label: "Almost ready",
    explanation: "The answer has been checked and will be sent to you soon.",
    step: "checking",
  },
  answered: {
    label: "Answered",
    explanation: "We sent the answer to your e-mail address. You can also read it on this page.",
    step: "answered",
  },
  declined: {
    label: "Closed",
    explanation:
      "We cannot answer this question through the question desk. Please check your e-mail: we wrote to say why, and who can help.",
    step: "closed",
  },
  merged: {
    label: "Answered together with a similar question",
    explanation: "Other families asked the same thing, so we are answering them all at once. The answer will come to your e-mail address.",
    step: "writing",
  },
};

export function parentStatus(state: string): ParentStatus {
  return isQuestionState(state) ? PARENT_STATUS[state] : PARENT_STATUS.received;
}
