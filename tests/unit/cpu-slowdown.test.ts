import { describe, expect, it } from "vitest";
import { calibratedCpuSlowdown } from "@/scripts/bench/lib/cpu-slowdown";
import { median, percentile } from "@/scripts/bench/lib/stats";

// Source: Lighthouse's docs/throttling.md, "Benchmarking CPU Power" (host classes by
// BenchmarkIndex) and "Calibrating the CPU slowdown" (suggested multiplier to reach a
// mid-tier mobile: high-end desktop 4×, low-end desktop 2×, high-end mobile 2×).
describe("calibratedCpuSlowdown (Lighthouse docs/throttling.md)", () => {
  it("keeps the default 4× for a high-end desktop (BenchmarkIndex 1500–2000)", () => {
    expect(calibratedCpuSlowdown(1800)).toEqual({ multiplier: 4, hostClass: "high-end desktop" });
    expect(calibratedCpuSlowdown(1500).multiplier).toBe(4);
  });
  it("uses 2× for a low-end desktop (1000–1500) and a high-end phone (800–1200)", () => {
    expect(calibratedCpuSlowdown(1250)).toEqual({ multiplier: 2, hostClass: "low-end desktop" });
    expect(calibratedCpuSlowdown(900)).toEqual({ multiplier: 2, hostClass: "high-end mobile" });
  });
  it("does not slow a host that is already a mid-tier phone (125–800)", () => {
    expect(calibratedCpuSlowdown(500).multiplier).toBe(1);
  });
});

describe("bench statistics", () => {
  it("takes the middle value, or the mean of the two middle ones", () => {
    expect(median([3, 1, 2])).toBe(2);
    expect(median([4, 1, 3, 2])).toBe(2.5);
    expect(median([])).toBeNaN();
  });
  it("takes the nearest-rank percentile of a sorted list", () => {
    const sorted = Array.from({ length: 100 }, (_, i) => i + 1);
    expect(percentile(sorted, 0.5)).toBe(51);
    expect(percentile(sorted, 0.95)).toBe(96);
    expect(percentile(sorted, 1)).toBe(100);
  });
});
