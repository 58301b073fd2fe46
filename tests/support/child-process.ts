import { spawn } from "node:child_process";

const CHILD = "tests/support/reliability-child.ts";

export interface ChildRun {
  code: number | null;
  signal: NodeJS.Signals | null;
  /** The JSON lines the child printed, in order. */
  lines: Record<string, unknown>[];
  stderr: string;
}

/** Runs tests/support/reliability-child.ts in its own Node process (its own SQLite connection). */
export function runReliabilityChild(args: string[]): Promise<ChildRun> {
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, ["--import", "tsx", CHILD, ...args], { stdio: ["ignore", "pipe", "pipe"] });
    let stdout = "";
    let stderr = "";
    child.stdout.on("data", (chunk: Buffer) => (stdout += chunk.toString("utf8")));
    child.stderr.on("data", (chunk: Buffer) => (stderr += chunk.toString("utf8")));
    child.on("error", reject);
    child.on("close", (code, signal) =>
      resolve({
        code,
        signal,
        stderr,
        lines: stdout
          .split("\n")
          .filter((line) => line.trim().startsWith("{"))
          .map((line) => JSON.parse(line) as Record<string, unknown>),
      }),
    );
  });
}
