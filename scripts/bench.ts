// `npm run bench [-- name…]`: runs each benchmark in scripts/bench/*.ts in its own
// process, one after another, so each reports its own time and peak memory.
// Benchmarks print their figures; they never fail a build on a timing.
import { spawnSync } from "node:child_process";
import { readdirSync } from "node:fs";
import { join } from "node:path";

const dir = join(process.cwd(), "scripts", "bench");
const wanted = process.argv.slice(2);
const files = readdirSync(dir)
  .filter((f) => f.endsWith(".ts"))
  .sort()
  .filter((f) => wanted.length === 0 || wanted.some((w) => f.includes(w)));

if (files.length === 0) {
  console.error(`No benchmark matches ${wanted.join(", ")}. Available: ${readdirSync(dir).filter((f) => f.endsWith(".ts")).join(", ")}`);
  process.exit(1);
}

// Benchmarks that need the app share one build per run (scripts/bench/lib/app-server.ts).
const runId = `${process.pid}-${Date.now()}`;
let failed = false;
for (const file of files) {
  console.log(`\n▶ ${file}`);
  const run = spawnSync(process.execPath, ["--import", "tsx", join(dir, file)], { stdio: "inherit", env: { ...process.env, NODE_ENV: "production", BENCH_RUN_ID: process.env.BENCH_RUN_ID ?? runId } });
  if (run.status !== 0) {
    failed = true;
    console.error(`✗ ${file} exited with ${run.status ?? run.signal}`);
  }
}
process.exit(failed ? 1 : 0);
