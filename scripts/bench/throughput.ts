// Server throughput and latency under load on loopback, with autocannon.
// 1. A school page beside the empty static page of the same build, in the same run, with the same
//    load (10 connections, gzip accepted as a browser does): after a 3 s warm-up each, 10 s per
//    page in four alternating 5 s rounds (floor, school, school, floor, ...), so a change in the
//    machine's other load during the run falls on both alike; medians of the rounds are shown.
//    Beside them, the server's own CPU time per request (from /proc), which other programs on the
//    machine barely move: its ratio is what the requests-per-second ratio tends to on a quiet host.
//    Then two rounds each without compression: `next start` gzips every response as it goes, the
//    one cost that grows with the page (the school page's HTML is about twice the floor's).
//    Then the part of the gap that is the framework's own work per byte (gzip, ETag hash), timed on
//    both pages' HTML, and the share the school page could reach if that were the only difference.
//    Target: the school page serves at least 80% of the floor's requests per second.
// 2. POST /api/questions: 500 valid questions over 10 connections (stopped after 60 s whatever
//    happens), each from its own address (X-Forwarded-For, the server trusts one proxy) and its own
//    e-mail address, so the per-address and per-e-mail limits never refuse one. Afterwards every 201's
//    reference is looked up in the database, and the confirmations are followed through the outbox.
import { execFileSync } from "node:child_process";
import { readFileSync } from "node:fs";
import { loadavg } from "node:os";
import SQLite from "better-sqlite3";
import { FLOOR_PATH, withAppServer } from "./lib/app-server";
import { BROWSER_ACCEPT_ENCODING, fmtKb, getRaw } from "./lib/http";
import { perByteWork, type PerByteWork } from "./lib/per-byte-work";
import { runLoad, type LoadResult } from "./lib/load";
import { median } from "./lib/stats";
import { printTable } from "./lib/table";

const SCHOOL_PATH = "/schools/tamsin-creek";
const CONNECTIONS = 10;
const WARMUP_SECONDS = 3;
const ROUND_SECONDS = 5;
const ROUNDS = 4;
const POST_AMOUNT = 500;
const POST_MAX_SECONDS = 60;
const MAIL_WAIT_SECONDS = 30;
const SCHOOL_SHARE_TARGET = 0.8;

const SCHOOLS = ["tamsin-creek", "corrow-ridge", "eastmere", "district"];
const TOPICS = ["cleaning", "air", "building", "signs", "distancing", "cases", "other"];

const ms = (v: number) => `${v.toFixed(v < 10 ? 1 : 0)} ms`;

function statuses(result: LoadResult): string {
  return Object.entries(result.statusCodeStats)
    .map(([code, s]) => `${code}: ${s.count}`)
    .join(", ");
}

function loadRow(label: string, path: string, r: LoadResult): string[] {
  return [
    label,
    path,
    r.requests.average.toFixed(0),
    ms(r.latency.p50),
    ms(r.latency.p97_5),
    ms(r.latency.p99),
    String(r.requests.total),
    `${statuses(r)}${r.errors ? `, errors: ${r.errors}` : ""}${r.timeouts ? `, timeouts: ${r.timeouts}` : ""}`,
  ];
}

const CLOCK_TICKS = Number(execFileSync("getconf", ["CLK_TCK"], { encoding: "utf8" }).trim()) || 100;

/** CPU seconds (user + system) a process has used so far, from /proc/<pid>/stat. */
function cpuSeconds(pid: number): number {
  const stat = readFileSync(`/proc/${pid}/stat`, "utf8");
  // Fields after the command name, which is in parentheses and may hold spaces.
  const fields = stat.slice(stat.lastIndexOf(")") + 2).split(" ");
  return (Number(fields[11]) + Number(fields[12])) / CLOCK_TICKS;
}

interface Measured {
  result: LoadResult;
  cpuMsPerRequest: number;
}

interface Rounds {
  reqPerSec: number;
  p50: number;
  p975: number;
  p99: number;
  requests: number;
  statuses: Map<string, number>;
  errors: number;
  timeouts: number;
  perRound: number[];
  cpuMsPerRequest: number;
}

function summarise(measured: Measured[]): Rounds {
  const runs = measured.map((m) => m.result);
  const statusCounts = new Map<string, number>();
  for (const r of runs) for (const [code, st] of Object.entries(r.statusCodeStats)) statusCounts.set(code, (statusCounts.get(code) ?? 0) + st.count);
  return {
    reqPerSec: median(runs.map((r) => r.requests.average)),
    p50: median(runs.map((r) => r.latency.p50)),
    p975: median(runs.map((r) => r.latency.p97_5)),
    p99: median(runs.map((r) => r.latency.p99)),
    requests: runs.reduce((n, r) => n + r.requests.total, 0),
    statuses: statusCounts,
    errors: runs.reduce((n, r) => n + r.errors, 0),
    timeouts: runs.reduce((n, r) => n + r.timeouts, 0),
    perRound: runs.map((r) => Math.round(r.requests.average)),
    cpuMsPerRequest: median(measured.map((m) => m.cpuMsPerRequest)),
  };
}

function roundsRow(label: string, path: string, r: Rounds): string[] {
  return [
    label,
    path,
    r.reqPerSec.toFixed(0),
    ms(r.p50),
    ms(r.p975),
    ms(r.p99),
    String(r.requests),
    [...r.statuses].map(([code, n]) => `${code}: ${n}`).join(", ") + (r.errors ? `, errors: ${r.errors}` : "") + (r.timeouts ? `, timeouts: ${r.timeouts}` : ""),
    r.cpuMsPerRequest.toFixed(2),
    r.perRound.join(" / "),
  ];
}

async function pages(base: string, pid: number, encoding: string | null, rounds: number): Promise<void> {
  const headers: Record<string, string> = encoding ? { "accept-encoding": encoding } : {};
  const get = (path: string, duration: number) => runLoad({ url: `${base}${path}`, connections: CONNECTIONS, duration, headers }, duration + 30);
  const measure = async (path: string): Promise<Measured> => {
    const before = cpuSeconds(pid);
    const result = await get(path, ROUND_SECONDS);
    return { result, cpuMsPerRequest: ((cpuSeconds(pid) - before) * 1000) / Math.max(1, result.requests.total) };
  };
  const load = loadavg().map((l) => l.toFixed(1)).join(", ");
  await get(FLOOR_PATH, WARMUP_SECONDS);
  await get(SCHOOL_PATH, WARMUP_SECONDS);
  const floorRuns: Measured[] = [];
  const schoolRuns: Measured[] = [];
  for (let round = 0; round < rounds; round += 1) {
    const order = round % 2 === 0 ? [FLOOR_PATH, SCHOOL_PATH] : [SCHOOL_PATH, FLOOR_PATH];
    for (const path of order) (path === FLOOR_PATH ? floorRuns : schoolRuns).push(await measure(path));
  }
  const floor = summarise(floorRuns);
  const school = summarise(schoolRuns);

  console.log(
    `\nGET under load, ${encoding ? `Accept-Encoding: ${encoding} (gzip served)` : "no Accept-Encoding (uncompressed, as behind a proxy that compresses)"}: ${CONNECTIONS} connections, ${rounds} alternating rounds of ${ROUND_SECONDS} s per page after a ${WARMUP_SECONDS} s warm-up, medians of the rounds; load average before: ${load}`,
  );
  printTable(
    ["page", "path", "req/s", "p50", "p97.5", "p99", "requests", "statuses", "server CPU ms/req", "req/s per round"],
    [roundsRow("empty static page (floor)", FLOOR_PATH, floor), roundsRow("school page", SCHOOL_PATH, school)],
  );
  const share = school.reqPerSec / floor.reqPerSec;
  const cpuShare = floor.cpuMsPerRequest / school.cpuMsPerRequest;
  const mark = (v: number) => (v >= SCHOOL_SHARE_TARGET ? "✓" : "✗ under");
  console.log(
    `school page: ${(share * 100).toFixed(0)}% of the floor's requests per second ${mark(share)}; by the server's CPU time per request ${(cpuShare * 100).toFixed(0)}% ${mark(cpuShare)} (target ≥ ${SCHOOL_SHARE_TARGET * 100}%; clock tick ${1000 / CLOCK_TICKS} ms)`,
  );
  await explainGap(base, floor, school, encoding !== null);
  for (const [name, r] of [["floor", floor], ["school page", school]] as const) {
    const non2xx = [...r.statuses].filter(([code]) => !code.startsWith("2")).reduce((n, [, c]) => n + c, 0);
    if (non2xx || r.errors || r.timeouts) console.log(`warning: the ${name} runs had ${non2xx} non-2xx answers, ${r.errors} errors, ${r.timeouts} timeouts`);
  }
}

/**
 * How much of the gap is the framework's per-byte work: both pages come from the prerender cache,
 * so the rest of a request's work is the same for both. If the pages differed in nothing else, the
 * school page could reach at most floor CPU / (floor CPU + the extra per-byte work).
 */
async function explainGap(base: string, floor: Rounds, school: Rounds, gzip: boolean): Promise<void> {
  // Whether the server hashes pages for an ETag at all (next.config.mjs generateEtags).
  let etag = false;
  const work = async (path: string) => {
    const response = await getRaw(`${base}${path}`, { "accept-encoding": "identity" });
    etag ||= response.headers.etag !== undefined;
    return perByteWork(response.body.toString("utf8"));
  };
  const floorWork = await work(FLOOR_PATH);
  const schoolWork = await work(SCHOOL_PATH);
  const perRequest = (w: PerByteWork) => (etag ? w.etagMs : 0) + (gzip ? w.gzipMs : 0);
  const done = (ms: number, isDone: boolean) => (isDone ? ms.toFixed(3) : `not done (${ms.toFixed(3)})`);
  const row = (label: string, w: PerByteWork) => [label, fmtKb(w.htmlBytes), fmtKb(w.gzipBytes), done(w.gzipMs, gzip), done(w.etagMs, etag), perRequest(w).toFixed(3)];
  printTable(["page", "HTML", "gzipped", "gzip ms", "ETag ms", "per-byte work ms/req"], [row("empty static page (floor)", floorWork), row("school page", schoolWork)]);
  const extra = perRequest(schoolWork) - perRequest(floorWork);
  const bound = floor.cpuMsPerRequest / (floor.cpuMsPerRequest + extra);
  console.log(
    `per-byte work: the school page's bigger HTML alone costs ${extra.toFixed(2)} ms more per request (${[gzip ? "gzip at zlib's default level" : "", etag ? "Next's ETag hash" : ""].filter(Boolean).join(" and ") || "none of it is done here"}, timed in this process), of the ${(school.cpuMsPerRequest - floor.cpuMsPerRequest).toFixed(2)} ms the server spent more; with nothing else different it could reach at most ${(bound * 100).toFixed(0)}% of the floor`,
  );
}

function count(sqlite: SQLite.Database, sql: string, ...params: unknown[]): number {
  return (sqlite.prepare(sql).get(...params) as { n: number }).n;
}

async function questions(base: string, databasePath: string): Promise<void> {
  const sqlite = new SQLite(databasePath, { readonly: true, fileMustExist: true });
  try {
    const questionsBefore = count(sqlite, "select count(*) as n from questions");
    const lastMailBefore = count(sqlite, "select coalesce(max(id), 0) as n from outbox");
    const run = `${Date.now().toString(36)}`;
    let sequence = 0;
    const references: string[] = [];
    const otherBodies = new Map<number, string>();

    const loadStarted = performance.now();
    const result = await runLoad(
      {
        url: `${base}/api/questions`,
        method: "POST",
        connections: CONNECTIONS,
        amount: POST_AMOUNT,
        timeout: 10,
        setupRequest: (req) => {
          sequence += 1;
          const n = sequence;
          const body = {
            school: SCHOOLS[n % SCHOOLS.length],
            topic: TOPICS[n % TOPICS.length],
            room: n % 3 === 0 ? `Room ${100 + (n % 40)}` : undefined,
            question: `Load-test question ${n}: how often are the classroom air filters changed, and who checks them?`,
            name: n % 2 === 0 ? `Bench Parent ${n}` : undefined,
            email: `bench.parent.${run}.${n}@example.net`,
          };
          return {
            ...req,
            method: "POST",
            path: "/api/questions",
            // Documentation prefix (RFC 3849), one /64 per request: the rate limit keys IPv6 by /64.
            headers: { ...req.headers, "content-type": "application/json", "x-forwarded-for": `2001:db8:${(n >> 16).toString(16)}:${(n & 0xffff).toString(16)}::1` },
            body: JSON.stringify(body),
          };
        },
        onResponse: (status, body) => {
          if (status === 201) {
            const reference = (JSON.parse(body) as { reference?: string }).reference;
            if (reference) references.push(reference);
          } else if (otherBodies.size < 5 && !otherBodies.has(status)) {
            otherBodies.set(status, body.slice(0, 200));
          }
        },
      },
      POST_MAX_SECONDS,
    );

    console.log(`\nPOST /api/questions under load: ${POST_AMOUNT} valid questions over ${CONNECTIONS} connections (stopped after ${POST_MAX_SECONDS} s at most)`);
    printTable(["request", "path", "req/s", "p50", "p97.5", "p99", "requests", "statuses"], [loadRow("POST, JSON", "/api/questions", result)]);
    for (const [status, body] of otherBodies) console.log(`a ${status} answer said: ${body}`);

    const created = result.statusCodeStats["201"]?.count ?? 0;
    const stored = references.filter((ref) => count(sqlite, "select count(*) as n from questions where reference = ?", ref) === 1).length;
    const added = count(sqlite, "select count(*) as n from questions") - questionsBefore;
    const distinct = new Set(references).size;
    const allStored = stored === created && distinct === created && added === created;
    console.log(
      `stored: ${stored} of ${created} answered 201 are in the database under their reference (${distinct} distinct references; ${added} rows added) ${allStored ? "✓" : "✗ mismatch"}`,
    );

    const newMail = "from outbox where kind = 'question-received' and id > ?";
    const queued = count(sqlite, `select count(*) as n ${newMail}`, lastMailBefore);
    const started = performance.now();
    const waiting = () => count(sqlite, `select count(*) as n ${newMail} and status in ('pending', 'sending')`, lastMailBefore);
    while (waiting() > 0 && performance.now() - started < MAIL_WAIT_SECONDS * 1000) await new Promise((r) => setTimeout(r, 500));
    const waited = (performance.now() - started) / 1000;
    const byStatus = sqlite.prepare(`select status, count(*) as n ${newMail} group by status order by status`).all(lastMailBefore) as { status: string; n: number }[];
    const left = waiting();
    const sent = byStatus.find((r) => r.status === "sent")?.n ?? 0;
    const sinceStart = (performance.now() - loadStarted) / 1000;
    console.log(
      `confirmations: ${queued} queued with the questions; ${left ? `${MAIL_WAIT_SECONDS} s after the load` : `all out ${waited.toFixed(1)} s after the load`}: ${byStatus.map((r) => `${r.status} ${r.n}`).join(", ")} (${(sent / sinceStart).toFixed(1)} sent per second since the load began, to the local mail catcher)`,
    );
  } finally {
    sqlite.close();
  }
}

async function main(): Promise<void> {
  await withAppServer("throughput", async ({ url, databasePath, pid }) => {
    await pages(url, pid, BROWSER_ACCEPT_ENCODING, ROUNDS);
    await pages(url, pid, null, 2);
    await questions(url, databasePath);
  });
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exitCode = 1;
});
