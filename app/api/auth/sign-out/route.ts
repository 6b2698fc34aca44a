import { recordAudit } from '@/app/lib/queries/audit';
import { apiRoute, json } from '@/app/lib/server/apiRoute';
import { clientAddressOf } from '@/app/lib/server/requestContext';
import { getSession } from '@/app/lib/session';

/** Signing out is always allowed and idempotent; a POST so that a link cannot sign anyone out. */
export const POST = apiRoute(async (request) => {
  const session = await getSession();
  const userId = session.userId;
  session.destroy();
  if (userId) {
    await recordAudit({ actorId: userId, action: 'user.sign-out', targetType: 'user', targetId: userId, clientAddress: clientAddressOf(request) });
  }
  return json({ signedOut: true });
});
