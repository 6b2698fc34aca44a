import 'server-only';
import { ApiError } from '../errors';
import { findUserById } from '../queries/users';
import { getSession } from '../session';

/** The signed-in user, or null. A session whose user was deleted counts as signed out. */
export async function currentUser() {
  const session = await getSession();
  if (!session.userId) return null;
  return findUserById({ id: session.userId });
}

export async function requireUser() {
  const user = await currentUser();
  if (!user) throw new ApiError('unauthorized:session');
  return user;
}

export async function requireAdmin() {
  const user = await requireUser();
  if (user.siteRole !== 'admin') throw new ApiError('forbidden:admin');
  return user;
}
