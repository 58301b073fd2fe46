import { spawnSync } from "node:child_process";
import { expect, test } from "vitest";

// instrumentation-client.ts turns zod's compiler off without importing zod (which would put all of
// it into every page's first load): it leaves the setting on globalThis, where zod adopts it when it
// loads. A fresh process, so that zod loads after the file as it does in the browser.
test("zod loaded after instrumentation-client.ts runs jitless", () => {
  const script = `
    await import("./instrumentation-client.ts");
    const { z } = await import("zod");
    const schema = z.object({ a: z.string() });
    schema.parse({ a: "x" });
    console.log(JSON.stringify({ jitless: z.config().jitless === true, parsed: schema.safeParse({ a: 1 }).success }));
  `;
  const run = spawnSync(process.execPath, ["--import", "tsx", "--input-type=module", "-e", script], { encoding: "utf8", timeout: 30_000 });
  expect(run.stderr).toBe("");
  expect(JSON.parse(run.stdout.trim())).toEqual({ jitless: true, parsed: false });
});
