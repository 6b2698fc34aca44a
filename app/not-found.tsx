import Link from 'next/link';

export default function NotFound() {
  return (
    <div data-testid="not-found">
      <h1 className="text-2xl font-bold">Page not found</h1>
      <p className="mt-2 text-ink-soft">There is nothing at this address.</p>
      <Link href="/" className="mt-4 inline-block text-ket-600 underline">
        Back to the start
      </Link>
    </div>
  );
}
