import { readFileSync } from "node:fs";
import { resolve } from "node:path";
import { describe, expect, it } from "vitest";
import { contrastRatio, relativeLuminance } from "@/lib/contrast";
import config from "@/tailwind.config";

// Source for every check in this file: WCAG 2.1, definition of relative luminance and contrast
// ratio (https://www.w3.org/TR/WCAG21/#dfn-relative-luminance, #dfn-contrast-ratio): each sRGB
// channel c/255 is divided by 12.92 at or below 0.03928, else ((c + 0.055) / 1.055) ^ 2.4;
// L = 0.2126 R + 0.7152 G + 0.0722 B; the ratio is (L1 + 0.05) / (L2 + 0.05), lighter over darker.
// Thresholds: SC 1.4.3 (text, 4.5:1) and SC 1.4.11 (user-interface parts and focus indicators, 3:1).

type Palette = Record<string, Record<string, string>>;
const PALETTE = config.theme!.extend!.colors as Palette;

/** A Tailwind colour name as the classes use it ("ink", "harbour-soft", "white") to its hex value. */
function token(name: string): string {
  if (name === "white") return "#ffffff";
  if (name === "black") return "#000000";
  const [family, shade = "DEFAULT"] = name.split("-") as [string, string?];
  const hex = PALETTE[family]?.[shade];
  if (!hex) throw new Error(`no colour ${name} in tailwind.config.ts`);
  return hex;
}

const CSS = readFileSync(resolve(__dirname, "../../app/globals.css"), "utf8");

/** The declarations of the rule whose selector list holds `selector` (alone or with others). */
function rule(selector: string): string {
  const escaped = selector.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");
  const match = new RegExp(`(^|[\\s,])${escaped}\\s*[,{]`, "m").exec(CSS);
  if (!match) throw new Error(`no "${selector}" rule in app/globals.css`);
  const open = CSS.indexOf("{", match.index);
  return CSS.slice(open, CSS.indexOf("}", open));
}

describe("lib/contrast follows the WCAG 2.1 definitions", () => {
  it("gives white a luminance of 1, black 0, and each primary its coefficient", () => {
    expect(relativeLuminance("#ffffff")).toBeCloseTo(1, 12);
    expect(relativeLuminance("#000000")).toBe(0);
    expect(relativeLuminance("#ff0000")).toBeCloseTo(0.2126, 12);
    expect(relativeLuminance("#00ff00")).toBeCloseTo(0.7152, 12);
    expect(relativeLuminance("#0000ff")).toBeCloseTo(0.0722, 12);
  });

  it("uses the straight segment at or below 0.03928 and the power curve above it", () => {
    // 10/255 = 0.03922 → 0.03922 / 12.92; 11/255 = 0.04314 → ((0.04314 + 0.055) / 1.055) ^ 2.4.
    expect(relativeLuminance("#0a0a0a")).toBeCloseTo(0.0030353, 7);
    expect(relativeLuminance("#0b0b0b")).toBeCloseTo(0.0033465, 7);
    expect(relativeLuminance("#777777")).toBeCloseTo(0.184475, 6);
  });

  it("gives black on white 21:1, #767676 on white 4.54:1 (passes AA) and #777777 on white 4.48:1 (fails AA)", () => {
    expect(contrastRatio("#000000", "#ffffff")).toBeCloseTo(21, 10);
    expect(contrastRatio("#ffffff", "#000000")).toBeCloseTo(21, 10);
    expect(contrastRatio("#767676", "#ffffff")).toBeCloseTo(4.54, 2);
    expect(contrastRatio("#777777", "#ffffff")).toBeCloseTo(4.48, 2);
    expect(contrastRatio("#777777", "#ffffff")).toBeLessThan(4.5);
    expect(contrastRatio("#1d3a5f", "#1d3a5f")).toBe(1);
  });

  it("refuses a colour that is not #rrggbb", () => {
    expect(() => relativeLuminance("#fff")).toThrow(/Not a #rrggbb colour/);
    expect(() => relativeLuminance("harbour")).toThrow(/Not a #rrggbb colour/);
  });
});

// Every text colour on every background it sits on, as the components use them.
const TEXT_PAIRS: [use: string, text: string, background: string][] = [
  ["body text on the page", "ink", "paper"],
  ["body text in the header, footer and asides", "ink", "paper-deep"],
  ["body text in cards and form boxes", "ink", "white"],
  ["body text in notes and callouts", "ink", "harbour-soft"],
  ["body text in cautions and error summaries", "ink", "ember-soft"],
  ["body text in done notices", "ink", "leaf-soft"],
  ["secondary text (hints, dates) on the page", "ink-soft", "paper"],
  ["secondary text in the header and footer", "ink-soft", "paper-deep"],
  ["secondary text in cards", "ink-soft", "white"],
  ["secondary text in notes", "ink-soft", "harbour-soft"],
  ["links on the page", "harbour", "paper"],
  ["links in the header, footer and asides", "harbour", "paper-deep"],
  ["links in cards", "harbour", "white"],
  ["links in notes and callouts", "harbour", "harbour-soft"],
  ["links in cautions", "harbour", "ember-soft"],
  ["links in done notices", "harbour", "leaf-soft"],
  ["headings on the page", "harbour-deep", "paper"],
  ["headings in asides", "harbour-deep", "paper-deep"],
  ["headings in cards", "harbour-deep", "white"],
  ["callout titles", "harbour-deep", "harbour-soft"],
  ["main navigation and staff header links on harbour", "paper", "harbour"],
  ["primary button text", "paper", "harbour"],
  ["primary button text, hovered", "paper", "harbour-deep"],
  ["secondary button text", "harbour-deep", "paper"],
  ["secondary button text, hovered", "harbour-deep", "harbour-soft"],
  ["danger button text", "ember-deep", "paper"],
  ["danger button text, hovered", "ember-deep", "ember-soft"],
  ["current page in the staff navigation", "harbour-deep", "paper"],
  ["field error messages in form boxes", "ember-deep", "white"],
  ["field error messages on the page", "ember-deep", "paper"],
  ["error summary title and links", "ember-deep", "ember-soft"],
  ["caution titles", "ember-deep", "ember-soft"],
  ["signal text on the page", "ember", "paper"],
  ["signal text in cards", "ember", "white"],
  ["success messages in form boxes", "leaf", "white"],
  ["success messages on the page", "leaf", "paper"],
  ["success text in done notices", "leaf", "leaf-soft"],
];

describe("text meets 4.5:1 (WCAG 2.1 SC 1.4.3)", () => {
  it.each(TEXT_PAIRS)("%s: %s on %s", (_use, text, background) => {
    expect(contrastRatio(token(text), token(background))).toBeGreaterThanOrEqual(4.5);
  });

  it("the <mark> highlight in app/globals.css: its text on its tint, and on the backgrounds it can sit on", () => {
    const mark = rule("mark");
    const bg = /\bbg-([a-z]+(?:-[a-z]+)?)\b/.exec(mark)?.[1];
    const text = /\btext-([a-z]+(?:-[a-z]+)?)\b/.exec(mark)?.[1];
    expect(bg, "mark sets a background class").toBeTruthy();
    expect(text, "mark sets a text colour class").toBeTruthy();
    expect(contrastRatio(token(text!), token(bg!))).toBeGreaterThanOrEqual(4.5);
    // The tint does not carry the meaning alone: marked words are bold too (SC 1.4.1).
    expect(mark).toMatch(/\bfont-bold\b/);
  });
});

// Backgrounds a focused control can sit on, light and dark.
const BACKGROUNDS = ["paper", "paper-deep", "white", "harbour-soft", "ember-soft", "leaf-soft", "harbour", "harbour-deep"];

describe("the focus indicator meets 3:1 on every background (WCAG 2.1 SC 1.4.11, technique C40)", () => {
  const focus = rule(":focus-visible");
  const ring = /outline:\s*(\d+)px\s+solid\s+(#[0-9a-f]{6})/i.exec(focus);
  const halo = /box-shadow:\s*0 0 0 (\d+)px\s+(#[0-9a-f]{6})/i.exec(focus);

  it("is a solid outline of at least 2 px with a halo of at least 2 px, both in palette colours", () => {
    expect(ring, "an outline: <width>px solid #rrggbb").toBeTruthy();
    expect(halo, "a box-shadow: 0 0 0 <width>px #rrggbb halo").toBeTruthy();
    expect(Number(ring![1])).toBeGreaterThanOrEqual(2);
    expect(Number(halo![1])).toBeGreaterThanOrEqual(2);
    const all = Object.values(PALETTE).flatMap((shades) => Object.values(shades).map((h) => h.toLowerCase()));
    expect(all).toContain(ring![2]!.toLowerCase());
    expect(all).toContain(halo![2]!.toLowerCase());
  });

  it("ring and halo differ from each other by 3:1, so the ring reads against its own halo", () => {
    expect(contrastRatio(ring![2]!, halo![2]!)).toBeGreaterThanOrEqual(3);
  });

  it.each(BACKGROUNDS)("on %s, the ring or the halo stands out at 3:1 or more", (background) => {
    const best = Math.max(contrastRatio(ring![2]!, token(background)), contrastRatio(halo![2]!, token(background)));
    expect(best).toBeGreaterThanOrEqual(3);
  });
});

// Boundaries people need to see to find a control, and chart marks that carry data.
const NON_TEXT_PAIRS: [use: string, colour: string, background: string][] = [
  ["text box and select borders in form boxes", "ink-soft", "white"],
  ["text box and select borders on the page", "ink-soft", "paper"],
  ["an invalid field's border", "ember", "white"],
  ["secondary button borders", "harbour", "paper"],
  ["primary buttons against the page", "harbour", "paper"],
  ["primary buttons against a card", "harbour", "white"],
  ["school topic tabs' borders", "harbour", "white"],
  ["chart bars", "harbour", "white"],
  ["the chart's threshold line", "ember", "white"],
  ["the chart's peak markers", "ink", "white"],
  ["step numbers' discs", "harbour", "white"],
];

describe("user-interface parts and chart marks meet 3:1 (WCAG 2.1 SC 1.4.11)", () => {
  it.each(NON_TEXT_PAIRS)("%s: %s on %s", (_use, colour, background) => {
    expect(contrastRatio(token(colour), token(background))).toBeGreaterThanOrEqual(3);
  });
});
