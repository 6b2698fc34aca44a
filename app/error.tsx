'use client';

export default function ErrorPage({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <div role="alert" data-testid="error-page">
      <h1 className="text-2xl font-bold">Something went wrong</h1>
      <p className="mt-2 text-ink-soft">
        The page could not be shown. {error.digest ? `Reference: ${error.digest}.` : ''}
      </p>
      <button type="button" onClick={reset} className="mt-4 rounded-md bg-ket-600 px-4 py-2 text-sm font-semibold text-white">
        Try again
      </button>
    </div>
  );
}
