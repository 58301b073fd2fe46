import { describe, expect, it } from "vitest";
import { ContentError, findMdxProblems } from "@/lib/content/check";
import { parseContent } from "@/lib/content/files";

const FRONT = `---
title: "A page"
summary: "A summary that is long enough to pass the check."
updated: "2026-11-20"
reviewedBy: "facilities"
topics: ["cleaning"]
---
`;

describe("MDX content check", () => {
  it("accepts plain Markdown with our components and string props", () => {
    expect(findMdxProblems(`## Heading\n\n<Caution title="Never mix">\n\nText.\n\n</Caution>\n\n<AskAboutThis school="district" topic="cleaning" />\n`)).toEqual([]);
  });

  it.each([
    ["an expression in text", "Two plus two is {2 + 2}.", /JavaScript expression/],
    ["an expression block", "{console.log('x')}", /JavaScript expression/],
    ["an import", 'import x from "y"\n\nText', /import\/export/],
    ["an attribute expression", "<Callout title={danger} />", /plain strings/],
    ["an unknown component", '<Marquee text="hi" />', /unknown component <Marquee>/],
    ["raw HTML element", "<script>alert(1)</script>", /unknown component <script>/],
  ])("refuses %s", (_name, body, message) => {
    const problems = findMdxProblems(body);
    expect(problems.join("\n")).toMatch(message);
  });

  it("names the file and the line in the file, counting the frontmatter", () => {
    try {
      parseContent(`${FRONT}\nFine line.\n\nBad {1} line.\n`, "content/district/bad.mdx");
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(ContentError);
      expect((error as Error).message).toMatch(/^content\/district\/bad\.mdx: line 11: /);
    }
  });

  it("refuses frontmatter that breaks the content model", () => {
    const bad = FRONT.replace('"facilities"', '"the janitor"').replace('updated: "2026-11-20"', "updated: yesterday");
    expect(() => parseContent(`${bad}\nText.\n`, "content/x.mdx")).toThrow(/reviewedBy[\s\S]*|updated/);
  });
});
