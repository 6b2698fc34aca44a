'use client';
import { zodResolver } from '@hookform/resolvers/zod';
import { useMutation } from '@tanstack/react-query';
import { useForm } from 'react-hook-form';
import { passwordResetRequestSchema, type PasswordResetRequestInput } from '@/app/api/auth/password-reset/schema';
import { apiFetch } from '../forms/apiFetch';
import { FormMessage } from '../forms/FormMessage';
import { SubmitButton } from '../forms/SubmitButton';
import { TextField } from '../forms/TextField';
import { useServerErrors } from '../forms/useServerErrors';

export function ForgotPasswordForm() {
  const { register, handleSubmit, setError, formState } = useForm<PasswordResetRequestInput>({
    resolver: zodResolver(passwordResetRequestSchema),
    defaultValues: { email: '' },
  });
  const { formError, applyServerError } = useServerErrors(setError, ['email']);
  const mutation = useMutation({
    mutationFn: (input: PasswordResetRequestInput) =>
      apiFetch<{ message: string }>('/api/auth/password-reset', { method: 'POST', body: input }),
    onError: applyServerError,
  });
  return (
    <form noValidate onSubmit={handleSubmit((v) => mutation.mutate(v))} data-testid="forgot-form">
      <TextField label="E-mail" type="email" autoComplete="email" registration={register('email')} error={formState.errors.email?.message} testId="forgot-email" />
      <FormMessage message={mutation.data?.message ?? formError} tone={mutation.data ? 'ok' : 'error'} />
      <SubmitButton pending={mutation.isPending} testId="forgot-submit">
        Send reset link
      </SubmitButton>
    </form>
  );
}
