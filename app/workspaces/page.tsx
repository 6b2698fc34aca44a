import Link from 'next/link';
import { PageTitle } from '@/components/layout/Page';
import { listWorkspacesForUser } from '@/app/lib/queries/workspaces';
import { requirePageUser } from '@/app/lib/server/pageUser';

export const metadata = { title: 'Workspaces' };

export default async function WorkspacesPage() {
  const user = await requirePageUser('/workspaces');
  const workspaces = await listWorkspacesForUser({ userId: user.id, siteRole: user.siteRole });
  return (
    <div>
      <div className="flex items-start justify-between gap-4">
        <PageTitle subtitle="Each workspace is a research group's shared space.">Workspaces</PageTitle>
        <Link href="/workspaces/new" className="rounded-md bg-ket-600 px-4 py-2 text-sm font-semibold text-white hover:bg-ket-700" data-testid="new-workspace">
          New workspace
        </Link>
      </div>
      {workspaces.length === 0 ? (
        <p className="rounded-lg border border-dashed border-ink-soft/30 p-6 text-ink-soft" data-testid="workspaces-empty">
          You are not in any workspace yet. Create one for your group, or ask an owner to invite you.
        </p>
      ) : (
        <ul className="grid gap-3 sm:grid-cols-2" data-testid="workspace-list">
          {workspaces.map((w) => (
            <li key={w.id}>
              <Link href={`/workspaces/${w.slug}`} className="block rounded-xl border border-ink-soft/15 bg-white p-4 shadow-sm hover:border-ket-500" data-testid={`workspace-${w.slug}`}>
                <p className="font-semibold">{w.name}</p>
                <p className="text-sm text-ink-soft">
                  {w.access === 'observer' ? 'site admin (read only)' : w.access} · {w.memberCount} {w.memberCount === 1 ? 'member' : 'members'}
                </p>
              </Link>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
