'use client';
import { useMutation } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { ApiClientError, apiFetch } from '../forms/apiFetch';
import { FormMessage } from '../forms/FormMessage';

export function AcceptInvitationButton({ token }: { token: string }) {
  const router = useRouter();
  const mutation = useMutation({
    mutationFn: () => apiFetch<{ workspace: { slug: string } }>('/api/invitations/accept', { method: 'POST', body: { token } }),
    onSuccess: (reply) => {
      router.push(`/workspaces/${reply.workspace.slug}`);
      router.refresh();
    },
  });
  return (
    <div>
      <button
        type="button"
        disabled={mutation.isPending}
        onClick={() => mutation.mutate()}
        data-testid="accept-invitation"
        className="rounded-md bg-ket-600 px-4 py-2 text-sm font-semibold text-white hover:bg-ket-700 disabled:opacity-60"
      >
        {mutation.isPending ? 'Joining…' : 'Accept and join'}
      </button>
      <FormMessage message={mutation.error ? (mutation.error instanceof ApiClientError ? mutation.error.message : 'Could not reach the server.') : null} />
    </div>
  );
}
