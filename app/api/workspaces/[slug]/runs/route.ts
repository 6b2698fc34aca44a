import { createRun, listRuns, listRunTags } from '@/app/lib/queries/runs';
import { readJsonBody } from '@/app/lib/readJsonBody';
import { prepareSavedRun } from '@/app/lib/runs/prepareSavedRun';
import { MAX_SAVE_BODY_BYTES } from '@/app/lib/runs/savedRunLimits';
import { listRunsQuerySchema, saveRunSchema } from '@/app/lib/runs/saveRunSchema';
import { apiRoute, json } from '@/app/lib/server/apiRoute';
import { requireUser } from '@/app/lib/server/currentUser';
import { clientAddressOf } from '@/app/lib/server/requestContext';
import { requireWorkspaceAccess } from '@/app/lib/server/workspaceAccess';
import { parseWithSchema } from '@/app/lib/validation';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ slug: string }> };

/** The workspace's run table: search, filter by tag/method/project, sort, paginate. */
export const GET = apiRoute<Ctx>(async (request, { params }) => {
  const { slug } = await params;
  const user = await requireUser();
  const { workspace } = await requireWorkspaceAccess({ slug, user, action: 'run.read' });
  const query = parseWithSchema(listRunsQuerySchema, Object.fromEntries(new URL(request.url).searchParams));
  const [page, tags] = await Promise.all([listRuns(workspace.id, query), listRunTags(workspace.id)]);
  return json({ ...page, tags });
});

/** Saves a finished run (run file, result, and the CI vectors when sent) in one transaction. */
export const POST = apiRoute<Ctx>(async (request, { params }) => {
  const { slug } = await params;
  const user = await requireUser();
  const { workspace } = await requireWorkspaceAccess({ slug, user, action: 'run.create' });
  const input = parseWithSchema(saveRunSchema, await readJsonBody(request, MAX_SAVE_BODY_BYTES));
  const prepared = await prepareSavedRun(input);
  const run = await createRun({ ...prepared, workspaceId: workspace.id, userId: user.id, clientAddress: clientAddressOf(request) });
  return json({ run, url: `/workspaces/${slug}/runs/${run.id}` }, 201);
});
