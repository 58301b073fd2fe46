// Server throughput and latency under load on loopback, with autocannon.
// 1. A school page beside the empty static page of the same build, in the same run, with the same
//    load (10 connections, 10 s each after a 3 s warm-up, gzip accepted as a browser does).
//    Target: the school page serves at least 80% of the floor's requests per second.
// 2. POST /api/questions: 500 valid questions over 10 connections (stopped after 60 s whatever
//    happens), each from its own address (X-Forwarded-For, the server trusts one proxy) and its own
//    e-mail address, so the per-address and per-e-mail limits never refuse one. Afterwards every 201's
//    reference is looked up in the database, and the confirmations are followed through the outbox.
import SQLite from "better-sqlite3";
import { FLOOR_PATH, withAppServer } from "./lib/app-server";
import { BROWSER_ACCEPT_ENCODING } from "./lib/http";
import { runLoad, type LoadResult } from "./lib/load";
import { printTable } from "./lib/table";

const SCHOOL_PATH = "/schools/tamsin-creek";
const CONNECTIONS = 10;
const WARMUP_SECONDS = 3;
const SECONDS = 10;
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

async function pages(base: string): Promise<void> {
  const get = (path: string, duration: number) =>
    runLoad({ url: `${base}${path}`, connections: CONNECTIONS, duration, headers: { "accept-encoding": BROWSER_ACCEPT_ENCODING } }, duration + 30);
  await get(FLOOR_PATH, WARMUP_SECONDS);
  await get(SCHOOL_PATH, WARMUP_SECONDS);
  const floor = await get(FLOOR_PATH, SECONDS);
  const school = await get(SCHOOL_PATH, SECONDS);

  console.log(`\nGET under load: ${CONNECTIONS} connections, ${SECONDS} s each after a ${WARMUP_SECONDS} s warm-up, Accept-Encoding: ${BROWSER_ACCEPT_ENCODING}`);
  printTable(
    ["page", "path", "req/s", "p50", "p97.5", "p99", "requests", "statuses"],
    [loadRow("empty static page (floor)", FLOOR_PATH, floor), loadRow("school page", SCHOOL_PATH, school)],
  );
  const share = school.requests.average / floor.requests.average;
  const mark = share >= SCHOOL_SHARE_TARGET ? "✓" : "✗ under";
  console.log(`school page: ${(share * 100).toFixed(0)}% of the floor's requests per second (target ≥ ${SCHOOL_SHARE_TARGET * 100}%) ${mark}`);
  for (const [name, r] of [["floor", floor], ["school page", school]] as const) {
    if (r.non2xx || r.errors || r.timeouts) console.log(`warning: the ${name} run had ${r.non2xx} non-2xx answers, ${r.errors} errors, ${r.timeouts} timeouts`);
  }
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
    console.log(
      `confirmations: ${queued} queued with the questions; ${left ? `after waiting ${MAIL_WAIT_SECONDS} s` : `all out ${waited.toFixed(1)} s after the load ended`}: ${byStatus.map((r) => `${r.status} ${r.n}`).join(", ")}`,
    );
  } finally {
    sqlite.close();
  }
}

async function main(): Promise<void> {
  await withAppServer("throughput", async ({ url, databasePath }) => {
    await pages(url);
    await questions(url, databasePath);
  });
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exitCode = 1;
});
