import { recordAudit } from '@/app/lib/queries/audit';
import { acceptInvitation } from '@/app/lib/queries/invitations';
import { readJsonBody } from '@/app/lib/readJsonBody';
import { apiRoute, json } from '@/app/lib/server/apiRoute';
import { requireUser } from '@/app/lib/server/currentUser';
import { clientAddressOf } from '@/app/lib/server/requestContext';
import { parseWithSchema } from '@/app/lib/validation';
import { acceptInvitationSchema } from './schema';

/** The signed-in user accepts an invitation sent to their own e-mail address. */
export const POST = apiRoute(async (request) => {
  const { token } = parseWithSchema(acceptInvitationSchema, await readJsonBody(request));
  const user = await requireUser();
  const joined = await acceptInvitation({ token, user });
  await recordAudit({
    actorId: user.id,
    action: 'invitation.accept',
    workspaceId: joined.workspaceId,
    targetType: 'invitation',
    targetId: joined.invitationId,
    clientAddress: clientAddressOf(request),
    detail: { role: joined.role },
  });
  return json({ workspace: { slug: joined.workspaceSlug, role: joined.role } });
});
