import remarkMdx from "remark-mdx";
import remarkParse from "remark-parse";
import { unified } from "unified";
import { visit } from "unist-util-visit";

/** Components our MDX may use; anything else is a mistake the build must catch. */
export const MDX_COMPONENTS = [
  "Callout",
  "Caution",
  "Steps",
  "Step",
  "ProjectTimeline",
  "RoomFigures",
  "Co2Week",
  "SignGallery",
  "AskAboutThis",
] as const;

export class ContentError extends Error {
  constructor(
    readonly file: string,
    readonly problems: string[],
  ) {
    super(`${file}: ${problems.join("; ")}`);
    this.name = "ContentError";
  }
}

interface Node {
  type: string;
  name?: string | null;
  attributes?: { type: string; name?: string; value?: unknown }[];
  position?: { start: { line: number } };
}

/**
 * next-mdx-remote drops JavaScript in MDX silently (blockJS). Dropped words are
 * worse than a failed build, so this check refuses expressions, import/export,
 * attribute expressions and unknown components, naming the file and line.
 */
export function findMdxProblems(body: string, allowed: readonly string[] = MDX_COMPONENTS, lineOffset = 0): string[] {
  const problems: string[] = [];
  let tree;
  try {
    tree = unified().use(remarkParse).use(remarkMdx).parse(body);
  } catch (error) {
    const e = error as { message?: string; line?: number };
    return [`line ${(e.line ?? 0) + lineOffset}: MDX does not parse: ${e.message ?? String(error)}`];
  }
  visit(tree, (node: Node) => {
    const line = (node.position?.start.line ?? 0) + lineOffset;
    switch (node.type) {
      case "mdxFlowExpression":
      case "mdxTextExpression":
        problems.push(`line ${line}: a {…} JavaScript expression is not allowed in content`);
        break;
      case "mdxjsEsm":
        problems.push(`line ${line}: import/export is not allowed in content`);
        break;
      case "mdxJsxFlowElement":
      case "mdxJsxTextElement": {
        const name = node.name ?? "(fragment)";
        if (!allowed.includes(name)) problems.push(`line ${line}: unknown component <${name}>`);
        for (const attr of node.attributes ?? []) {
          if (attr.type !== "mdxJsxAttribute" || (attr.value !== null && attr.value !== undefined && typeof attr.value !== "string")) {
            problems.push(`line ${line}: <${name}> props must be plain strings, like name="value"`);
          }
        }
        break;
      }
    }
  });
  return problems;
}
