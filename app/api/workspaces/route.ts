import { recordAudit } from '@/app/lib/queries/audit';
import { createWorkspaceWithOwner, listWorkspacesForUser, toWorkspaceSummary } from '@/app/lib/queries/workspaces';
import { readJsonBody } from '@/app/lib/readJsonBody';
import { apiRoute, json } from '@/app/lib/server/apiRoute';
import { requireUser } from '@/app/lib/server/currentUser';
import { clientAddressOf } from '@/app/lib/server/requestContext';
import { parseWithSchema } from '@/app/lib/validation';
import { createWorkspaceSchema } from './schema';

export const dynamic = 'force-dynamic';

export const GET = apiRoute(async () => {
  const user = await requireUser();
  return json({ workspaces: await listWorkspacesForUser({ userId: user.id, siteRole: user.siteRole }) });
});

/** Any signed-in user may create a workspace and becomes its first owner. */
export const POST = apiRoute(async (request) => {
  const input = parseWithSchema(createWorkspaceSchema, await readJsonBody(request));
  const user = await requireUser();
  const workspace = await createWorkspaceWithOwner({
    name: input.name,
    slug: input.slug,
    description: input.description ?? '',
    userId: user.id,
  });
  await recordAudit({
    actorId: user.id,
    action: 'workspace.create',
    workspaceId: workspace.id,
    targetType: 'workspace',
    targetId: workspace.id,
    clientAddress: clientAddressOf(request),
    detail: { slug: workspace.slug, name: workspace.name },
  });
  return json({ workspace: toWorkspaceSummary(workspace, 'owner', 1) }, 201);
});
