export const BASE_RETRY_DELAY_MS = 15_000;
export const MAX_RETRY_DELAY_MS = 30 * 60_000;
/** Up to this share of the delay is taken off, so rows that failed together do not all retry in the same pass. */
export const RETRY_JITTER = 0.1;

/**
 * How long to wait before the next try after `attempt` failed tries (1 = the first failure):
 * 15 s, 30 s, 1 min, … doubling up to 30 min, less a jitter of up to 10 %.
 * `random` returns a number in [0, 1); pass a fixed one for a deterministic delay.
 */
export function retryDelayMs(attempt: number, random: () => number = Math.random): number {
  if (!Number.isInteger(attempt) || attempt < 1) {
    throw new RangeError(`retryDelayMs: attempt must be a whole number of at least 1, got ${attempt}`);
  }
  const delay = Math.min(MAX_RETRY_DELAY_MS, BASE_RETRY_DELAY_MS * 2 ** (attempt - 1));
  const r = Math.min(Math.max(random(), 0), 1);
  return Math.round(delay * (1 - RETRY_JITTER * r));
}
