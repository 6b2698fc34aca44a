import { ApiError } from '@/app/lib/errors';
import { idParam } from '@/app/lib/fields';
import { getOutboxMessage } from '@/app/lib/queries/outbox';
import { apiRoute, json } from '@/app/lib/server/apiRoute';
import { requireAdmin } from '@/app/lib/server/currentUser';

export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ mailId: string }> };

export const GET = apiRoute<Ctx>(async (_request, { params }) => {
  const { mailId } = await params;
  await requireAdmin();
  const parsed = idParam.safeParse(mailId);
  const message = parsed.success ? await getOutboxMessage({ id: parsed.data }) : null;
  if (!message) throw new ApiError('not_found:mail');
  return json({ message });
});
