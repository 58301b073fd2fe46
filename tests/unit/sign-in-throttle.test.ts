import { describe, expect, it } from "vitest";
import { SignInThrottle } from "@/lib/auth/throttle";

const options = { windowMs: 15 * 60_000, maxPerAccount: 5, maxPerAddress: 8 };

describe("sign-in throttle", () => {
  it("limits an account after five failures and frees it when they age out", () => {
    const t = new SignInThrottle(options);
    for (let i = 0; i < 5; i++) {
      expect(t.isLimited("a@example.org", "ip1", i * 1000)).toBe(false);
      t.recordFailure("a@example.org", "ip1", i * 1000);
    }
    expect(t.isLimited("a@example.org", "ip2", 10_000)).toBe(true);
    expect(t.isLimited("b@example.org", "ip2", 10_000)).toBe(false);
    // The first failure leaves the window at 15 min; then one more try is allowed.
    expect(t.isLimited("a@example.org", "ip2", 15 * 60_000 + 1)).toBe(false);
  });

  it("limits an address that tries many accounts", () => {
    const t = new SignInThrottle(options);
    for (let i = 0; i < 8; i++) t.recordFailure(`user${i}@example.org`, "ip9", 0);
    expect(t.isLimited("fresh@example.org", "ip9", 1)).toBe(true);
    expect(t.isLimited("fresh@example.org", "ip8", 1)).toBe(false);
  });

  it("does not lump visitors with no known address together", () => {
    const t = new SignInThrottle(options);
    for (let i = 0; i < 20; i++) t.recordFailure(`user${i}@example.org`, null, 0);
    expect(t.isLimited("fresh@example.org", null, 1)).toBe(false);
  });

  it("a success clears the account's failures", () => {
    const t = new SignInThrottle(options);
    for (let i = 0; i < 4; i++) t.recordFailure("a@example.org", "ip1", 0);
    t.recordSuccess("a@example.org");
    t.recordFailure("a@example.org", "ip1", 1);
    expect(t.isLimited("a@example.org", "ip3", 2)).toBe(false);
  });
});
