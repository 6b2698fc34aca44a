import { createScan, listScans } from '@/app/lib/queries/scans';
import { readJsonBody } from '@/app/lib/readJsonBody';
import { prepareScan } from '@/app/lib/runs/prepareScan';
import { MAX_RUN_JSON_BYTES } from '@/app/lib/runs/savedRunLimits';
import { createScanSchema, listScansQuerySchema } from '@/app/lib/runs/scanSchemas';
import { apiRoute, json } from '@/app/lib/server/apiRoute';
import { requireUser } from '@/app/lib/server/currentUser';
import { clientAddressOf } from '@/app/lib/server/requestContext';
import { requireWorkspaceAccess } from '@/app/lib/server/workspaceAccess';
import { parseWithSchema } from '@/app/lib/validation';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ slug: string }> };

export const GET = apiRoute<Ctx>(async (request, { params }) => {
  const { slug } = await params;
  const user = await requireUser();
  const { workspace } = await requireWorkspaceAccess({ slug, user, action: 'run.read' });
  const query = parseWithSchema(listScansQuerySchema, Object.fromEntries(new URL(request.url).searchParams));
  return json(await listScans(workspace.id, query));
});

/** Starts a saved scan: the scan file is checked and planned; its points arrive one by one as the browser finishes them. */
export const POST = apiRoute<Ctx>(async (request, { params }) => {
  const { slug } = await params;
  const user = await requireUser();
  const { workspace } = await requireWorkspaceAccess({ slug, user, action: 'run.create' });
  const input = parseWithSchema(createScanSchema, await readJsonBody(request, MAX_RUN_JSON_BYTES + 64 * 1024));
  const prepared = await prepareScan(input.scanFile);
  const scan = await createScan({
    ...prepared,
    workspaceId: workspace.id,
    projectId: input.projectId ?? null,
    userId: user.id,
    title: input.title,
    clientAddress: clientAddressOf(request),
  });
  return json({ scan, url: `/workspaces/${slug}/scans/${scan.id}` }, 201);
});
