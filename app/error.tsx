"use client";

/** Shown when a page fails on the server, most often because MariaDB is not reachable. */
export default function ErrorPage({ reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <section className="mx-auto max-w-xl space-y-3 rounded-lg border border-over/30 bg-white/60 p-6">
      <h1 className="text-xl font-semibold">This page could not be loaded</h1>
      <p className="text-sm text-ink-soft">
        The server could not answer. When running locally this usually means the database is not
        running: start it with <code className="font-mono">npm run db:start</code> (or{" "}
        <code className="font-mono">npm start</code>). The app reconnects by itself once it is back.
      </p>
      <button type="button" onClick={reset} className="rounded bg-ember px-4 py-2 text-sm text-white">
        Try again
      </button>
    </section>
  );
}
