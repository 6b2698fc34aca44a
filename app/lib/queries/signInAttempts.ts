import 'server-only';
import { Op } from 'sequelize';
import { getModels } from '../server/db';

export async function recordSignInAttempt({
  email,
  clientAddress,
  succeeded,
}: {
  email: string;
  clientAddress: string;
  succeeded: boolean;
}): Promise<void> {
  const { SignInAttempt } = getModels();
  await SignInAttempt.create({ email, clientAddress, succeeded });
}

/**
 * Failed attempts inside the window, for one e-mail and for one address. The oldest
 * counted failure tells when the window frees a slot again (for Retry-After).
 * For the account, a later successful sign-in clears the earlier failures.
 */
export async function recentFailures({
  email,
  clientAddress,
  since,
}: {
  email: string;
  clientAddress: string;
  since: Date;
}): Promise<{ byEmail: Date[]; byAddress: Date[] }> {
  const { SignInAttempt } = getModels();
  const lastSuccess = await SignInAttempt.findOne({
    where: { email, succeeded: true, createdAt: { [Op.gte]: since } },
    order: [['createdAt', 'DESC']],
  });
  const emailSince = lastSuccess ? new Date(lastSuccess.createdAt) : since;
  const [byEmail, byAddress] = await Promise.all([
    SignInAttempt.findAll({
      where: { email, succeeded: false, createdAt: { [Op.gte]: emailSince } },
      order: [['createdAt', 'ASC']],
      attributes: ['createdAt'],
    }),
    SignInAttempt.findAll({
      where: { clientAddress, succeeded: false, createdAt: { [Op.gte]: since } },
      order: [['createdAt', 'ASC']],
      attributes: ['createdAt'],
    }),
  ]);
  return {
    byEmail: byEmail.map((r) => new Date(r.createdAt)),
    byAddress: byAddress.map((r) => new Date(r.createdAt)),
  };
}
