import type { Metadata, Viewport } from "next";
import localFont from "next/font/local";
import type { ReactNode } from "react";
import "./globals.css";

const hyperlegible = localFont({
  src: [
    { path: "../fonts/atkinson-hyperlegible-next-latin-400-normal.woff2", weight: "400", style: "normal" },
    { path: "../fonts/atkinson-hyperlegible-next-latin-400-italic.woff2", weight: "400", style: "italic" },
    { path: "../fonts/atkinson-hyperlegible-next-latin-700-normal.woff2", weight: "700", style: "normal" },
  ],
  variable: "--font-hyperlegible",
  display: "swap",
});

export const metadata: Metadata = {
  title: { default: "School reopening — Wrenmoor Valley Schools", template: "%s — Wrenmoor Valley Schools" },
  description: "What changed in each Wrenmoor Valley school building, why it is safe, and answers to families' questions.",
  applicationName: "Clearhall",
};

export const viewport: Viewport = { themeColor: "#1d3a5f", width: "device-width", initialScale: 1 };

export default function RootLayout({ children }: { children: ReactNode }) {
  return (
    <html lang="en" className={hyperlegible.variable}>
      <body>
        <a
          href="#main"
          className="sr-only focus:not-sr-only focus:fixed focus:left-3 focus:top-3 focus:z-50 focus:rounded-plate focus:bg-harbour focus:px-4 focus:py-2 focus:text-paper"
        >
          Skip to main content
        </a>
        {children}
      </body>
    </html>
  );
}
