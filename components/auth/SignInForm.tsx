'use client';
import { zodResolver } from '@hookform/resolvers/zod';
import { useMutation } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { useForm } from 'react-hook-form';
import { signInSchema, type SignInInput } from '@/app/api/auth/sign-in/schema';
import { apiFetch } from '../forms/apiFetch';
import { FormMessage } from '../forms/FormMessage';
import { SubmitButton } from '../forms/SubmitButton';
import { TextField } from '../forms/TextField';
import { useServerErrors } from '../forms/useServerErrors';

/** Only same-site paths are followed after sign-in, so the `next` parameter cannot send people elsewhere. */
function safeNext(next: string | undefined): string {
  return next && next.startsWith('/') && !next.startsWith('//') ? next : '/workspaces';
}

export function SignInForm({ next, email }: { next?: string; email?: string }) {
  const router = useRouter();
  const { register, handleSubmit, setError, formState } = useForm<SignInInput>({
    resolver: zodResolver(signInSchema),
    defaultValues: { email: email ?? '', password: '' },
  });
  const { formError, applyServerError } = useServerErrors(setError, ['email', 'password']);
  const mutation = useMutation({
    mutationFn: (input: SignInInput) => apiFetch('/api/auth/sign-in', { method: 'POST', body: input }),
    onSuccess: () => {
      router.push(safeNext(next));
      router.refresh();
    },
    onError: applyServerError,
  });
  return (
    <form noValidate onSubmit={handleSubmit((v) => mutation.mutate(v))} data-testid="sign-in-form">
      <TextField label="E-mail" type="email" autoComplete="email" registration={register('email')} error={formState.errors.email?.message} testId="sign-in-email" />
      <TextField label="Password" type="password" autoComplete="current-password" registration={register('password')} error={formState.errors.password?.message} testId="sign-in-password" />
      <FormMessage message={formError} />
      <SubmitButton pending={mutation.isPending} testId="sign-in-submit">
        Sign in
      </SubmitButton>
    </form>
  );
}
