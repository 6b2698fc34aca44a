'use client';
import { useQuery } from '@tanstack/react-query';
import Link from 'next/link';
import type { MailSummary } from '@/app/lib/queries/outbox';
import { apiFetch } from '../forms/apiFetch';

/** The outbox refreshes itself every few seconds, since mail arrives over SMTP a moment after it is sent. */
export function OutboxList({ initial }: { initial: MailSummary[] }) {
  const { data, isError } = useQuery({
    queryKey: ['admin', 'outbox'],
    queryFn: () => apiFetch<{ messages: MailSummary[] }>('/api/admin/outbox').then((r) => r.messages),
    initialData: initial,
    refetchInterval: 3000,
  });
  if (data.length === 0) return <p className="text-ink-soft" data-testid="outbox-empty">No mail has been received yet.</p>;
  return (
    <div>
      {isError ? <p className="text-sm text-caution-700">Could not refresh the list.</p> : null}
      <table className="w-full text-left text-sm" data-testid="outbox-table">
        <thead>
          <tr className="border-b border-ink-soft/20 text-ink-soft">
            <th className="py-2 pr-4 font-semibold">Received (UTC)</th>
            <th className="py-2 pr-4 font-semibold">To</th>
            <th className="py-2 font-semibold">Subject</th>
          </tr>
        </thead>
        <tbody>
          {data.map((m) => (
            <tr key={m.id} className="border-b border-ink-soft/10" data-testid="outbox-row">
              <td className="py-2 pr-4 whitespace-nowrap">{m.receivedAt.slice(0, 19).replace('T', ' ')}</td>
              <td className="py-2 pr-4" data-testid="outbox-to">{m.to}</td>
              <td className="py-2">
                <Link href={`/admin/outbox/${m.id}`} className="text-ket-600 underline" data-testid="outbox-open">
                  {m.subject || '(no subject)'}
                </Link>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
