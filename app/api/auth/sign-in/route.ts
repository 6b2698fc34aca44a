import { randomBytes } from 'node:crypto';
import { getAppConfig } from '@/app/lib/appConfig';
import { ApiError } from '@/app/lib/errors';
import { rateLimitRetryAfter } from '@/app/lib/server/signInLimit';
import { recordAudit } from '@/app/lib/queries/audit';
import { recordSignInAttempt } from '@/app/lib/queries/signInAttempts';
import { findUserByEmail, normaliseEmail, toPublicUser } from '@/app/lib/queries/users';
import { readJsonBody } from '@/app/lib/readJsonBody';
import { apiRoute, json } from '@/app/lib/server/apiRoute';
import { hashPassword, verifyPassword } from '@/app/lib/server/passwords';
import { clientAddressOf } from '@/app/lib/server/requestContext';
import { getSession } from '@/app/lib/session';
import { parseWithSchema } from '@/app/lib/validation';
import { signInSchema } from './schema';

// A hash to compare against when the account does not exist, so that unknown e-mails
// cost about the same time as wrong passwords. Made once per server process.
let dummyHash: Promise<string> | null = null;
function getDummyHash(): Promise<string> {
  dummyHash ??= hashPassword(randomBytes(16).toString('hex'));
  return dummyHash;
}

export const POST = apiRoute(async (request) => {
  const input = parseWithSchema(signInSchema, await readJsonBody(request));
  const email = normaliseEmail(input.email);
  const clientAddress = clientAddressOf(request);
  const config = getAppConfig();

  const retryAfter = await rateLimitRetryAfter({ email, clientAddress, config });
  if (retryAfter !== null) {
    throw new ApiError('rate_limited:sign-in', { headers: { 'Retry-After': String(retryAfter) } });
  }

  const user = await findUserByEmail({ email });
  const ok = await verifyPassword(input.password, user?.passwordHash ?? (await getDummyHash()));
  if (!user || !ok) {
    await recordSignInAttempt({ email, clientAddress, succeeded: false });
    await recordAudit({
      actorId: user?.id ?? null,
      action: 'user.sign-in-failed',
      targetType: 'user',
      targetId: user?.id ?? null,
      clientAddress,
      detail: { email },
    });
    throw new ApiError('unauthorized:credentials');
  }

  await recordSignInAttempt({ email, clientAddress, succeeded: true });
  await recordAudit({ actorId: user.id, action: 'user.sign-in', targetType: 'user', targetId: user.id, clientAddress });
  const session = await getSession();
  session.userId = user.id;
  session.signedInAt = Date.now();
  await session.save();
  return json({ user: toPublicUser(user) });
});
