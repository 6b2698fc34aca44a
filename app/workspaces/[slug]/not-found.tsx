import Link from 'next/link';

export default function WorkspaceNotFound() {
  return (
    <div data-testid="workspace-not-found">
      <h1 className="text-2xl font-bold">No such workspace</h1>
      <p className="mt-2 text-ink-soft">It does not exist, or you are not a member of it.</p>
      <Link href="/workspaces" className="mt-4 inline-block text-ket-600 underline">
        Back to your workspaces
      </Link>
    </div>
  );
}
