import { ApiError } from '@/app/lib/errors';
import { idParam } from '@/app/lib/fields';
import { recordAudit } from '@/app/lib/queries/audit';
import { deleteProject, findProject, updateProject } from '@/app/lib/queries/projects';
import { readJsonBody } from '@/app/lib/readJsonBody';
import { apiRoute, json } from '@/app/lib/server/apiRoute';
import { requireUser } from '@/app/lib/server/currentUser';
import { clientAddressOf } from '@/app/lib/server/requestContext';
import { requireWorkspaceAccess } from '@/app/lib/server/workspaceAccess';
import { parseWithSchema } from '@/app/lib/validation';
import { updateProjectSchema } from '../schema';

type Ctx = { params: Promise<{ slug: string; projectId: string }> };

function parseProjectId(raw: string): number {
  const parsed = idParam.safeParse(raw);
  if (!parsed.success) throw new ApiError('not_found:project');
  return parsed.data;
}

export const PATCH = apiRoute<Ctx>(async (request, { params }) => {
  const { slug, projectId: raw } = await params;
  const input = parseWithSchema(updateProjectSchema, await readJsonBody(request));
  const user = await requireUser();
  const { workspace } = await requireWorkspaceAccess({ slug, user, action: 'project.rename' });
  const projectId = parseProjectId(raw);
  const before = await findProject({ workspaceId: workspace.id, projectId });
  if (!before) throw new ApiError('not_found:project');
  const project = await updateProject({ workspaceId: workspace.id, projectId, name: input.name, description: input.description });
  await recordAudit({
    actorId: user.id,
    action: 'project.rename',
    workspaceId: workspace.id,
    targetType: 'project',
    targetId: projectId,
    clientAddress: clientAddressOf(request),
    detail: { from: before.name, to: project.name },
  });
  return json({ project });
});

export const DELETE = apiRoute<Ctx>(async (request, { params }) => {
  const { slug, projectId: raw } = await params;
  const user = await requireUser();
  const { workspace } = await requireWorkspaceAccess({ slug, user, action: 'project.delete' });
  const projectId = parseProjectId(raw);
  const before = await findProject({ workspaceId: workspace.id, projectId });
  if (!before) throw new ApiError('not_found:project');
  await deleteProject({ workspaceId: workspace.id, projectId });
  await recordAudit({
    actorId: user.id,
    action: 'project.delete',
    workspaceId: workspace.id,
    targetType: 'project',
    targetId: projectId,
    clientAddress: clientAddressOf(request),
    detail: { name: before.name },
  });
  return json({ deleted: true });
});
