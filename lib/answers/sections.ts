import remarkGfm from "remark-gfm";
import remarkMdx from "remark-mdx";
import remarkParse from "remark-parse";
import { unified } from "unified";
import { DISTRICT_TOPICS } from "@/lib/content/district-topics";
import { promises as fs } from "node:fs";
import path from "node:path";
import { CONTENT_DIR, headingId, parseContent, type ContentPage } from "@/lib/content/files";
import { SCHOOL_TOPICS } from "@/lib/content/topics";
import type { SearchIndexInput } from "./search";

/** One content page cut into the parts the search shows on their own, by heading. */
export type PageSections = SearchIndexInput["pages"][number];

interface Node {
  type: string;
  value?: unknown;
  depth?: number;
  children?: Node[];
  attributes?: { type: string; name?: string; value?: unknown }[];
}

const SLUG = /^[a-z0-9]+(?:-[a-z0-9]+)*$/;
const parser = unified().use(remarkParse).use(remarkGfm).use(remarkMdx);

/** The words of a node. A component's string `title` counts (a Caution's title is read as a heading). */
function textOf(node: Node): string {
  if (node.type === "text" || node.type === "inlineCode") return String(node.value ?? "");
  if (node.type === "break") return " ";
  const parts: string[] = [];
  if (node.type === "mdxJsxFlowElement" || node.type === "mdxJsxTextElement") {
    for (const attr of node.attributes ?? []) if (attr.name === "title" && typeof attr.value === "string") parts.push(attr.value);
  }
  for (const child of node.children ?? []) parts.push(textOf(child));
  const block = ["paragraph", "heading", "listItem", "tableRow", "tableCell", "mdxJsxFlowElement", "blockquote"].includes(node.type);
  return parts.join(block ? " " : "") + (block ? " " : "");
}

/**
 * The id the page's renderer gives a heading (components/mdx/index.tsx): headingId of the
 * heading's plain text children, so a result can link straight to `page#id`.
 */
function anchorOf(heading: Node): string {
  const text = (heading.children ?? [])
    .filter((c) => c.type === "text")
    .map((c) => String(c.value ?? ""))
    .join("");
  return headingId(text);
}

/**
 * Splits an MDX body at its ## and ### headings. The words before the first heading become a
 * part of their own under the page title. Components with no words of their own (figures,
 * timelines) add nothing.
 */
export function splitSections(page: ContentPage): { heading: string; anchor: string; text: string }[] {
  const tree = parser.parse(page.body) as Node;
  const out: { heading: string; anchor: string; text: string }[] = [{ heading: page.frontmatter.title, anchor: "", text: "" }];
  for (const node of tree.children ?? []) {
    if (node.type === "heading" && (node.depth ?? 0) <= 3) {
      out.push({ heading: textOf(node).replace(/\s+/g, " ").trim(), anchor: anchorOf(node), text: "" });
      continue;
    }
    const current = out[out.length - 1]!;
    current.text = `${current.text} ${textOf(node)}`;
  }
  return out.map((s) => ({ ...s, text: s.text.replace(/\s+/g, " ").trim() })).filter((s) => s.anchor || s.text);
}

interface Cached {
  source: string;
  page: PageSections;
}

const cache = new Map<string, Cached>();
let lastList: PageSections[] = [];

/** A page's sections, parsed again only when its file changed (parsing MDX is the slow part). */
async function sectionsOf(relative: string, url: string, school: string | null, topics: (page: ContentPage) => string[]): Promise<PageSections | null> {
  let source: string;
  try {
    source = await fs.readFile(path.join(CONTENT_DIR, relative), "utf8");
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code === "ENOENT") return null;
    throw error;
  }
  const hit = cache.get(relative);
  if (hit && hit.source === source) return hit.page;
  const content = parseContent(source, path.join("content", relative));
  const page: PageSections = { title: content.frontmatter.title, url, school, topics: topics(content), day: content.frontmatter.updated, sections: splitSections(content) };
  cache.set(relative, { source, page });
  return page;
}

/** Every routed content page (district pages, then each school's pages), cut into sections. */
export async function loadContentSections(schoolSlugs: readonly string[]): Promise<PageSections[]> {
  const out: PageSections[] = [];
  for (const t of DISTRICT_TOPICS) {
    const page = await sectionsOf(path.join("district", `${t.slug}.mdx`), `/district/${t.slug}`, null, (c) => c.frontmatter.topics);
    if (page) out.push(page);
  }
  for (const school of schoolSlugs) {
    if (!SLUG.test(school)) continue;
    for (const t of SCHOOL_TOPICS) {
      const page = await sectionsOf(path.join("schools", school, `${t.slug}.mdx`), `/schools/${school}/${t.slug}`, school, (c) => [
        ...new Set([t.askTopic, ...c.frontmatter.topics]),
      ]);
      if (page) out.push(page);
    }
  }
  // The same list object while nothing changed, so its fingerprint is worked out once.
  if (out.length === lastList.length && out.every((p, i) => p === lastList[i])) return lastList;
  lastList = out;
  return out;
}
