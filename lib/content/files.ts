import { promises as fs } from "node:fs";
import path from "node:path";
import { parse as parseYaml } from "yaml";
import { ContentError, findMdxProblems } from "./check";
import { frontmatterSchema, type Frontmatter } from "./frontmatter";

// CLEARHALL_CONTENT_DIR lets the content check run over a scratch folder in tests.
export const CONTENT_DIR = process.env.CLEARHALL_CONTENT_DIR ?? path.join(process.cwd(), "content");

export interface ContentPage {
  /** Path relative to the project, for messages. */
  file: string;
  frontmatter: Frontmatter;
  body: string;
  headings: { depth: number; text: string; id: string }[];
}

const FRONTMATTER = /^---\r?\n([\s\S]*?)\r?\n---\r?\n?/;

export function headingId(text: string): string {
  return text
    .toLowerCase()
    .replace(/[^a-z0-9\s-]/g, "")
    .trim()
    .replace(/\s+/g, "-");
}

/** Splits, validates and checks one MDX source; throws ContentError naming the file. */
export function parseContent(source: string, file: string): ContentPage {
  const match = FRONTMATTER.exec(source);
  if (!match) throw new ContentError(file, ["missing frontmatter between --- lines"]);
  let data: unknown;
  try {
    data = parseYaml(match[1]!);
  } catch (error) {
    throw new ContentError(file, [`frontmatter is not valid YAML: ${(error as Error).message}`]);
  }
  const fm = frontmatterSchema.safeParse(data);
  const problems = fm.success ? [] : fm.error.issues.map((i) => `frontmatter ${i.path.join(".")}: ${i.message}`);
  const body = source.slice(match[0].length);
  const lineOffset = match[0].split("\n").length - 1;
  problems.push(...findMdxProblems(body, undefined, lineOffset));
  if (problems.length || !fm.success) throw new ContentError(file, problems);
  const headings = [...body.matchAll(/^(#{2,3})\s+(.+)$/gm)].map((m) => ({
    depth: m[1]!.length,
    text: m[2]!.trim(),
    id: headingId(m[2]!.trim()),
  }));
  return { file, frontmatter: fm.data, body, headings };
}

async function readContent(relative: string): Promise<ContentPage | null> {
  const full = path.join(CONTENT_DIR, relative);
  let source: string;
  try {
    source = await fs.readFile(full, "utf8");
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code === "ENOENT") return null;
    throw error;
  }
  return parseContent(source, path.join("content", relative));
}

const SLUG = /^[a-z0-9]+(?:-[a-z0-9]+)*$/;

export function districtPage(slug: string): Promise<ContentPage | null> {
  return SLUG.test(slug) ? readContent(path.join("district", `${slug}.mdx`)) : Promise.resolve(null);
}

export function schoolPage(school: string, topic: string): Promise<ContentPage | null> {
  return SLUG.test(school) && SLUG.test(topic) ? readContent(path.join("schools", school, `${topic}.mdx`)) : Promise.resolve(null);
}

export async function listContentFiles(): Promise<string[]> {
  const out: string[] = [];
  async function walk(dir: string) {
    for (const entry of await fs.readdir(dir, { withFileTypes: true })) {
      const full = path.join(dir, entry.name);
      if (entry.isDirectory()) await walk(full);
      else if (entry.name.endsWith(".mdx")) out.push(path.relative(CONTENT_DIR, full));
    }
  }
  await walk(CONTENT_DIR);
  return out.sort();
}

export async function loadContentFile(relative: string): Promise<ContentPage> {
  const page = await readContent(relative);
  if (!page) throw new ContentError(path.join("content", relative), ["file not found"]);
  return page;
}
