import { recordAudit } from '@/app/lib/queries/audit';
import { consumePasswordReset } from '@/app/lib/queries/passwordResets';
import { setUserPassword } from '@/app/lib/queries/users';
import { readJsonBody } from '@/app/lib/readJsonBody';
import { apiRoute, json } from '@/app/lib/server/apiRoute';
import { hashPassword } from '@/app/lib/server/passwords';
import { clientAddressOf } from '@/app/lib/server/requestContext';
import { parseWithSchema } from '@/app/lib/validation';
import { passwordResetConfirmSchema } from './schema';

export const POST = apiRoute(async (request) => {
  const { token, password } = parseWithSchema(passwordResetConfirmSchema, await readJsonBody(request));
  const clientAddress = clientAddressOf(request);
  const passwordHash = await hashPassword(password);
  await consumePasswordReset({
    token,
    apply: async (userId, transaction) => {
      await setUserPassword({ userId, passwordHash, transaction });
      await recordAudit({ actorId: userId, action: 'password.reset', targetType: 'user', targetId: userId, clientAddress, transaction });
    },
  });
  return json({ reset: true });
});
