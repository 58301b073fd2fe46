import type { Root, RootContent } from "mdast";
import remarkGfm from "remark-gfm";
import remarkParse from "remark-parse";
import { unified } from "unified";

const parser = unified().use(remarkParse).use(remarkGfm);

/** Markdown as a syntax tree (CommonMark plus tables, strikethrough and bare links). Raw HTML stays an inert `html` node. */
export function parseMarkdown(markdown: string): Root {
  return parser.parse(markdown);
}

function textOf(node: RootContent | Root): string {
  if ("value" in node && typeof node.value === "string") return node.type === "html" ? "" : node.value;
  if (node.type === "image") return node.alt ?? "";
  if (node.type === "break") return " ";
  if ("children" in node) return (node.children as RootContent[]).map(textOf).join("");
  return "";
}

/** The words of a Markdown text without its markup, one block per paragraph. */
export function markdownToPlainText(markdown: string): string {
  const blocks: string[] = [];
  const walk = (nodes: RootContent[]) => {
    for (const node of nodes) {
      if (node.type === "list" || node.type === "listItem" || node.type === "blockquote") walk(node.children as RootContent[]);
      else {
        const text = textOf(node).replace(/\s+/g, " ").trim();
        if (text) blocks.push(text);
      }
    }
  };
  walk(parseMarkdown(markdown).children);
  return blocks.join("\n\n");
}

/** The opening words of a Markdown text, cut at a word boundary. */
export function markdownExcerpt(markdown: string, maxLength = 160): string {
  const first = markdownToPlainText(markdown).split("\n\n")[0] ?? "";
  if (first.length <= maxLength) return first;
  const cut = first.slice(0, maxLength - 1);
  const space = cut.lastIndexOf(" ");
  return `${(space > maxLength / 2 ? cut.slice(0, space) : cut).replace(/[\s,;:.]+$/, "")}…`;
}
