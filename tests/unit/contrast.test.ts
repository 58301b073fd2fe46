import { describe, expect, it } from "vitest";
import config from "@/tailwind.config";
import { contrastRatio } from "@/lib/contrast";

type Palette = Record<string, Record<string, string>>;
const colors = config.theme!.extend!.colors as Palette;
const c = (name: string, shade = "DEFAULT") => colors[name]![shade]!;

describe("contrast ratio", () => {
  // Check values from shared/REFERENCES.md §7 (calc): #767676 on white passes at 4.54:1, #777777 fails at 4.48:1.
  it("matches the WCAG reference pair", () => {
    expect(contrastRatio("#767676", "#ffffff")).toBeCloseTo(4.54, 2);
    expect(contrastRatio("#777777", "#ffffff")).toBeCloseTo(4.48, 2);
  });
});

describe("the palette's text pairs meet WCAG 2.1 AA (4.5:1, SC 1.4.3)", () => {
  const pairs: [string, string, string][] = [
    ["ink on paper", c("ink"), c("paper")],
    ["soft ink on paper", c("ink", "soft"), c("paper")],
    ["soft ink on deep paper", c("ink", "soft"), c("paper", "deep")],
    ["soft ink on white", c("ink", "soft"), "#ffffff"],
    ["harbour links on paper", c("harbour"), c("paper")],
    ["harbour links on deep paper", c("harbour"), c("paper", "deep")],
    ["harbour links on harbour soft", c("harbour"), c("harbour", "soft")],
    ["paper on harbour", c("paper"), c("harbour")],
    ["paper on deep harbour", c("paper"), c("harbour", "deep")],
    ["deep harbour headings on paper", c("harbour", "deep"), c("paper")],
    ["ember on paper", c("ember"), c("paper")],
    ["ember on white", c("ember"), "#ffffff"],
    ["deep ember on ember soft", c("ember", "deep"), c("ember", "soft")],
    ["ink on ember soft", c("ink"), c("ember", "soft")],
    ["leaf on paper", c("leaf"), c("paper")],
    ["leaf on white", c("leaf"), "#ffffff"],
    ["ink on leaf soft", c("ink"), c("leaf", "soft")],
  ];
  it.each(pairs)("%s", (_name, fg, bg) => {
    expect(contrastRatio(fg, bg)).toBeGreaterThanOrEqual(4.5);
  });
});
