import type { Config } from "tailwindcss";

/**
 * Clearhall's design tokens. Calm and civic: warm paper, one deep cool colour
 * ("harbour") for structure, one warm signal ("ember") kept for cautions and
 * "action needed". Every text pair below meets WCAG AA (tests/unit/contrast.test.ts).
 */
const config: Config = {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}", "./content/**/*.mdx", "./lib/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        paper: { DEFAULT: "#fbf7ef", deep: "#f3ecdf", line: "#d8cdb8" },
        ink: { DEFAULT: "#1c2530", soft: "#45505c" },
        harbour: { DEFAULT: "#1d3a5f", deep: "#132840", soft: "#e3eaf3", line: "#9fb3cb" },
        ember: { DEFAULT: "#a63f0c", deep: "#7c2e07", soft: "#fbe9dc", line: "#e0a47e" },
        leaf: { DEFAULT: "#2f6b3a", soft: "#e4f0e3" },
      },
      fontFamily: {
        sans: ["var(--font-hyperlegible)", "ui-sans-serif", "system-ui", "sans-serif"],
      },
      fontSize: {
        // Large by default: read on a phone in a school car park.
        sm: ["0.9375rem", { lineHeight: "1.45" }],
        base: ["1.125rem", { lineHeight: "1.6" }],
        lg: ["1.3125rem", { lineHeight: "1.5" }],
        xl: ["1.5625rem", { lineHeight: "1.35" }],
        "2xl": ["1.9375rem", { lineHeight: "1.25" }],
        "3xl": ["2.4375rem", { lineHeight: "1.15" }],
      },
      spacing: {
        gutter: "1.25rem",
        section: "3rem",
      },
      maxWidth: {
        prose: "42rem",
        page: "72rem",
      },
      borderRadius: {
        plate: "0.625rem",
      },
    },
  },
};

export default config;
