import { toPublicUser } from '@/app/lib/queries/users';
import { apiRoute, json } from '@/app/lib/server/apiRoute';
import { requireUser } from '@/app/lib/server/currentUser';

export const dynamic = 'force-dynamic';

export const GET = apiRoute(async () => {
  const user = await requireUser();
  return json({ user: toPublicUser(user) });
});
