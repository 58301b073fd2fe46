import type { ReactNode } from "react";
import type { RootContent } from "mdast";
import { parseMarkdown } from "@/lib/markdown/parse";

/** Only links that stay on the web or in mail; no javascript:, data: or other schemes. */
export function safeHref(url: string): string | null {
  const href = url.trim();
  if (href.startsWith("/") && !href.startsWith("//")) return href;
  if (href.startsWith("#")) return href;
  return /^(https?:\/\/|mailto:)/i.test(href) ? href : null;
}

const HEADINGS = ["h2", "h3", "h4", "h5", "h6"] as const;

/** `tight`: a list item's paragraphs run inline; `inline`: inside a paragraph, heading or other phrasing. */
function children(nodes: RootContent[], tight = false, inline = false): ReactNode[] {
  return nodes.map((node, i) => render(node, i, tight, inline));
}

function phrasing(nodes: RootContent[]): ReactNode[] {
  return children(nodes, false, true);
}

function render(node: RootContent, key: number, tight: boolean, inline: boolean): ReactNode {
  switch (node.type) {
    case "paragraph":
      return tight ? <span key={key}>{phrasing(node.children)}</span> : <p key={key}>{phrasing(node.children)}</p>;
    case "heading": {
      // The page's own title is the h1, so a Markdown "#" starts at h2.
      const Tag = HEADINGS[Math.min(node.depth, HEADINGS.length) - 1] ?? "h6";
      return <Tag key={key}>{phrasing(node.children)}</Tag>;
    }
    case "list": {
      const items = children(node.children, !node.spread);
      return node.ordered ? (
        <ol key={key} start={node.start ?? undefined}>
          {items}
        </ol>
      ) : (
        <ul key={key}>{items}</ul>
      );
    }
    case "listItem":
      return <li key={key}>{children(node.children, tight && !node.spread)}</li>;
    case "blockquote":
      return <blockquote key={key}>{children(node.children)}</blockquote>;
    case "code":
      return (
        <pre key={key}>
          <code>{node.value}</code>
        </pre>
      );
    case "thematicBreak":
      return <hr key={key} />;
    case "table": {
      const [head, ...body] = node.children;
      return (
        <div key={key} className="overflow-x-auto">
          <table>
            {head ? (
              <thead>
                <tr>
                  {head.children.map((cell, c) => (
                    <th key={c} scope="col">
                      {phrasing(cell.children)}
                    </th>
                  ))}
                </tr>
              </thead>
            ) : null}
            <tbody>
              {body.map((row, r) => (
                <tr key={r}>
                  {row.children.map((cell, c) => (
                    <td key={c}>{phrasing(cell.children)}</td>
                  ))}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      );
    }
    // Raw HTML is shown as the text it is, never interpreted.
    case "html":
      return tight || inline ? node.value : <p key={key}>{node.value}</p>;
    case "text":
      return node.value;
    case "emphasis":
      return <em key={key}>{phrasing(node.children)}</em>;
    case "strong":
      return <strong key={key}>{phrasing(node.children)}</strong>;
    case "delete":
      return <del key={key}>{phrasing(node.children)}</del>;
    case "inlineCode":
      return <code key={key}>{node.value}</code>;
    case "break":
      return <br key={key} />;
    case "link": {
      const href = safeHref(node.url);
      if (!href) return <span key={key}>{phrasing(node.children)}</span>;
      const external = /^https?:\/\//i.test(href);
      return (
        <a key={key} href={href} rel={external ? "nofollow noopener noreferrer" : undefined}>
          {phrasing(node.children)}
        </a>
      );
    }
    case "linkReference":
      return <span key={key}>{phrasing(node.children)}</span>;
    // No images from answer text: only their words.
    case "image":
    case "imageReference":
      return node.alt ? <span key={key}>{node.alt}</span> : null;
    case "footnoteDefinition":
      return <div key={key}>{children(node.children)}</div>;
    case "footnoteReference":
      return `[${node.label ?? node.identifier}]`;
    default:
      return null;
  }
}

/**
 * Markdown written by staff, rendered as React elements from its syntax tree: no raw HTML, no
 * scripts, no images, and only http(s), mailto and on-site links. The `prose-answer` styles live
 * in globals.css.
 */
export function Markdown({ source, className = "" }: { source: string; className?: string }) {
  return <div className={`prose-answer ${className}`}>{children(parseMarkdown(source).children)}</div>;
}
