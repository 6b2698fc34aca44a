import { ApiError } from '@/app/lib/errors';
import { idParam } from '@/app/lib/fields';
import { recordAudit } from '@/app/lib/queries/audit';
import { revokeInvitation } from '@/app/lib/queries/invitations';
import { apiRoute, json } from '@/app/lib/server/apiRoute';
import { requireUser } from '@/app/lib/server/currentUser';
import { clientAddressOf } from '@/app/lib/server/requestContext';
import { requireWorkspaceAccess } from '@/app/lib/server/workspaceAccess';

type Ctx = { params: Promise<{ slug: string; invitationId: string }> };

export const DELETE = apiRoute<Ctx>(async (request, { params }) => {
  const { slug, invitationId: raw } = await params;
  const user = await requireUser();
  const { workspace } = await requireWorkspaceAccess({ slug, user, action: 'invitation.revoke' });
  const parsed = idParam.safeParse(raw);
  if (!parsed.success) throw new ApiError('not_found:invitation');
  await revokeInvitation({ workspaceId: workspace.id, invitationId: parsed.data });
  await recordAudit({
    actorId: user.id,
    action: 'invitation.revoke',
    workspaceId: workspace.id,
    targetType: 'invitation',
    targetId: parsed.data,
    clientAddress: clientAddressOf(request),
  });
  return json({ revoked: true });
});
