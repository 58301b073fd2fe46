/**
 * Slows password guessing: after too many failed sign-ins for one account or
 * from one address inside the window, further attempts are refused until the
 * oldest failure ages out. Kept in memory: one process serves the district
 * (see DEVELOPERS.md), and a restart forgetting the count is an acceptable loss
 * next to a table written on every failed attempt.
 */
export interface ThrottleOptions {
  windowMs: number;
  maxPerAccount: number;
  maxPerAddress: number;
}

export const SIGN_IN_THROTTLE: ThrottleOptions = { windowMs: 15 * 60_000, maxPerAccount: 5, maxPerAddress: 25 };

export class SignInThrottle {
  private readonly failures = new Map<string, number[]>();

  constructor(private readonly options: ThrottleOptions = SIGN_IN_THROTTLE) {}

  private recent(key: string, now: number): number[] {
    const kept = (this.failures.get(key) ?? []).filter((t) => now - t < this.options.windowMs);
    if (kept.length) this.failures.set(key, kept);
    else this.failures.delete(key);
    return kept;
  }

  /**
   * True while either the account or the address has used up its attempts. An
   * unknown address (null) is never limited as such: lumping every visitor into
   * one bucket would let a few failures lock out the whole staff.
   */
  isLimited(account: string, address: string | null, now = Date.now()): boolean {
    return (
      this.recent(`account:${account}`, now).length >= this.options.maxPerAccount ||
      (address !== null && this.recent(`address:${address}`, now).length >= this.options.maxPerAddress)
    );
  }

  recordFailure(account: string, address: string | null, now = Date.now()): void {
    const keys = address === null ? [`account:${account}`] : [`account:${account}`, `address:${address}`];
    for (const key of keys) this.failures.set(key, [...this.recent(key, now), now]);
  }

  recordSuccess(account: string): void {
    this.failures.delete(`account:${account}`);
  }
}

const globalForThrottle = globalThis as unknown as { clearhallSignInThrottle?: SignInThrottle };

export function signInThrottle(): SignInThrottle {
  globalForThrottle.clearhallSignInThrottle ??= new SignInThrottle();
  return globalForThrottle.clearhallSignInThrottle;
}

/** The error code next-auth hands back to the sign-in form when the throttle refuses. */
export const TOO_MANY_ATTEMPTS = "TooManyAttempts";
