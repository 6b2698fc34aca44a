import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { SavedRunView } from '@/components/runs/SavedRunView';
import { accessFor, can } from '@/app/lib/permissions';
import { findSavedRun } from '@/app/lib/queries/runs';
import { findMembership, findWorkspaceBySlug } from '@/app/lib/queries/workspaces';
import { requirePageUser } from '@/app/lib/server/pageUser';

type Props = { params: Promise<{ slug: string; runId: string }> };

export const metadata: Metadata = { title: 'Saved run' };

/** A saved run's stable address: everything it stored, shown without recomputing. */
export default async function SavedRunPage({ params }: Props) {
  const { slug, runId } = await params;
  const user = await requirePageUser(`/workspaces/${slug}/runs/${runId}`);
  const workspace = await findWorkspaceBySlug({ slug });
  if (!workspace) notFound();
  const membership = await findMembership({ workspaceId: workspace.id, userId: user.id });
  const access = accessFor(membership?.role, user.siteRole);
  if (!access || !can(access, 'run.read')) notFound();
  const run = /^[A-Za-z0-9_-]{16}$/.test(runId) ? await findSavedRun({ workspaceId: workspace.id, publicId: runId }) : null;
  if (!run) notFound();
  return (
    <div>
      <p className="mb-2 text-sm">
        <Link href={`/workspaces/${slug}`} className="text-ket-700 underline">
          ← {workspace.name}
        </Link>
      </p>
      <SavedRunView slug={slug} initialRun={run} canEdit={can(access, 'run.edit')} canDelete={can(access, 'run.delete')} />
    </div>
  );
}
