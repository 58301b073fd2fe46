import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { Markdown, safeHref } from "@/components/ui/markdown";
import { markdownExcerpt, markdownToPlainText } from "@/lib/markdown/parse";

const html = (source: string) => renderToStaticMarkup(createElement(Markdown, { source }));

describe("Markdown", () => {
  it("renders paragraphs, emphasis, lists and on-site links", () => {
    const out = html("Clean **first**, then *disinfect*.\n\n- door handles\n- railings\n\nSee [the cleaning page](/district/cleaning-and-disinfection).");
    expect(out).toContain("<p>Clean <strong>first</strong>, then <em>disinfect</em>.</p>");
    expect(out).toContain("<ul><li><span>door handles</span></li><li><span>railings</span></li></ul>");
    expect(out).toContain('<a href="/district/cleaning-and-disinfection">the cleaning page</a>');
  });

  it("shows raw HTML as text and never runs it", () => {
    const out = html('Hello <b onclick="x()">there</b>\n\n<script>alert(1)</script>\n\n<img src=x onerror=alert(1)>');
    expect(out).not.toMatch(/<(script|b|img)[\s>]/i);
    expect(out).not.toMatch(/\sonclick="/);
    expect(out).toContain("<p>Hello &lt;b onclick=&quot;x()&quot;&gt;there&lt;/b&gt;</p>");
    expect(out).toContain("&lt;script&gt;alert(1)&lt;/script&gt;");
  });

  it("drops dangerous links and images, keeping their words", () => {
    const out = html("[click](javascript:alert(1)) [data](data:text/html,hi) ![a chart](https://example.org/x.png) [ok](https://example.org/a)");
    expect(out).not.toMatch(/javascript:|data:|<img/);
    expect(out).toContain("<span>click</span>");
    expect(out).toContain("<span>a chart</span>");
    expect(out).toContain('<a href="https://example.org/a" rel="nofollow noopener noreferrer">ok</a>');
  });

  it("starts headings below the page's own h1", () => {
    expect(html("# Title\n\n## Part")).toBe('<div class="prose-answer "><h2>Title</h2><h3>Part</h3></div>');
  });

  it("allows only web, mail and on-site addresses", () => {
    expect(safeHref("/ask")).toBe("/ask");
    expect(safeHref("//evil.example.com")).toBeNull();
    expect(safeHref(" JavaScript:alert(1)")).toBeNull();
    expect(safeHref("mailto:desk@example.org")).toBe("mailto:desk@example.org");
  });
});

describe("plain text", () => {
  it("gives the words without markup, and a short excerpt", () => {
    expect(markdownToPlainText("**Bold** and [a link](/x).\n\n- one\n- two")).toBe("Bold and a link.\n\none\n\ntwo");
    const long = `${"word ".repeat(60)}end.`;
    const excerpt = markdownExcerpt(long, 40);
    expect(excerpt.length).toBeLessThanOrEqual(40);
    expect(excerpt.endsWith("…")).toBe(true);
  });
});
