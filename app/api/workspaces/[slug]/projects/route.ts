import { recordAudit } from '@/app/lib/queries/audit';
import { createProject, listProjects } from '@/app/lib/queries/projects';
import { readJsonBody } from '@/app/lib/readJsonBody';
import { apiRoute, json } from '@/app/lib/server/apiRoute';
import { requireUser } from '@/app/lib/server/currentUser';
import { clientAddressOf } from '@/app/lib/server/requestContext';
import { requireWorkspaceAccess } from '@/app/lib/server/workspaceAccess';
import { parseWithSchema } from '@/app/lib/validation';
import { createProjectSchema } from './schema';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ slug: string }> };

export const GET = apiRoute<Ctx>(async (_request, { params }) => {
  const { slug } = await params;
  const user = await requireUser();
  const { workspace } = await requireWorkspaceAccess({ slug, user, action: 'project.read' });
  return json({ projects: await listProjects({ workspaceId: workspace.id }) });
});

export const POST = apiRoute<Ctx>(async (request, { params }) => {
  const { slug } = await params;
  const input = parseWithSchema(createProjectSchema, await readJsonBody(request));
  const user = await requireUser();
  const { workspace } = await requireWorkspaceAccess({ slug, user, action: 'project.create' });
  const project = await createProject({
    workspaceId: workspace.id,
    name: input.name,
    description: input.description ?? '',
    userId: user.id,
  });
  await recordAudit({
    actorId: user.id,
    action: 'project.create',
    workspaceId: workspace.id,
    targetType: 'project',
    targetId: project.id,
    clientAddress: clientAddressOf(request),
    detail: { name: project.name },
  });
  return json({ project }, 201);
});
