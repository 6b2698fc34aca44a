import { OutboxList } from '@/components/admin/OutboxList';
import { PageTitle } from '@/components/layout/Page';
import { listOutbox } from '@/app/lib/queries/outbox';
import { requirePageAdmin } from '@/app/lib/server/pageUser';

export const metadata = { title: 'Outbox' };

export default async function OutboxPage() {
  await requirePageAdmin('/admin/outbox');
  const messages = await listOutbox();
  return (
    <div>
      <PageTitle subtitle="Every e-mail Ketbook sent, as the local mail server received it. Site admins only.">Outbox</PageTitle>
      <OutboxList initial={messages} />
    </div>
  );
}
