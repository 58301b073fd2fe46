"use client";

export default function GlobalError({ reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <html lang="en">
      <body style={{ fontFamily: "system-ui, sans-serif", background: "#fbf7ef", color: "#1c2530", padding: "2rem" }}>
        <main>
          <h1>Something went wrong on our side</h1>
          <p>The site could not load. Anything you sent us before this is safe. Please try again in a moment.</p>
          <button type="button" onClick={reset}>
            Try again
          </button>
        </main>
      </body>
    </html>
  );
}
