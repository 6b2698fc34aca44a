import { ApiError } from '@/app/lib/errors';
import { idParam } from '@/app/lib/fields';
import { recordAudit } from '@/app/lib/queries/audit';
import { changeMemberRole, removeMember } from '@/app/lib/queries/members';
import { readJsonBody } from '@/app/lib/readJsonBody';
import { apiRoute, json } from '@/app/lib/server/apiRoute';
import { requireUser } from '@/app/lib/server/currentUser';
import { clientAddressOf } from '@/app/lib/server/requestContext';
import { requireWorkspaceAccess } from '@/app/lib/server/workspaceAccess';
import { parseWithSchema } from '@/app/lib/validation';
import { changeRoleSchema } from './schema';

type Ctx = { params: Promise<{ slug: string; userId: string }> };

function parseUserId(raw: string): number {
  const parsed = idParam.safeParse(raw);
  if (!parsed.success) throw new ApiError('not_found:member');
  return parsed.data;
}

/** Owners change roles; demoting the last owner is refused with 409. */
export const PATCH = apiRoute<Ctx>(async (request, { params }) => {
  const { slug, userId: rawUserId } = await params;
  const { role } = parseWithSchema(changeRoleSchema, await readJsonBody(request));
  const user = await requireUser();
  const { workspace } = await requireWorkspaceAccess({ slug, user, action: 'member.change-role' });
  const userId = parseUserId(rawUserId);
  const { previousRole } = await changeMemberRole({ workspaceId: workspace.id, userId, role });
  await recordAudit({
    actorId: user.id,
    action: 'membership.role-change',
    workspaceId: workspace.id,
    targetType: 'user',
    targetId: userId,
    clientAddress: clientAddressOf(request),
    detail: { from: previousRole, to: role },
  });
  return json({ member: { userId, role } });
});

/** Owners remove anyone; every member may remove themself (leave). The last owner stays. */
export const DELETE = apiRoute<Ctx>(async (request, { params }) => {
  const { slug, userId: rawUserId } = await params;
  const user = await requireUser();
  const userId = parseUserId(rawUserId);
  const leaving = userId === user.id;
  const { workspace, access } = await requireWorkspaceAccess({
    slug,
    user,
    action: leaving ? 'workspace.read' : 'member.remove',
  });
  // Observers (admins who are not members) have nothing to leave.
  if (leaving && access === 'observer') throw new ApiError('not_found:member');
  const { previousRole } = await removeMember({ workspaceId: workspace.id, userId });
  await recordAudit({
    actorId: user.id,
    action: 'membership.remove',
    workspaceId: workspace.id,
    targetType: 'user',
    targetId: userId,
    clientAddress: clientAddressOf(request),
    detail: { role: previousRole, leaving },
  });
  return json({ removed: true });
});
