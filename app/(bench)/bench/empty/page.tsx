import type { Metadata } from "next";

// The framework's floor for `npm run bench`: the root layout every page shares (html, fonts,
// global stylesheet, skip link) with nothing in it but one heading, no header, no database, no
// client component. The benchmarks compare public pages against it in the same build and run.
// The heading is visible because Lighthouse cannot time a page that paints nothing.
export const dynamic = "force-static";

export const metadata: Metadata = {
  title: "Empty page for benchmarks",
  robots: { index: false, follow: false },
};

export default function EmptyBenchmarkPage() {
  return (
    <main id="main" tabIndex={-1} className="mx-auto max-w-page px-gutter py-8 focus:outline-none">
      <h1 className="text-xl">Empty page for benchmarks</h1>
    </main>
  );
}
