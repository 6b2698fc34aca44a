'use client';
import { useMutation } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { WORKSPACE_ROLES, type WorkspaceRole } from '@/app/lib/permissions';
import { ApiClientError, apiFetch } from '../forms/apiFetch';
import { FormMessage } from '../forms/FormMessage';

export interface MemberView {
  userId: number;
  displayName: string;
  email: string;
  role: WorkspaceRole;
}

function errorText(error: unknown): string {
  return error instanceof ApiClientError ? error.message : 'Could not reach the server.';
}

/** Owners get a role picker and a remove button per member; everyone may leave. */
export function MemberList({ slug, members, canManage, currentUserId }: { slug: string; members: MemberView[]; canManage: boolean; currentUserId: number }) {
  const router = useRouter();
  const [message, setMessage] = useState<string | null>(null);
  const changeRole = useMutation({
    mutationFn: ({ userId, role }: { userId: number; role: WorkspaceRole }) =>
      apiFetch(`/api/workspaces/${slug}/members/${userId}`, { method: 'PATCH', body: { role } }),
    onSuccess: () => {
      setMessage(null);
      router.refresh();
    },
    onError: (e) => {
      setMessage(errorText(e));
      router.refresh();
    },
  });
  const remove = useMutation({
    mutationFn: (userId: number) => apiFetch(`/api/workspaces/${slug}/members/${userId}`, { method: 'DELETE' }),
    onSuccess: (_data, userId) => {
      setMessage(null);
      if (userId === currentUserId) router.push('/workspaces');
      router.refresh();
    },
    onError: (e) => setMessage(errorText(e)),
  });
  return (
    <div>
      <ul className="divide-y divide-ink-soft/15" data-testid="member-list">
        {members.map((m) => (
          <li key={m.userId} className="flex flex-wrap items-center gap-3 py-2" data-testid={`member-${m.email}`}>
            <div className="min-w-48 flex-1">
              <p className="font-semibold">{m.displayName}</p>
              <p className="text-sm text-ink-soft">{m.email}</p>
            </div>
            {canManage ? (
              <label className="text-sm">
                <span className="sr-only">Role of {m.displayName}</span>
                <select
                  defaultValue={m.role}
                  data-testid={`member-role-${m.email}`}
                  className="rounded-md border border-ink-soft/30 px-2 py-1"
                  onChange={(e) => changeRole.mutate({ userId: m.userId, role: e.target.value as WorkspaceRole })}
                >
                  {WORKSPACE_ROLES.map((r) => (
                    <option key={r} value={r}>
                      {r}
                    </option>
                  ))}
                </select>
              </label>
            ) : (
              <span className="rounded-full bg-ket-50 px-2 py-0.5 text-sm text-ket-700" data-testid={`member-role-${m.email}`}>
                {m.role}
              </span>
            )}
            {canManage || m.userId === currentUserId ? (
              <button
                type="button"
                className="text-sm text-caution-700 underline"
                data-testid={`member-remove-${m.email}`}
                onClick={() => {
                  const leaving = m.userId === currentUserId;
                  if (window.confirm(leaving ? 'Leave this workspace?' : `Remove ${m.displayName} from this workspace?`)) remove.mutate(m.userId);
                }}
              >
                {m.userId === currentUserId ? 'Leave' : 'Remove'}
              </button>
            ) : null}
          </li>
        ))}
      </ul>
      <FormMessage message={message} testId="member-message" />
    </div>
  );
}
