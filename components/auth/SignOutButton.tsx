'use client';
import { useMutation } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { apiFetch } from '../forms/apiFetch';
import { FormMessage } from '../forms/FormMessage';

export function SignOutButton() {
  const router = useRouter();
  const mutation = useMutation({
    mutationFn: () => apiFetch('/api/auth/sign-out', { method: 'POST', body: {} }),
    onSuccess: () => {
      router.push('/');
      router.refresh();
    },
  });
  return (
    <div>
      <button
        type="button"
        onClick={() => mutation.mutate()}
        disabled={mutation.isPending}
        data-testid="sign-out-button"
        className="rounded-md bg-ket-600 px-4 py-2 text-sm font-semibold text-white hover:bg-ket-700 disabled:opacity-60"
      >
        {mutation.isPending ? 'Signing out…' : 'Sign out'}
      </button>
      <FormMessage message={mutation.isError ? 'Could not sign out; try again.' : null} />
    </div>
  );
}
