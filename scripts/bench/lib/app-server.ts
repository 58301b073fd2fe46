// The production app for the benchmarks that need a running server: one build per
// `npm run bench` run (in .next-benchrun, over a fresh seeded database), then, for each
// benchmark, a copy of that database, a mail catcher and `next start` on free loopback
// ports, stopped again when the benchmark ends, also when it fails or is interrupted.
import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import { closeSync, existsSync, mkdirSync, openSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { createServer } from "node:net";
import { join, resolve } from "node:path";
import SQLite from "better-sqlite3";

export const BENCH_DIR = resolve(".tmp/bench");
export const BENCH_DIST_DIR = ".next-benchrun";
/** The empty static page in the same build: the framework's own floor. */
export const FLOOR_PATH = "/bench/empty";

const PRISTINE_DB = join(BENCH_DIR, "seeded.db");
const BUILD_STAMP = join(BENCH_DIR, "build-stamp");
const AUTH_SECRET = "bench-secret-bench-secret-bench-secret-bench";
const READY_TIMEOUT_MS = 60_000;

export interface AppServer {
  /** Base address, e.g. http://127.0.0.1:41234 (no trailing slash). */
  url: string;
  /** The SQLite file this server uses, a fresh copy of the seeded one. */
  databasePath: string;
  /** The server's process id (`next start` serves from the process it starts in). */
  pid: number;
  /** The last lines the server printed, for error messages. */
  logTail(lines?: number): string;
}

function freePort(): Promise<number> {
  return new Promise((resolvePort, reject) => {
    const server = createServer();
    server.unref();
    server.on("error", reject);
    server.listen(0, "127.0.0.1", () => {
      const address = server.address();
      const port = typeof address === "object" && address ? address.port : 0;
      server.close(() => resolvePort(port));
    });
  });
}

function baseEnv(extra: Record<string, string>): NodeJS.ProcessEnv {
  return {
    ...process.env,
    NODE_ENV: "production",
    NEXT_TELEMETRY_DISABLED: "1",
    NEXT_DIST_DIR: BENCH_DIST_DIR,
    AUTH_SECRET,
    ...extra,
  };
}

function tail(path: string, lines = 30): string {
  if (!existsSync(path)) return "";
  return readFileSync(path, "utf8").split("\n").slice(-lines).join("\n");
}

function runLogged(label: string, command: string, args: string[], env: NodeJS.ProcessEnv, logPath: string): void {
  const started = performance.now();
  const fd = openSync(logPath, "w");
  const result = spawnSync(command, args, { env, stdio: ["ignore", fd, fd] });
  closeSync(fd);
  if (result.status !== 0) {
    throw new Error(`${label} failed (exit ${result.status ?? result.signal}); last lines of ${logPath}:\n${tail(logPath)}`);
  }
  console.log(`${label}: ${((performance.now() - started) / 1000).toFixed(1)} s (log: ${logPath})`);
}

/**
 * Seeds a fresh database and builds the app against it, once per `npm run bench` run
 * (scripts/bench.ts gives every benchmark of one run the same BENCH_RUN_ID).
 * BENCH_SKIP_BUILD=1 reuses an existing build and its database.
 */
export function ensureBuild(): void {
  mkdirSync(BENCH_DIR, { recursive: true });
  const built = existsSync(join(BENCH_DIST_DIR, "BUILD_ID")) && existsSync(PRISTINE_DB);
  if (built && process.env.BENCH_SKIP_BUILD === "1") {
    console.log(`using the existing build in ${BENCH_DIST_DIR} (BENCH_SKIP_BUILD=1)`);
    return;
  }
  const runId = process.env.BENCH_RUN_ID;
  if (built && runId && existsSync(BUILD_STAMP) && readFileSync(BUILD_STAMP, "utf8") === runId) {
    console.log(`using the build made earlier in this run (${BENCH_DIST_DIR})`);
    return;
  }
  rmSync(BUILD_STAMP, { force: true });
  for (const suffix of ["", "-wal", "-shm"]) rmSync(PRISTINE_DB + suffix, { force: true });
  const env = baseEnv({
    DATABASE_URL: PRISTINE_DB,
    APP_URL: "http://localhost:3000",
    NEXTAUTH_URL: "http://localhost:3000",
    MAIL_SENDER_DISABLED: "1",
  });
  runLogged("seeded a fresh database", "npm", ["run", "db:seed"], env, join(BENCH_DIR, "seed.log"));
  runLogged(`built the app into ${BENCH_DIST_DIR}`, "npm", ["run", "build"], env, join(BENCH_DIR, "build.log"));
  if (runId) writeFileSync(BUILD_STAMP, runId);
}

async function copyDatabase(to: string): Promise<void> {
  for (const suffix of ["", "-wal", "-shm"]) rmSync(to + suffix, { force: true });
  const source = new SQLite(PRISTINE_DB, { readonly: true, fileMustExist: true });
  try {
    await source.backup(to);
  } finally {
    source.close();
  }
}

async function waitFor(url: string, child: ChildProcess, what: string, logPath: string): Promise<void> {
  const deadline = Date.now() + READY_TIMEOUT_MS;
  let lastError = "";
  while (Date.now() < deadline) {
    if (child.exitCode !== null || child.signalCode !== null) {
      throw new Error(`${what} stopped before it was ready (exit ${child.exitCode ?? child.signalCode}); last lines of ${logPath}:\n${tail(logPath)}`);
    }
    try {
      const response = await fetch(url, { signal: AbortSignal.timeout(5_000) });
      await response.arrayBuffer();
      if (response.ok) return;
      lastError = `status ${response.status}`;
    } catch (error) {
      lastError = error instanceof Error ? error.message : String(error);
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`${what} was not ready at ${url} within ${READY_TIMEOUT_MS / 1000} s (${lastError}); last lines of ${logPath}:\n${tail(logPath)}`);
}

function stopChild(child: ChildProcess): Promise<void> {
  if (child.exitCode !== null || child.signalCode !== null || child.pid === undefined) return Promise.resolve();
  const pid = child.pid;
  return new Promise((done) => {
    const force = setTimeout(() => {
      try {
        process.kill(-pid, "SIGKILL");
      } catch {
        // already gone
      }
    }, 5_000);
    child.once("exit", () => {
      clearTimeout(force);
      done();
    });
    try {
      // Each child leads its own process group (detached), so this reaches only what it started.
      process.kill(-pid, "SIGTERM");
    } catch {
      clearTimeout(force);
      done();
    }
  });
}

const running = new Set<ChildProcess>();
let exitHookInstalled = false;

function installExitHook(): void {
  if (exitHookInstalled) return;
  exitHookInstalled = true;
  const killAll = () => {
    for (const child of running) {
      if (child.pid !== undefined && child.exitCode === null) {
        try {
          process.kill(-child.pid, "SIGKILL");
        } catch {
          // already gone
        }
      }
    }
  };
  process.on("exit", killAll);
  for (const signal of ["SIGINT", "SIGTERM"] as const) {
    process.on(signal, () => {
      killAll();
      process.exit(130);
    });
  }
}

function startChild(command: string, args: string[], env: NodeJS.ProcessEnv, logPath: string): ChildProcess {
  installExitHook();
  const fd = openSync(logPath, "w");
  const child = spawn(command, args, { env, stdio: ["ignore", fd, fd], detached: true });
  closeSync(fd);
  running.add(child);
  child.once("exit", () => running.delete(child));
  return child;
}

/**
 * Runs `body` against a production server of the bench build with its own copy of the seeded
 * database and its own mail catcher, so the app's mail sender delivers as it does in the demo.
 * The server trusts one proxy (TRUST_PROXY=1), so a benchmark can give each request its own
 * X-Forwarded-For address.
 */
export async function withAppServer<T>(name: string, body: (app: AppServer) => Promise<T>, extraEnv: Record<string, string> = {}): Promise<T> {
  ensureBuild();
  const databasePath = join(BENCH_DIR, `${name}.db`);
  await copyDatabase(databasePath);
  const [appPort, smtpPort, mailWebPort] = [await freePort(), await freePort(), await freePort()];
  const url = `http://127.0.0.1:${appPort}`;
  const appUrl = `http://localhost:${appPort}`;
  const serverLog = join(BENCH_DIR, `${name}-server.log`);
  const mailLog = join(BENCH_DIR, `${name}-mail.log`);

  const children: ChildProcess[] = [];
  try {
    const maildev = startChild(
      process.execPath,
      ["node_modules/maildev/dist/bin/maildev.js", "--smtp", String(smtpPort), "--web", String(mailWebPort), "--ip", "127.0.0.1", "--web-ip", "127.0.0.1", "--silent"],
      baseEnv({}),
      mailLog,
    );
    children.push(maildev);
    await waitFor(`http://127.0.0.1:${mailWebPort}/api/healthz`, maildev, "the mail catcher", mailLog);

    const next = startChild(
      process.execPath,
      ["node_modules/next/dist/bin/next", "start", "-H", "127.0.0.1", "-p", String(appPort)],
      baseEnv({
        DATABASE_URL: databasePath,
        APP_URL: appUrl,
        NEXTAUTH_URL: appUrl,
        SMTP_URL: `smtp://127.0.0.1:${smtpPort}`,
        MAIL_SENDER_INTERVAL_MS: "2000",
        TRUST_PROXY: "1",
        ...extraEnv,
      }),
      serverLog,
    );
    children.push(next);
    const started = performance.now();
    await waitFor(`${url}${FLOOR_PATH}`, next, "next start", serverLog);
    console.log(`server ready on ${url} in ${((performance.now() - started) / 1000).toFixed(1)} s (log: ${serverLog})`);

    if (next.pid === undefined) throw new Error("next start has no process id");
    return await body({ url, databasePath, pid: next.pid, logTail: (lines) => tail(serverLog, lines) });
  } finally {
    for (const child of children.reverse()) await stopChild(child);
  }
}
