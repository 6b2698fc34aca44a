import { ApiError } from '@/app/lib/errors';
import { readRunVector } from '@/app/lib/queries/runs';
import { checkRunId } from '@/app/lib/runs/runId';
import { VECTOR_ENCODING } from '@/app/lib/runs/vectorCodec';
import { apiRoute } from '@/app/lib/server/apiRoute';
import { requireUser } from '@/app/lib/server/currentUser';
import { requireWorkspaceAccess } from '@/app/lib/server/workspaceAccess';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ slug: string; runId: string }> };

/**
 * The stored CI vectors as they were saved: deflate-compressed little-endian float64, roots
 * one after another. The headers say how to read them.
 */
export const GET = apiRoute<Ctx>(async (_request, { params }) => {
  const { slug, runId } = await params;
  const user = await requireUser();
  const { workspace } = await requireWorkspaceAccess({ slug, user, action: 'run.read' });
  const vector = await readRunVector({ workspaceId: workspace.id, publicId: checkRunId(runId) });
  if (!vector) throw new ApiError('not_found:run', { message: 'This run was saved with its leading determinants only; the whole CI vector is not stored.' });
  return new Response(new Uint8Array(vector.bytes), {
    status: 200,
    headers: {
      'content-type': 'application/octet-stream',
      'content-disposition': `attachment; filename="ketbook-${runId}-ci-vectors.deflate"`,
      'x-ketbook-encoding': VECTOR_ENCODING,
      'x-ketbook-roots': String(vector.roots),
      'x-ketbook-length': String(vector.length),
    },
  });
});
