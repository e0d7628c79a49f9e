"use client";

export default function ErrorPage({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <section className="py-12">
      <h1 className="text-xl font-semibold">This page could not be loaded</h1>
      <p className="mt-2 text-sm text-ink-soft">
        The server could not answer{error.digest ? ` (reference ${error.digest})` : ""}. If the database was restarted, try again.
      </p>
      <button onClick={reset} className="mt-4 rounded bg-tide-700 px-3 py-1.5 text-sm text-white">
        Try again
      </button>
    </section>
  );
}
