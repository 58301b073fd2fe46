"use client";

import Link from "next/link";
import { useEffect } from "react";

export default function ErrorPage({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  useEffect(() => {
    console.error(error);
  }, [error]);
  return (
    <main id="main" tabIndex={-1} className="mx-auto w-full max-w-prose flex-1 px-gutter py-12">
      <h1 className="text-3xl font-bold text-harbour-deep">Something went wrong on our side</h1>
      <p className="mt-4 text-lg">
        This page did not load. Anything you sent us before this is safe. Please try again in a moment.
      </p>
      {error.digest ? <p className="mt-2 text-sm text-ink-soft">Reference for our staff: {error.digest}</p> : null}
      <div className="mt-6 flex flex-wrap gap-4">
        <button type="button" onClick={reset} className="min-h-11 rounded-plate border-2 border-harbour bg-harbour px-4 font-bold text-paper">
          Try again
        </button>
        <Link href="/" className="inline-flex min-h-11 items-center">
          Go to the home page
        </Link>
      </div>
    </main>
  );
}
