import { describe, expect, it } from "vitest";
import { messageIdHost } from "@/lib/mail/outbox";
import { describeSendError } from "@/lib/mail/sender";
import { summarizeDelivery } from "@/lib/mail/worker";

describe("messageIdHost", () => {
  it("uses the host of the app URL", () => {
    expect(messageIdHost("https://reopening.example.org/desk")).toBe("reopening.example.org");
    expect(messageIdHost("http://localhost:3000")).toBe("localhost");
  });

  it("falls back to the reserved .invalid name", () => {
    expect(messageIdHost(undefined)).toBe("clearhall.invalid");
    expect(messageIdHost("not a url")).toBe("clearhall.invalid");
  });
});

describe("describeSendError", () => {
  it("masks addresses quoted in an SMTP reply", () => {
    const error = Object.assign(
      new Error("Can't send mail - all recipients were rejected: 550 5.1.1 <parent7@example.net>: Recipient address rejected"),
      { code: "EENVELOPE" },
    );
    const text = describeSendError(error);
    expect(text).toBe(
      "EENVELOPE: Can't send mail - all recipients were rejected: 550 5.1.1 <[address]>: Recipient address rejected",
    );
    expect(describeSendError(new Error('Invalid recipient "a.b+c@example.org"'))).toBe('Invalid recipient "[address]"');
  });

  it("keeps the code once and bounds the length", () => {
    expect(describeSendError(Object.assign(new Error("ETIMEDOUT: Greeting never received"), { code: "ETIMEDOUT" }))).toBe(
      "ETIMEDOUT: Greeting never received",
    );
    expect(describeSendError(new Error("x".repeat(2_000)))).toHaveLength(500);
    expect(describeSendError("plain string")).toBe("plain string");
  });
});

describe("summarizeDelivery", () => {
  const empty = { sent: 0, retried: 0, failed: 0, released: 0, problems: [] };

  it("says nothing when nothing happened", () => {
    expect(summarizeDelivery(empty)).toBeUndefined();
  });

  it("gives counts and outbox ids grouped by error, on one line", () => {
    const line = summarizeDelivery({
      ...empty,
      sent: 2,
      retried: 2,
      failed: 1,
      released: 1,
      problems: [
        { outboxId: 4, error: "ESOCKET: connect ECONNREFUSED 127.0.0.1:1025", final: false },
        { outboxId: 9, error: "ESOCKET: connect ECONNREFUSED 127.0.0.1:1025", final: false },
        { outboxId: 3, error: "EENVELOPE: 550 rejected", final: true },
      ],
    });
    expect(line).toBe(
      "[mail] sent 2, retried 2, failed 1, released 1 stale " +
        "(outbox 4, 9: ESOCKET: connect ECONNREFUSED 127.0.0.1:1025; outbox 3: EENVELOPE: 550 rejected)",
    );
    expect(line).not.toContain("\n");
  });
});
