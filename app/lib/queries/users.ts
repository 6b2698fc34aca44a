import 'server-only';
import type { Transaction } from 'sequelize';
import { getModels } from '../server/db';

export interface PublicUser {
  id: number;
  email: string;
  displayName: string;
  siteRole: 'admin' | 'member';
  createdAt: string;
}

export function normaliseEmail(email: string): string {
  return email.trim().toLowerCase();
}

export async function findUserByEmail({ email }: { email: string }) {
  const { User } = getModels();
  return User.findOne({ where: { email: normaliseEmail(email) } });
}

export async function findUserById({ id }: { id: number }) {
  const { User } = getModels();
  return User.findByPk(id);
}

export async function createUser({
  email,
  displayName,
  passwordHash,
  transaction,
}: {
  email: string;
  displayName: string;
  passwordHash: string;
  transaction?: Transaction;
}) {
  const { User } = getModels();
  return User.create(
    { email: normaliseEmail(email), displayName, passwordHash, siteRole: 'member' },
    { transaction },
  );
}

export async function setUserPassword({
  userId,
  passwordHash,
  transaction,
}: {
  userId: number;
  passwordHash: string;
  transaction?: Transaction;
}) {
  const { User } = getModels();
  await User.update({ passwordHash }, { where: { id: userId }, transaction });
}

export function toPublicUser(user: {
  id: number;
  email: string;
  displayName: string;
  siteRole: 'admin' | 'member';
  createdAt: Date;
}): PublicUser {
  return {
    id: user.id,
    email: user.email,
    displayName: user.displayName,
    siteRole: user.siteRole,
    createdAt: new Date(user.createdAt).toISOString(),
  };
}
