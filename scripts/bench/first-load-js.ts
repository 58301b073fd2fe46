// First-load JavaScript of each public route as a browser receives it from `next start`: every
// script the HTML makes the browser fetch (<script src>, modulepreload and preload-as-script
// links; nomodule scripts are skipped, as a modern browser skips them), each fetched with the
// browser's Accept-Encoding and counted as transferred (compressed body bytes, 1 kB = 1,000 bytes).
// The floor is an empty static page of the same build. Targets: content pages within 15 kB of
// the floor; the answers page (search and filters) and the ask form within 40 kB.
import { mkdirSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { BENCH_DIR, FLOOR_PATH, withAppServer } from "./lib/app-server";
import { fmtKb, getRaw, kB } from "./lib/http";
import { printTable } from "./lib/table";

const CONTENT_ALLOWANCE_KB = 15;
const INTERACTIVE_ALLOWANCE_KB = 40;

interface Route {
  route: string;
  path: string | (() => Promise<string | null>);
  /** kB allowed above the floor; null for the floor itself. */
  allowanceKb: number | null;
}

interface Measured {
  route: string;
  path: string;
  status: number;
  htmlWireBytes: number;
  scripts: { url: string; wireBytes: number; bytes: number; encoding: string }[];
  jsWireBytes: number;
  jsBytes: number;
  allowanceKb: number | null;
}

function attributes(tag: string): Map<string, string> {
  const attrs = new Map<string, string>();
  for (const m of tag.matchAll(/([a-zA-Z_:][-a-zA-Z0-9_:.]*)(?:\s*=\s*(?:"([^"]*)"|'([^']*)'|([^\s"'=<>`]+)))?/g)) {
    const name = m[1];
    if (!name) continue;
    attrs.set(name.toLowerCase(), (m[2] ?? m[3] ?? m[4] ?? "").replace(/&amp;/g, "&"));
  }
  return attrs;
}

/** The scripts a browser fetches on first load of this HTML, in document order, without duplicates. */
export function firstLoadScripts(html: string, pageUrl: string): string[] {
  const found: string[] = [];
  for (const m of html.matchAll(/<(script|link)\b([^>]*)>/gi)) {
    const tag = (m[1] ?? "").toLowerCase();
    const attrs = attributes(m[2] ?? "");
    let src: string | undefined;
    if (tag === "script" && attrs.has("src") && !attrs.has("nomodule")) src = attrs.get("src");
    if (tag === "link") {
      const rel = (attrs.get("rel") ?? "").toLowerCase().split(/\s+/);
      if (rel.includes("modulepreload") || (rel.includes("preload") && attrs.get("as") === "script")) src = attrs.get("href");
    }
    if (!src) continue;
    const url = new URL(src, pageUrl).toString();
    if (!found.includes(url)) found.push(url);
  }
  return found;
}

async function measure(base: string, route: string, path: string, allowanceKb: number | null): Promise<Measured> {
  const page = await getRaw(`${base}${path}`);
  const result: Measured = { route, path, status: page.status, htmlWireBytes: page.wireBytes, scripts: [], jsWireBytes: 0, jsBytes: 0, allowanceKb };
  if (page.status !== 200) return result;
  const urls = firstLoadScripts(page.body.toString("utf8"), `${base}${path}`).filter((u) => u.startsWith(base));
  for (const url of urls) {
    const res = await getRaw(url);
    if (res.status !== 200) throw new Error(`${path}: its script ${url} answered ${res.status}`);
    result.scripts.push({ url: url.slice(base.length), wireBytes: res.wireBytes, bytes: res.body.length, encoding: res.encoding });
  }
  result.jsWireBytes = result.scripts.reduce((sum, s) => sum + s.wireBytes, 0);
  result.jsBytes = result.scripts.reduce((sum, s) => sum + s.bytes, 0);
  return result;
}

async function firstPublishedAnswer(base: string): Promise<string | null> {
  const res = await fetch(`${base}/api/answers/suggestions`);
  if (!res.ok) return null;
  const data = (await res.json()) as { answers?: { url?: string }[] };
  return data.answers?.[0]?.url ?? null;
}

async function main(): Promise<void> {
  await withAppServer("first-load-js", async ({ url: base }) => {
    const routes: Route[] = [
      { route: `${FLOOR_PATH} (floor)`, path: FLOOR_PATH, allowanceKb: null },
      { route: "/", path: "/", allowanceKb: CONTENT_ALLOWANCE_KB },
      { route: "/schools", path: "/schools", allowanceKb: CONTENT_ALLOWANCE_KB },
      { route: "/schools/[school]", path: "/schools/tamsin-creek", allowanceKb: CONTENT_ALLOWANCE_KB },
      { route: "/schools/[school]/[topic]", path: "/schools/tamsin-creek/air", allowanceKb: CONTENT_ALLOWANCE_KB },
      { route: "/district/[page]", path: "/district/first-day-back", allowanceKb: CONTENT_ALLOWANCE_KB },
      { route: "/answers/[id]", path: () => firstPublishedAnswer(base), allowanceKb: CONTENT_ALLOWANCE_KB },
      { route: "/ask", path: "/ask", allowanceKb: INTERACTIVE_ALLOWANCE_KB },
      { route: "/answers", path: "/answers", allowanceKb: INTERACTIVE_ALLOWANCE_KB },
    ];

    const measured: Measured[] = [];
    const skipped: string[] = [];
    for (const r of routes) {
      const path = typeof r.path === "string" ? r.path : await r.path();
      if (!path) {
        skipped.push(`${r.route}: no published answer to measure`);
        continue;
      }
      // Once to let an ISR page settle, then the measured load.
      await getRaw(`${base}${path}`);
      measured.push(await measure(base, r.route, path, r.allowanceKb));
    }

    const floor = measured[0];
    if (!floor || floor.status !== 200) throw new Error(`the floor page ${FLOOR_PATH} answered ${floor?.status}; is it in the build?`);
    const encodings = new Set(measured.flatMap((m) => m.scripts.map((s) => s.encoding)));
    const floorScripts = new Set(floor.scripts.map((s) => s.url));

    const rows = measured.map((m) => {
      if (m.status !== 200) return [m.route, m.path, "—", `status ${m.status}: not measured`, "", "", "", "✗ missing"];
      const over = kB(m.jsWireBytes - floor.jsWireBytes);
      const target = m.allowanceKb === null ? "" : `≤ floor + ${m.allowanceKb} kB`;
      const mark = m.allowanceKb === null ? "" : over <= m.allowanceKb ? "✓" : "✗ over";
      return [
        m.route,
        m.path,
        String(m.scripts.length),
        fmtKb(m.jsWireBytes),
        m === floor ? "" : `${over >= 0 ? "+" : ""}${over.toFixed(1)} kB`,
        target,
        fmtKb(m.htmlWireBytes),
        mark,
      ];
    });
    console.log(`\nFirst-load JavaScript per route, as transferred (${[...encodings].join(", ")}; 1 kB = 1,000 bytes)`);
    printTable(["route", "measured", "scripts", "first-load JS", "vs floor", "target", "HTML", "result"], rows);
    for (const s of skipped) console.log(`not measured: ${s}`);

    for (const m of measured) {
      if (m.status !== 200 || m.allowanceKb === null) continue;
      if (kB(m.jsWireBytes - floor.jsWireBytes) <= m.allowanceKb) continue;
      const extra = m.scripts.filter((s) => !floorScripts.has(s.url)).sort((a, b) => b.wireBytes - a.wireBytes);
      console.log(`\n${m.route} is over its target; scripts the floor does not load:`);
      for (const s of extra) console.log(`  ${fmtKb(s.wireBytes).padStart(9)}  (${fmtKb(s.bytes)} decoded)  ${s.url}`);
    }

    mkdirSync(BENCH_DIR, { recursive: true });
    const out = join(BENCH_DIR, "first-load-js.json");
    writeFileSync(out, JSON.stringify({ measuredAt: new Date().toISOString(), floor: FLOOR_PATH, routes: measured }, null, 2));
    console.log(`\nevery script per route: ${out}`);
  });
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exitCode = 1;
});
