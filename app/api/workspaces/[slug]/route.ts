import { recordAudit } from '@/app/lib/queries/audit';
import { countMembers, toWorkspaceSummary, updateWorkspace } from '@/app/lib/queries/workspaces';
import { readJsonBody } from '@/app/lib/readJsonBody';
import { apiRoute, json } from '@/app/lib/server/apiRoute';
import { requireUser } from '@/app/lib/server/currentUser';
import { clientAddressOf } from '@/app/lib/server/requestContext';
import { requireWorkspaceAccess } from '@/app/lib/server/workspaceAccess';
import { parseWithSchema } from '@/app/lib/validation';
import { updateWorkspaceSchema } from './schema';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ slug: string }> };

export const GET = apiRoute<Ctx>(async (_request, { params }) => {
  const { slug } = await params;
  const user = await requireUser();
  const { workspace, access } = await requireWorkspaceAccess({ slug, user, action: 'workspace.read' });
  return json({ workspace: toWorkspaceSummary(workspace, access, await countMembers({ workspaceId: workspace.id })) });
});

export const PATCH = apiRoute<Ctx>(async (request, { params }) => {
  const { slug } = await params;
  const input = parseWithSchema(updateWorkspaceSchema, await readJsonBody(request));
  const user = await requireUser();
  const { workspace, access } = await requireWorkspaceAccess({ slug, user, action: 'workspace.rename' });
  const updated = await updateWorkspace({ workspaceId: workspace.id, name: input.name, description: input.description });
  await recordAudit({
    actorId: user.id,
    action: 'workspace.rename',
    workspaceId: workspace.id,
    targetType: 'workspace',
    targetId: workspace.id,
    clientAddress: clientAddressOf(request),
    detail: { from: { name: workspace.name }, to: { name: updated!.name } },
  });
  return json({ workspace: toWorkspaceSummary(updated!, access, await countMembers({ workspaceId: workspace.id })) });
});
