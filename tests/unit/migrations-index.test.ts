import { readdirSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { MIGRATIONS } from "@/migrations";

describe("migrations/index.ts", () => {
  it("lists every numbered migration file, in order", () => {
    const files = readdirSync(join(__dirname, "../../migrations"))
      .filter((f) => /^\d{4}_.+\.ts$/.test(f))
      .map((f) => f.replace(/\.ts$/, ""))
      .sort();
    expect(Object.keys(MIGRATIONS)).toEqual(files);
  });
});
