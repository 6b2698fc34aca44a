'use client';
import { useMutation } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { ApiClientError, apiFetch } from '../forms/apiFetch';
import { FormMessage } from '../forms/FormMessage';

export interface InvitationView {
  id: number;
  email: string;
  role: string;
  expiresAt: string;
}

export function InvitationList({ slug, invitations, canRevoke }: { slug: string; invitations: InvitationView[]; canRevoke: boolean }) {
  const router = useRouter();
  const revoke = useMutation({
    mutationFn: (id: number) => apiFetch(`/api/workspaces/${slug}/invitations/${id}`, { method: 'DELETE' }),
    onSuccess: () => router.refresh(),
  });
  if (invitations.length === 0) return <p className="text-sm text-ink-soft" data-testid="invitations-empty">No pending invitations.</p>;
  return (
    <div>
      <ul className="divide-y divide-ink-soft/15" data-testid="invitation-list">
        {invitations.map((inv) => (
          <li key={inv.id} className="flex flex-wrap items-center gap-3 py-2" data-testid={`invitation-${inv.email}`}>
            <span className="flex-1">{inv.email}</span>
            <span className="text-sm text-ink-soft">{inv.role}</span>
            <span className="text-sm text-ink-soft">expires {inv.expiresAt.slice(0, 10)}</span>
            {canRevoke ? (
              <button type="button" className="text-sm text-caution-700 underline" data-testid={`invitation-revoke-${inv.email}`} onClick={() => revoke.mutate(inv.id)}>
                Revoke
              </button>
            ) : null}
          </li>
        ))}
      </ul>
      <FormMessage message={revoke.error ? (revoke.error instanceof ApiClientError ? revoke.error.message : 'Could not reach the server.') : null} />
    </div>
  );
}
