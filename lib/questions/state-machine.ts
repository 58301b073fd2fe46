// A parent's question from receipt to reply. Technical questions (air, building,
// cleaning) must pass a facilities check before they can be answered.

export const QUESTION_STATES = [
  "received",
  "drafting",
  "facilities_check",
  "changes_requested",
  "approved",
  "answered",
  "declined",
  "merged",
] as const;

export type QuestionState = (typeof QUESTION_STATES)[number];

export const QUESTION_TOPICS = ["cleaning", "air", "building", "signs", "distancing", "cases", "other"] as const;

export type QuestionTopic = (typeof QUESTION_TOPICS)[number];

export const TECHNICAL_TOPICS: readonly QuestionTopic[] = ["air", "building", "cleaning"];

export const TERMINAL_STATES: readonly QuestionState[] = ["answered", "declined", "merged"];

export interface TransitionContext {
  /** The question's topic needs a facilities check (see isTechnicalTopic). */
  technical: boolean;
}

// "drafting → answered" is listed here and withheld for technical questions below.
const TRANSITIONS: Readonly<Record<QuestionState, readonly QuestionState[]>> = {
  received: ["drafting", "declined", "merged"],
  drafting: ["facilities_check", "answered", "declined", "merged"],
  facilities_check: ["changes_requested", "approved"],
  changes_requested: ["drafting", "facilities_check"],
  // Editing an approved answer sends it back to drafting, so it needs a new check.
  approved: ["answered", "drafting"],
  answered: [],
  declined: [],
  merged: [],
};

export function isQuestionState(value: string): value is QuestionState {
  return (QUESTION_STATES as readonly string[]).includes(value);
}

export function isQuestionTopic(value: string): value is QuestionTopic {
  return (QUESTION_TOPICS as readonly string[]).includes(value);
}

/** Takes any string (a topic read from the database); an unknown topic is not technical. */
export function isTechnicalTopic(topic: string): boolean {
  return isQuestionTopic(topic) && TECHNICAL_TOPICS.includes(topic);
}

export function isTerminalState(state: QuestionState): boolean {
  return TERMINAL_STATES.includes(state);
}

export function canTransition(from: QuestionState, to: QuestionState, context: TransitionContext): boolean {
  if (from === "drafting" && to === "answered" && context.technical) return false;
  return TRANSITIONS[from].includes(to);
}

export function nextStates(from: QuestionState, context: TransitionContext): QuestionState[] {
  return TRANSITIONS[from].filter((to) => canTransition(from, to, context));
}

/** Thrown by assertTransition; a route handler maps it to 409 Conflict. */
export class IllegalTransitionError extends Error {
  readonly code = "illegal_transition";
  readonly from: QuestionState;
  readonly to: QuestionState;
  readonly technical: boolean;
  constructor(from: QuestionState, to: QuestionState, technical: boolean) {
    const why =
      from === "drafting" && to === "answered" && technical
        ? "a technical answer needs a facilities check first"
        : isTerminalState(from)
          ? `${from} is final`
          : `allowed next: ${nextStates(from, { technical }).join(", ")}`;
    super(`cannot move a question from ${from} to ${to}: ${why}`);
    this.name = "IllegalTransitionError";
    this.from = from;
    this.to = to;
    this.technical = technical;
  }
}

export function assertTransition(from: QuestionState, to: QuestionState, context: TransitionContext): void {
  if (!canTransition(from, to, context)) throw new IllegalTransitionError(from, to, context.technical);
}
