import { passwordResetMail } from '@/app/lib/mailTemplates';
import { recordAudit } from '@/app/lib/queries/audit';
import { createPasswordReset } from '@/app/lib/queries/passwordResets';
import { findUserByEmail } from '@/app/lib/queries/users';
import { readJsonBody } from '@/app/lib/readJsonBody';
import { apiRoute, json } from '@/app/lib/server/apiRoute';
import { sendMail } from '@/app/lib/server/mail';
import { clientAddressOf, publicLink } from '@/app/lib/server/requestContext';
import { parseWithSchema } from '@/app/lib/validation';
import { passwordResetRequestSchema, RESET_REQUEST_REPLY } from './schema';

export const POST = apiRoute(async (request) => {
  const { email } = parseWithSchema(passwordResetRequestSchema, await readJsonBody(request));
  const clientAddress = clientAddressOf(request);
  const user = await findUserByEmail({ email });
  if (user) {
    const { token } = await createPasswordReset({ userId: user.id });
    const mail = passwordResetMail({
      displayName: user.displayName,
      link: publicLink(`/reset-password?token=${encodeURIComponent(token)}`),
    });
    try {
      await sendMail({ to: user.email, subject: mail.subject, text: mail.text });
    } catch (error) {
      // The reply must not differ, so a mail failure is only logged.
      console.error('[password-reset] mail failed', error);
    }
  }
  await recordAudit({
    actorId: user?.id ?? null,
    action: 'password.reset-request',
    targetType: 'user',
    targetId: user?.id ?? null,
    clientAddress,
    detail: { email, accountExists: Boolean(user) },
  });
  return json(RESET_REQUEST_REPLY, 202);
});
