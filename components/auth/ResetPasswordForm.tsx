'use client';
import { zodResolver } from '@hookform/resolvers/zod';
import { useMutation } from '@tanstack/react-query';
import Link from 'next/link';
import { useForm } from 'react-hook-form';
import { passwordResetConfirmSchema, type PasswordResetConfirmInput } from '@/app/api/auth/password-reset/confirm/schema';
import { apiFetch } from '../forms/apiFetch';
import { FormMessage } from '../forms/FormMessage';
import { SubmitButton } from '../forms/SubmitButton';
import { TextField } from '../forms/TextField';
import { useServerErrors } from '../forms/useServerErrors';

export function ResetPasswordForm({ token }: { token: string }) {
  const { register, handleSubmit, setError, formState } = useForm<PasswordResetConfirmInput>({
    resolver: zodResolver(passwordResetConfirmSchema),
    defaultValues: { token, password: '' },
  });
  const { formError, applyServerError } = useServerErrors(setError, ['password']);
  const mutation = useMutation({
    mutationFn: (input: PasswordResetConfirmInput) => apiFetch('/api/auth/password-reset/confirm', { method: 'POST', body: input }),
    onError: applyServerError,
  });
  if (mutation.isSuccess) {
    return (
      <div data-testid="reset-done">
        <FormMessage tone="ok" message="Your password is changed." />
        <Link href="/sign-in" className="text-ket-600 underline">
          Sign in with the new password
        </Link>
      </div>
    );
  }
  return (
    <form noValidate onSubmit={handleSubmit((v) => mutation.mutate(v))} data-testid="reset-form">
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        hint="10 to 72 characters."
        registration={register('password')}
        error={formState.errors.password?.message}
        testId="reset-password"
      />
      <FormMessage message={formError ?? formState.errors.token?.message ?? null} />
      <SubmitButton pending={mutation.isPending} testId="reset-submit">
        Set new password
      </SubmitButton>
    </form>
  );
}
