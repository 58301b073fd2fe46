import { IllegalTransitionError } from "../state-machine";

/**
 * A desk step the server refuses. Route handlers turn it into JSON with its status:
 * 400 bad input (with field messages), 404 no such question, 409 the question's state
 * does not allow the step (nothing was changed).
 */
export class DeskError extends Error {
  constructor(
    readonly status: 400 | 403 | 404 | 409,
    message: string,
    readonly fields?: Record<string, string>,
    readonly code?: string,
  ) {
    super(message);
    this.name = "DeskError";
  }
}

export const notFound = () => new DeskError(404, "No question has this id.");

export function conflict(message: string): DeskError {
  return new DeskError(409, message, undefined, "illegal_transition");
}

/** The state machine's refusal, as the desk reports it. */
export function fromIllegalTransition(error: IllegalTransitionError): DeskError {
  return conflict(error.message);
}
