// Lighthouse slows the host's CPU by a fixed 4× to stand for a mid-tier phone, which assumes a
// high-end desktop host. Its own guide (GoogleChrome/lighthouse docs/throttling.md, "Calibrating
// the CPU slowdown") gives the host classes by BenchmarkIndex and the multiplier that brings each
// to a mid-tier phone; this is that table, using its suggested value for each class.

/** [lowest BenchmarkIndex of the host class, class, multiplier that targets a mid-tier phone]. */
export const HOST_CLASSES: readonly [minIndex: number, name: string, multiplier: number][] = [
  [1500, "high-end desktop", 4],
  [1000, "low-end desktop", 2],
  [800, "high-end mobile", 2],
  [0, "mid-tier mobile or slower", 1],
];

/** The CPU slowdown that makes a host with this BenchmarkIndex behave like a mid-tier phone. */
export function calibratedCpuSlowdown(benchmarkIndex: number): { multiplier: number; hostClass: string } {
  for (const [min, name, multiplier] of HOST_CLASSES) {
    if (benchmarkIndex >= min) return { multiplier, hostClass: name };
  }
  return { multiplier: 1, hostClass: "mid-tier mobile or slower" };
}

