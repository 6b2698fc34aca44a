import Link from 'next/link';

export default function SavedRunNotFound() {
  return (
    <div data-testid="run-not-found">
      <h1 className="text-2xl font-bold">No such run</h1>
      <p className="mt-2 text-ink-soft">It was deleted, or the address is wrong, or you are not a member of its workspace.</p>
      <Link href="/workspaces" className="mt-4 inline-block text-ket-600 underline">
        Back to your workspaces
      </Link>
    </div>
  );
}
