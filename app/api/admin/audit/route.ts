import { listAuditEntries } from '@/app/lib/queries/audit';
import { apiRoute, json } from '@/app/lib/server/apiRoute';
import { requireAdmin } from '@/app/lib/server/currentUser';

export const dynamic = 'force-dynamic';

export const GET = apiRoute(async (request) => {
  await requireAdmin();
  const before = Number(new URL(request.url).searchParams.get('before'));
  const entries = await listAuditEntries({ limit: 200, beforeId: Number.isInteger(before) && before > 0 ? before : undefined });
  return json({ entries });
});
