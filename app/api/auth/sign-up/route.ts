import { UniqueConstraintError, type Transaction } from 'sequelize';
import { ApiError } from '@/app/lib/errors';
import { acceptInvitation } from '@/app/lib/queries/invitations';
import { recordAudit } from '@/app/lib/queries/audit';
import { createUser, findUserByEmail, toPublicUser } from '@/app/lib/queries/users';
import { readJsonBody } from '@/app/lib/readJsonBody';
import { apiRoute, json } from '@/app/lib/server/apiRoute';
import { getSequelize } from '@/app/lib/server/db';
import { hashPassword } from '@/app/lib/server/passwords';
import { clientAddressOf } from '@/app/lib/server/requestContext';
import { getSession } from '@/app/lib/session';
import { parseWithSchema } from '@/app/lib/validation';
import { signUpSchema } from './schema';

export const POST = apiRoute(async (request) => {
  const input = parseWithSchema(signUpSchema, await readJsonBody(request));
  const clientAddress = clientAddressOf(request);
  if (await findUserByEmail({ email: input.email })) {
    throw new ApiError('conflict:email', { fields: { email: ['An account with that e-mail already exists.'] } });
  }
  const passwordHash = await hashPassword(input.password);

  const { user, joined } = await getSequelize()
    .transaction(async (transaction: Transaction) => {
      const user = await createUser({ email: input.email, displayName: input.displayName, passwordHash, transaction });
      await recordAudit({ actorId: user.id, action: 'user.sign-up', targetType: 'user', targetId: user.id, clientAddress, transaction });
      // An invitation that cannot be accepted rolls the whole sign-up back, so no half-done account is left.
      const joined = input.invitationToken
        ? await acceptInvitation({ token: input.invitationToken, user, transaction })
        : null;
      if (joined) {
        await recordAudit({
          actorId: user.id,
          action: 'invitation.accept',
          workspaceId: joined.workspaceId,
          targetType: 'invitation',
          targetId: joined.invitationId,
          clientAddress,
          detail: { role: joined.role },
          transaction,
        });
      }
      return { user, joined };
    })
    .catch((error: unknown) => {
      if (error instanceof UniqueConstraintError) {
        throw new ApiError('conflict:email', { fields: { email: ['An account with that e-mail already exists.'] } });
      }
      throw error;
    });

  const session = await getSession();
  session.userId = user.id;
  session.signedInAt = Date.now();
  await session.save();
  return json({ user: toPublicUser(user), workspace: joined ? { slug: joined.workspaceSlug, role: joined.role } : null }, 201);
});
