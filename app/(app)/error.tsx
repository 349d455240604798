"use client";
import { useEffect } from "react";

// Anything a page could not handle: a plain apology and a retry; the details go to the server log.
export default function AppError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  useEffect(() => {
    console.error(error);
  }, [error]);
  return (
    <div className="panel mx-auto max-w-xl p-6" role="alert">
      <h1 className="text-xl">Something went wrong on our side</h1>
      <p className="mt-2 text-sm text-muted">
        Your saved setups are safe. Try again; if it keeps happening, tell the workshop
        {error.digest ? ` and quote ${error.digest}` : ""}.
      </p>
      <button type="button" onClick={reset} className="mt-4 rounded bg-accent px-3 py-1.5 text-sm text-white">
        Try again
      </button>
    </div>
  );
}
