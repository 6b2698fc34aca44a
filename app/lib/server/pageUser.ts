import 'server-only';
import { notFound, redirect } from 'next/navigation';
import { currentUser } from './currentUser';

/** For pages: the signed-in user, or a redirect to sign-in that comes back here afterwards. */
export async function requirePageUser(returnTo: string) {
  const user = await currentUser();
  if (!user) redirect(`/sign-in?next=${encodeURIComponent(returnTo)}`);
  return user;
}

/** Admin pages answer 404 to non-admins, so they do not advertise themselves. */
export async function requirePageAdmin(returnTo: string) {
  const user = await requirePageUser(returnTo);
  if (user.siteRole !== 'admin') notFound();
  return user;
}
