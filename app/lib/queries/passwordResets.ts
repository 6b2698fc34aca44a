import 'server-only';
import type { Transaction } from 'sequelize';
import { ApiError } from '../errors';
import { getModels, getSequelize } from '../server/db';
import { createToken, hashToken, RESET_TOKEN_LIFETIME_MS } from '../tokens';

export async function createPasswordReset({ userId }: { userId: number }): Promise<{ token: string; expiresAt: Date }> {
  const { PasswordReset } = getModels();
  const { token, tokenHash } = createToken();
  const expiresAt = new Date(Date.now() + RESET_TOKEN_LIFETIME_MS);
  await PasswordReset.create({ userId, tokenHash, expiresAt, usedAt: null });
  return { token, expiresAt };
}

/**
 * Marks a reset token used and hands its user to `apply` in the same transaction, so a
 * token works exactly once even when two requests race.
 */
export async function consumePasswordReset<T>({
  token,
  apply,
}: {
  token: string;
  apply: (userId: number, transaction: Transaction) => Promise<T>;
}): Promise<T> {
  const { PasswordReset } = getModels();
  return getSequelize().transaction(async (transaction: Transaction) => {
    const reset = await PasswordReset.findOne({
      where: { tokenHash: hashToken(token) },
      lock: transaction.LOCK.UPDATE,
      transaction,
    });
    if (!reset || reset.usedAt || new Date(reset.expiresAt).getTime() <= Date.now()) {
      throw new ApiError('unprocessable:token');
    }
    await PasswordReset.update({ usedAt: new Date() }, { where: { id: reset.id }, transaction });
    return apply(reset.userId, transaction);
  });
}
