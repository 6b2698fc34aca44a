import { ApiError } from '@/app/lib/errors';
import { deleteRun, findSavedRun, updateRun } from '@/app/lib/queries/runs';
import { readJsonBody } from '@/app/lib/readJsonBody';
import { checkRunId } from '@/app/lib/runs/runId';
import { updateRunSchema } from '@/app/lib/runs/saveRunSchema';
import { apiRoute, json } from '@/app/lib/server/apiRoute';
import { requireUser } from '@/app/lib/server/currentUser';
import { clientAddressOf } from '@/app/lib/server/requestContext';
import { requireWorkspaceAccess } from '@/app/lib/server/workspaceAccess';
import { parseWithSchema } from '@/app/lib/validation';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ slug: string; runId: string }> };

export const GET = apiRoute<Ctx>(async (_request, { params }) => {
  const { slug, runId } = await params;
  const user = await requireUser();
  const { workspace, access } = await requireWorkspaceAccess({ slug, user, action: 'run.read' });
  const run = await findSavedRun({ workspaceId: workspace.id, publicId: checkRunId(runId) });
  if (!run) throw new ApiError('not_found:run');
  return json({ run, access });
});

export const PATCH = apiRoute<Ctx>(async (request, { params }) => {
  const { slug, runId } = await params;
  const input = parseWithSchema(updateRunSchema, await readJsonBody(request));
  const user = await requireUser();
  const { workspace } = await requireWorkspaceAccess({ slug, user, action: 'run.edit' });
  const run = await updateRun({ workspaceId: workspace.id, publicId: checkRunId(runId), userId: user.id, ...input, clientAddress: clientAddressOf(request) });
  return json({ run });
});

export const DELETE = apiRoute<Ctx>(async (request, { params }) => {
  const { slug, runId } = await params;
  const user = await requireUser();
  const { workspace } = await requireWorkspaceAccess({ slug, user, action: 'run.delete' });
  await deleteRun({ workspaceId: workspace.id, publicId: checkRunId(runId), userId: user.id, clientAddress: clientAddressOf(request) });
  return json({ deleted: true });
});
