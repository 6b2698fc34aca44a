import { ApiError } from '@/app/lib/errors';
import { saveScanPoint } from '@/app/lib/queries/scans';
import { readJsonBody } from '@/app/lib/readJsonBody';
import { checkScanId } from '@/app/lib/runs/scanId';
import { MAX_SCAN_POINT_JSON_BYTES, saveScanPointSchema } from '@/app/lib/runs/scanSchemas';
import { apiRoute, json } from '@/app/lib/server/apiRoute';
import { requireUser } from '@/app/lib/server/currentUser';
import { requireWorkspaceAccess } from '@/app/lib/server/workspaceAccess';
import { parseWithSchema } from '@/app/lib/validation';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ slug: string; scanId: string; index: string }> };

/** Stores one finished point (replacing an earlier copy), so an interrupted scan resumes where it stopped. */
export const PUT = apiRoute<Ctx>(async (request, { params }) => {
  const { slug, scanId, index: rawIndex } = await params;
  const user = await requireUser();
  const { workspace } = await requireWorkspaceAccess({ slug, user, action: 'run.edit' });
  if (!/^\d{1,5}$/.test(rawIndex)) throw new ApiError('not_found:route');
  const input = parseWithSchema(saveScanPointSchema, await readJsonBody(request, MAX_SCAN_POINT_JSON_BYTES));
  const pointsDone = await saveScanPoint({ workspaceId: workspace.id, publicId: checkScanId(scanId), index: Number(rawIndex), resultJson: JSON.stringify(input.result) });
  return json({ pointsDone });
});
