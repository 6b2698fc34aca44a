import { PageTitle } from '@/components/layout/Page';
import { listAuditEntries } from '@/app/lib/queries/audit';
import { requirePageAdmin } from '@/app/lib/server/pageUser';

export const metadata = { title: 'Audit log' };

export default async function AuditPage() {
  await requirePageAdmin('/admin/audit');
  const entries = await listAuditEntries({ limit: 200 });
  return (
    <div>
      <PageTitle subtitle="The latest 200 recorded actions, newest first. Site admins only.">Audit log</PageTitle>
      {entries.length === 0 ? (
        <p className="text-ink-soft">Nothing recorded yet.</p>
      ) : (
        <div className="overflow-x-auto rounded-xl border border-ink-soft/15 bg-white">
          <table className="w-full text-left text-sm" data-testid="audit-table">
            <thead>
              <tr className="border-b border-ink-soft/20 text-ink-soft">
                <th className="px-3 py-2 font-semibold">When (UTC)</th>
                <th className="px-3 py-2 font-semibold">Action</th>
                <th className="px-3 py-2 font-semibold">By</th>
                <th className="px-3 py-2 font-semibold">Target</th>
                <th className="px-3 py-2 font-semibold">Address</th>
                <th className="px-3 py-2 font-semibold">Detail</th>
              </tr>
            </thead>
            <tbody>
              {entries.map((e) => (
                <tr key={e.id} className="border-b border-ink-soft/10 align-top" data-testid="audit-row">
                  <td className="px-3 py-2 whitespace-nowrap">{e.createdAt.slice(0, 19).replace('T', ' ')}</td>
                  <td className="px-3 py-2 font-mono">{e.action}</td>
                  <td className="px-3 py-2">{e.actorEmail ?? '—'}</td>
                  <td className="px-3 py-2">{e.targetType ? `${e.targetType} ${e.targetId ?? ''}` : '—'}</td>
                  <td className="px-3 py-2">{e.clientAddress ?? '—'}</td>
                  <td className="px-3 py-2 font-mono text-xs">{e.detail ? JSON.stringify(e.detail) : ''}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </div>
  );
}
