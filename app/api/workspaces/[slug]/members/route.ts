import { listMembers } from '@/app/lib/queries/members';
import { apiRoute, json } from '@/app/lib/server/apiRoute';
import { requireUser } from '@/app/lib/server/currentUser';
import { requireWorkspaceAccess } from '@/app/lib/server/workspaceAccess';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ slug: string }> };

export const GET = apiRoute<Ctx>(async (_request, { params }) => {
  const { slug } = await params;
  const user = await requireUser();
  const { workspace } = await requireWorkspaceAccess({ slug, user, action: 'member.list' });
  return json({ members: await listMembers({ workspaceId: workspace.id }) });
});
