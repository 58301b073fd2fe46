import { spawnSync } from "node:child_process";
import { cpSync, mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, describe, expect, it } from "vitest";

// `npm run build` runs this check before `next build`; a non-zero exit stops the build.
const scratch = mkdtempSync(join(tmpdir(), "clearhall-content-"));
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

function check(dir: string) {
  return spawnSync("npx", ["tsx", "scripts/check-content.ts"], {
    env: { ...process.env, CLEARHALL_CONTENT_DIR: dir },
    encoding: "utf8",
  });
}

describe("the build's content check", () => {
  it("passes over the real content/ folder", () => {
    const result = check(join(process.cwd(), "content"));
    expect(result.status, result.stderr).toBe(0);
    expect(result.stdout).toMatch(/13 MDX files/);
  });

  it("fails on an expression or an unknown component, naming the file", () => {
    cpSync(join(process.cwd(), "content"), scratch, { recursive: true });
    const file = join(scratch, "district", "cleaning-and-disinfection.mdx");
    writeFileSync(file, `---\ntitle: "Broken"\nsummary: "This page has a JavaScript expression in it."\nupdated: "2026-11-20"\nreviewedBy: "facilities"\ntopics: ["cleaning"]\n---\n\nSpray {strength} times.\n\n<Blink />\n`);
    const result = check(scratch);
    expect(result.status).toBe(1);
    expect(result.stderr).toContain("content/district/cleaning-and-disinfection.mdx: line 9: a {…} JavaScript expression is not allowed");
    expect(result.stderr).toContain("content/district/cleaning-and-disinfection.mdx: line 11: unknown component <Blink>");
  });
});
