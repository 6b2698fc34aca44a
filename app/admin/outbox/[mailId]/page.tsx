import Link from 'next/link';
import { notFound } from 'next/navigation';
import { MailBody } from '@/components/admin/MailBody';
import { PageTitle } from '@/components/layout/Page';
import { idParam } from '@/app/lib/fields';
import { getOutboxMessage } from '@/app/lib/queries/outbox';
import { requirePageAdmin } from '@/app/lib/server/pageUser';

export const metadata = { title: 'Message' };

export default async function OutboxMessagePage({ params }: { params: Promise<{ mailId: string }> }) {
  const { mailId } = await params;
  await requirePageAdmin(`/admin/outbox/${mailId}`);
  const id = idParam.safeParse(mailId);
  const message = id.success ? await getOutboxMessage({ id: id.data }) : null;
  if (!message) notFound();
  return (
    <div>
      <Link href="/admin/outbox" className="text-sm text-ket-600 underline">
        ← Outbox
      </Link>
      <PageTitle>{message.subject || '(no subject)'}</PageTitle>
      <dl className="mb-4 grid grid-cols-[max-content_1fr] gap-x-6 gap-y-1 text-sm">
        <dt className="text-ink-soft">From</dt>
        <dd>{message.from}</dd>
        <dt className="text-ink-soft">To</dt>
        <dd data-testid="mail-to">{message.to}</dd>
        <dt className="text-ink-soft">Received</dt>
        <dd>{message.receivedAt.slice(0, 19).replace('T', ' ')} UTC</dd>
      </dl>
      <MailBody text={message.textBody} />
      {message.hasHtml ? <p className="mt-2 text-xs text-ink-soft">This message also has an HTML part; it is not rendered here.</p> : null}
    </div>
  );
}
