import { listOutbox } from '@/app/lib/queries/outbox';
import { apiRoute, json } from '@/app/lib/server/apiRoute';
import { requireAdmin } from '@/app/lib/server/currentUser';

export const dynamic = 'force-dynamic';

export const GET = apiRoute(async () => {
  await requireAdmin();
  return json({ messages: await listOutbox() });
});
