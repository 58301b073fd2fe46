// The work `next start` does on every request for a prerendered page that grows with its size:
// the ETag hash over the whole HTML (Next's own generateETag, FNV-1a in JavaScript) and gzip at
// zlib's default level, which is what the `compression` middleware inside Next uses (it takes no
// options there). Timed here in this process on the page's own bytes, so the throughput benchmark
// can say how much of the gap to the empty page is the framework's per-byte work on a bigger page.
import { gzipSync } from "node:zlib";
import { generateETag } from "next/dist/server/lib/etag";
import { median } from "./stats";

export interface PerByteWork {
  htmlBytes: number;
  gzipBytes: number;
  /** Median milliseconds per call. */
  gzipMs: number;
  etagMs: number;
}

function timeMs(fn: () => void, calls: number): number {
  for (let i = 0; i < Math.min(200, calls); i += 1) fn(); // warm the JIT and zlib's allocator
  const samples: number[] = [];
  for (let batch = 0; batch < 7; batch += 1) {
    const started = process.hrtime.bigint();
    for (let i = 0; i < calls; i += 1) fn();
    samples.push(Number(process.hrtime.bigint() - started) / 1e6 / calls);
  }
  return median(samples);
}

export function perByteWork(html: string, calls = 300): PerByteWork {
  const bytes = Buffer.from(html);
  return {
    htmlBytes: bytes.length,
    gzipBytes: gzipSync(bytes).length,
    gzipMs: timeMs(() => gzipSync(bytes), calls),
    etagMs: timeMs(() => generateETag(html), calls),
  };
}
