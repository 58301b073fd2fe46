// A thin, typed wrapper round autocannon's programmatic API (autocannon ships no types).
import { createRequire } from "node:module";

export interface LoadRequest {
  method?: "GET" | "POST";
  path?: string;
  headers?: Record<string, string>;
  body?: string;
}

export interface LoadOptions {
  url: string;
  connections: number;
  /** Seconds; ignored when `amount` is set. */
  duration?: number;
  /** Total requests to send. */
  amount?: number;
  method?: "GET" | "POST";
  headers?: Record<string, string>;
  /** Called for every request before it is sent; lets each carry its own headers and body. */
  setupRequest?: (req: LoadRequest) => LoadRequest;
  onResponse?: (status: number, body: string) => void;
  /** Per-request timeout, seconds. */
  timeout?: number;
}

interface Histogram {
  average: number;
  mean: number;
  stddev: number;
  min: number;
  max: number;
  total: number;
  p50: number;
  p97_5: number;
  p99: number;
}

export interface LoadResult {
  duration: number;
  errors: number;
  timeouts: number;
  non2xx: number;
  statusCodeStats: Record<string, { count: number }>;
  latency: Histogram;
  requests: Histogram & { sent: number };
  throughput: Histogram;
}

type Instance = { stop(): void };
type Autocannon = (opts: Record<string, unknown>, cb: (error: Error | null, result: LoadResult) => void) => Instance;

const autocannon = createRequire(import.meta.url)("autocannon") as Autocannon;

/** Runs one load and resolves with autocannon's result; stops it after `maxSeconds` whatever its settings. */
export function runLoad(options: LoadOptions, maxSeconds = 120): Promise<LoadResult> {
  return new Promise((resolve, reject) => {
    const { setupRequest, onResponse, ...rest } = options;
    const opts: Record<string, unknown> = { ...rest, renderProgressBar: false, renderResultsTable: false, renderLatencyTable: false };
    if (setupRequest || onResponse) {
      opts.requests = [
        {
          ...(setupRequest ? { setupRequest: (req: LoadRequest) => setupRequest(req) } : {}),
          ...(onResponse ? { onResponse: (status: number, body: string) => onResponse(status, body) } : {}),
        },
      ];
    }
    const guard = setTimeout(() => instance.stop(), maxSeconds * 1000);
    const instance = autocannon(opts, (error, result) => {
      clearTimeout(guard);
      if (error) reject(error);
      else resolve(result);
    });
  });
}
