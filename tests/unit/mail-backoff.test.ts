import { describe, expect, it } from "vitest";
import { BASE_RETRY_DELAY_MS, MAX_RETRY_DELAY_MS, retryDelayMs } from "@/lib/mail/backoff";

const noJitter = () => 0;
const fullJitter = () => 0.999999;

describe("retryDelayMs", () => {
  it("doubles from 15 s after each failed attempt", () => {
    expect([1, 2, 3, 4, 5].map((n) => retryDelayMs(n, noJitter))).toEqual([15_000, 30_000, 60_000, 120_000, 240_000]);
  });

  it("stops growing at 30 minutes, however many attempts failed", () => {
    expect(retryDelayMs(8, noJitter)).toBe(MAX_RETRY_DELAY_MS);
    expect(retryDelayMs(50, noJitter)).toBe(MAX_RETRY_DELAY_MS);
    expect(retryDelayMs(5_000, noJitter)).toBe(MAX_RETRY_DELAY_MS);
  });

  it("takes off at most a tenth as jitter, never adding to the delay", () => {
    expect(retryDelayMs(1, () => 0.5)).toBe(BASE_RETRY_DELAY_MS - 750);
    expect(retryDelayMs(1, fullJitter)).toBeGreaterThanOrEqual(BASE_RETRY_DELAY_MS * 0.9);
    expect(retryDelayMs(50, fullJitter)).toBeLessThanOrEqual(MAX_RETRY_DELAY_MS);
    expect(retryDelayMs(50, fullJitter)).toBeGreaterThanOrEqual(MAX_RETRY_DELAY_MS * 0.9);
  });

  it("stays within bounds with the default random source", () => {
    for (let i = 0; i < 200; i++) {
      const delay = retryDelayMs(3);
      expect(delay).toBeGreaterThanOrEqual(54_000);
      expect(delay).toBeLessThanOrEqual(60_000);
    }
  });

  it("clamps an out-of-range random value", () => {
    expect(retryDelayMs(1, () => -3)).toBe(15_000);
    expect(retryDelayMs(1, () => 7)).toBe(13_500);
  });

  it.each([0, -1, 1.5, Number.NaN])("rejects attempt %s", (attempt) => {
    expect(() => retryDelayMs(attempt)).toThrow(RangeError);
  });
});
