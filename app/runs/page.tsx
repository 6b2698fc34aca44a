import Link from 'next/link';
import { PageTitle } from '@/components/layout/Page';
import { listWorkspacesForUser } from '@/app/lib/queries/workspaces';
import { requirePageUser } from '@/app/lib/server/pageUser';

export const metadata = { title: 'Runs' };

/** Where runs start and where saved ones live (each workspace keeps its own run table). */
export default async function RunsPage() {
  const user = await requirePageUser('/runs');
  const workspaces = await listWorkspacesForUser({ userId: user.id, siteRole: user.siteRole });
  return (
    <div>
      <PageTitle subtitle="A run is one calculation; it is computed in your browser and saved to a workspace.">Runs</PageTitle>
      <p className="mb-4">
        <Link href="/runs/new" className="rounded-md bg-ket-600 px-4 py-2 text-sm font-semibold text-white hover:bg-ket-700" data-testid="runs-new-link">
          Start a run in this browser
        </Link>
      </p>
      <h2 className="mb-2 text-lg font-semibold text-ink">Saved runs, by workspace</h2>
      {workspaces.length === 0 ? (
        <p className="text-sm text-ink-soft">You are not in a workspace yet; saved runs are kept in workspaces.</p>
      ) : (
        <ul className="grid gap-1 text-sm" data-testid="runs-workspaces">
          {workspaces.map((w) => (
            <li key={w.slug}>
              <Link href={`/workspaces/${w.slug}`} className="text-ket-700 underline">
                {w.name}
              </Link>{' '}
              <span className="text-ink-soft">({w.access})</span>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
