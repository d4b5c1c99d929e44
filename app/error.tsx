'use client';

export default function ErrorPage({ reset }: { error: Error; reset: () => void }) {
  return (
    <main className="mx-auto max-w-xl px-6 py-16 text-center">
      <h1 className="text-xl font-semibold">Something went wrong</h1>
      <p className="mt-2 text-ink-soft">Nothing you saved is lost. Try again, or reload the page.</p>
      <button type="button" className="btn-quiet mt-6" onClick={reset}>Try again</button>
    </main>
  );
}
