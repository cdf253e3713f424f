"use client";

export default function ErrorPage({ reset }: { error: Error; reset: () => void }) {
  return (
    <div className="max-w-prose" role="alert">
      <h1 className="text-3xl">Something went wrong</h1>
      <p className="mt-3">The page could not load. Nothing you saved is lost. Try again in a moment.</p>
      <button type="button" onClick={reset} className="mt-4 rounded border border-ink/40 bg-panel px-4 py-2 font-bold">
        Try again
      </button>
    </div>
  );
}
