// Lighthouse performance and accessibility scores of the home page, a school page and the answers
// page, in Debian's chromium (headless), against `next start` on loopback, beside the empty static
// page of the same build (the framework's floor on this machine). Two standard presets:
// Lighthouse's default, a phone (simulated slow 4G, CPU slowed 4×), and its desktop preset
// (simulated 10 Mbps, no CPU slowdown). Target: 95+ for both scores.
//
// The phone preset slows the host's CPU by a fixed factor, so its performance score falls with a
// slow or busy host: the BenchmarkIndex printed with it is Lighthouse's own measure of the host
// (a mid-range phone is about 1,000), and the floor's score shows what the framework alone gets.
import { spawn, type ChildProcess } from "node:child_process";
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { BENCH_DIR, FLOOR_PATH, withAppServer } from "./lib/app-server";
import { printTable } from "./lib/table";

const CHROMIUM = process.env.CHROME_PATH ?? "/usr/bin/chromium";
const TARGET = 95;
const PAGES = [
  { name: "floor (empty page)", path: FLOOR_PATH, reference: true },
  { name: "home", path: "/", reference: false },
  { name: "school page", path: "/schools/tamsin-creek", reference: false },
  { name: "answers page", path: "/answers", reference: false },
];
// ../shared/STACK.md item 10 and 12: what keeps Debian's chromium quiet as root here.
const CHROME_FLAGS = [
  "--headless=new",
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--no-default-browser-check",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
  "--disable-dev-shm-usage",
];

interface Browser {
  port: number;
  stop(): Promise<void>;
}

/** Starts chromium with a fresh profile and a DevTools port, in its own process group. */
function startChromium(): Promise<Browser> {
  const profile = mkdtempSync(join(tmpdir(), "clearhall-lh-"));
  const child: ChildProcess = spawn(CHROMIUM, [...CHROME_FLAGS, "--remote-debugging-port=0", `--user-data-dir=${profile}`, "about:blank"], {
    stdio: ["ignore", "ignore", "pipe"],
    detached: true,
  });
  const stop = () =>
    new Promise<void>((done) => {
      const finish = () => {
        rmSync(profile, { recursive: true, force: true });
        done();
      };
      if (child.exitCode !== null || child.signalCode !== null || child.pid === undefined) return finish();
      const force = setTimeout(() => child.pid !== undefined && process.kill(-child.pid, "SIGKILL"), 5_000);
      child.once("exit", () => {
        clearTimeout(force);
        finish();
      });
      process.kill(-child.pid, "SIGTERM");
    });
  process.on("exit", () => {
    if (child.pid !== undefined && child.exitCode === null) {
      try {
        process.kill(-child.pid, "SIGKILL");
      } catch {
        // already gone
      }
    }
  });
  return new Promise((resolve, reject) => {
    let stderr = "";
    const timer = setTimeout(() => {
      void stop();
      reject(new Error(`chromium did not open its DevTools port within 30 s:\n${stderr.slice(-2000)}`));
    }, 30_000);
    child.on("error", (error) => {
      clearTimeout(timer);
      reject(new Error(`could not start ${CHROMIUM}: ${error.message} (install it with: apt-get install -y chromium)`));
    });
    child.stderr?.on("data", (chunk: Buffer) => {
      stderr += chunk.toString();
      const m = /DevTools listening on ws:\/\/[^:]+:(\d+)\//.exec(stderr);
      if (m?.[1]) {
        clearTimeout(timer);
        resolve({ port: Number(m[1]), stop });
      }
    });
  });
}

const score = (s: number | null | undefined) => (typeof s === "number" ? Math.round(s * 100) : null);

async function main(): Promise<void> {
  const { default: lighthouse, desktopConfig } = await import("lighthouse");
  const presets = [
    { name: "phone (default)", config: undefined },
    { name: "desktop", config: desktopConfig },
  ];
  await withAppServer("lighthouse", async ({ url: base }) => {
    const pages: typeof PAGES = [];
    const rows: string[][] = [];
    const notes: string[] = [];
    for (const page of PAGES) {
      // A page not (yet) in the build is reported, not scored: Lighthouse would score the 404 page.
      const probe = await fetch(`${base}${page.path}`);
      await probe.arrayBuffer();
      if (probe.status === 200) pages.push(page);
      else rows.push([page.name, page.path, "all", "—", "—", "", "", "", "", "", `✗ status ${probe.status}: not measured`]);
    }
    for (const preset of presets) {
      for (const page of pages) {
        const url = `${base}${page.path}`;
        let lhr;
        // A trace that failed to record (NO_FCP, NO_NAVSTART on a busy host) gets one more try.
        for (let attempt = 0; attempt < 2 && (!lhr || lhr.runtimeError); attempt += 1) {
          const browser = await startChromium();
          try {
            const flags = { port: browser.port, output: "json" as const, logLevel: "error" as const, onlyCategories: ["performance", "accessibility"] };
            const result = await lighthouse(url, flags, preset.config);
            lhr = result?.lhr;
          } finally {
            await browser.stop();
          }
        }
        if (!lhr) throw new Error(`Lighthouse returned no result for ${url}`);
        const file = `lighthouse-${preset.config ? "desktop" : "phone"}-${page.name.replace(/\W+/g, "-").replace(/-$/, "")}.json`;
        writeFileSync(join(BENCH_DIR, file), JSON.stringify(lhr, null, 2));
        if (lhr.runtimeError) notes.push(`${page.path} (${preset.name}): Lighthouse runtime error ${lhr.runtimeError.code}: ${lhr.runtimeError.message}`);

        const perf = score(lhr.categories.performance?.score);
        const a11y = score(lhr.categories.accessibility?.score);
        const metric = (id: string) => lhr.audits[id]?.displayValue ?? "—";
        const summary = lhr.audits["resource-summary"]?.details;
        const scriptBytes =
          summary && "items" in summary
            ? (summary.items as { resourceType?: string; transferSize?: number }[]).find((i) => i.resourceType === "script")?.transferSize
            : undefined;
        const pass = perf !== null && a11y !== null && perf >= TARGET && a11y >= TARGET;
        rows.push([
          page.name,
          page.path,
          preset.name,
          String(perf ?? "—"),
          String(a11y ?? "—"),
          metric("first-contentful-paint"),
          metric("largest-contentful-paint"),
          metric("total-blocking-time"),
          scriptBytes === undefined ? "—" : `${(scriptBytes / 1000).toFixed(1)} kB`,
          String(Math.round(lhr.environment.benchmarkIndex)),
          page.reference ? "(reference)" : pass ? "✓" : "✗ under",
        ]);
        if (page.reference) continue;
        for (const [category, value] of [["performance", perf], ["accessibility", a11y]] as const) {
          if (value === null || value >= TARGET) continue;
          const refs = lhr.categories[category]?.auditRefs ?? [];
          const failing = refs
            .map((ref) => lhr.audits[ref.id])
            .filter((a) => a && a.score !== null && a.score < 0.9 && a.scoreDisplayMode !== "informative")
            .map((a) => `    ${a?.id}: ${a?.title}${a?.displayValue ? ` (${a.displayValue})` : ""}`);
          notes.push(`${page.path} (${preset.name}) ${category} ${value}; audits that cost points:\n${failing.join("\n") || "    (none under 0.9)"}`);
        }
      }
    }
    console.log(`\nLighthouse 12 in ${CHROMIUM}; phone = default settings (simulated slow 4G, CPU slowed 4×), desktop = its desktop preset; target ${TARGET}+ for both scores`);
    printTable(["page", "path", "preset", "performance", "accessibility", "FCP", "LCP", "TBT", "scripts (transfer)", "BenchmarkIndex", "result"], rows);
    for (const n of notes) console.log(n);
    console.log(`\nfull reports: ${join(BENCH_DIR, "lighthouse-*.json")}`);
  });
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exitCode = 1;
});
