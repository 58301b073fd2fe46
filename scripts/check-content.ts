// Run before every build: a content file with JavaScript, an unknown component or bad
// frontmatter stops the build with a message naming the file, instead of being dropped silently.
import { ContentError } from "@/lib/content/check";
import { CONTENT_DIR, listContentFiles, loadContentFile } from "@/lib/content/files";

async function main(): Promise<void> {
  const files = await listContentFiles();
  const failures: string[] = [];
  for (const file of files) {
    try {
      await loadContentFile(file);
    } catch (error) {
      if (!(error instanceof ContentError)) throw error;
      failures.push(...error.problems.map((p) => `  ${error.file}: ${p}`));
    }
  }
  if (failures.length) {
    console.error(`Content check failed:\n${failures.join("\n")}`);
    process.exitCode = 1;
    return;
  }
  console.log(`Content check: ${files.length} MDX files in ${CONTENT_DIR} are fine.`);
}

void main();
