import { compileMDX } from "next-mdx-remote/rsc";
import remarkGfm from "remark-gfm";
import type { ContentPage } from "@/lib/content/files";
import { mdxComponents } from ".";

/** Renders a checked content page on the server; JavaScript in MDX stays blocked (next-mdx-remote's blockJS). */
export async function MdxBody({ page }: { page: ContentPage }) {
  const { content } = await compileMDX({
    source: page.body,
    components: mdxComponents,
    options: { mdxOptions: { remarkPlugins: [remarkGfm] } },
  });
  return <div className="max-w-prose">{content}</div>;
}
