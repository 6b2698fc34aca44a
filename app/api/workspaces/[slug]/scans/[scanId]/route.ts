import { ApiError } from '@/app/lib/errors';
import { deleteScan, findSavedScan, updateScan } from '@/app/lib/queries/scans';
import { readJsonBody } from '@/app/lib/readJsonBody';
import { MAX_RUN_JSON_BYTES } from '@/app/lib/runs/savedRunLimits';
import { checkScanId } from '@/app/lib/runs/scanId';
import { updateScanSchema } from '@/app/lib/runs/scanSchemas';
import { apiRoute, json } from '@/app/lib/server/apiRoute';
import { requireUser } from '@/app/lib/server/currentUser';
import { clientAddressOf } from '@/app/lib/server/requestContext';
import { requireWorkspaceAccess } from '@/app/lib/server/workspaceAccess';
import { parseWithSchema } from '@/app/lib/validation';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ slug: string; scanId: string }> };

export const GET = apiRoute<Ctx>(async (_request, { params }) => {
  const { slug, scanId } = await params;
  const user = await requireUser();
  const { workspace, access } = await requireWorkspaceAccess({ slug, user, action: 'run.read' });
  const scan = await findSavedScan(workspace.id, checkScanId(scanId));
  if (!scan) throw new ApiError('not_found:scan');
  return json({ scan, access });
});

export const PATCH = apiRoute<Ctx>(async (request, { params }) => {
  const { slug, scanId } = await params;
  const user = await requireUser();
  const { workspace } = await requireWorkspaceAccess({ slug, user, action: 'run.edit' });
  const input = parseWithSchema(updateScanSchema, await readJsonBody(request, MAX_RUN_JSON_BYTES));
  const scan = await updateScan({
    workspaceId: workspace.id,
    publicId: checkScanId(scanId),
    userId: user.id,
    title: input.title,
    status: input.status,
    summaryJson: input.summary === undefined ? undefined : input.summary === null ? null : JSON.stringify(input.summary),
    clientAddress: clientAddressOf(request),
  });
  return json({ scan });
});

export const DELETE = apiRoute<Ctx>(async (request, { params }) => {
  const { slug, scanId } = await params;
  const user = await requireUser();
  const { workspace } = await requireWorkspaceAccess({ slug, user, action: 'run.delete' });
  await deleteScan({ workspaceId: workspace.id, publicId: checkScanId(scanId), userId: user.id, clientAddress: clientAddressOf(request) });
  return json({ deleted: true });
});
