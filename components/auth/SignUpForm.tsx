'use client';
import { zodResolver } from '@hookform/resolvers/zod';
import { useMutation } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { useForm } from 'react-hook-form';
import { signUpSchema, type SignUpInput } from '@/app/api/auth/sign-up/schema';
import { apiFetch } from '../forms/apiFetch';
import { FormMessage } from '../forms/FormMessage';
import { SubmitButton } from '../forms/SubmitButton';
import { TextField } from '../forms/TextField';
import { useServerErrors } from '../forms/useServerErrors';

type Reply = { workspace: { slug: string } | null };

export function SignUpForm({ invitationToken, email }: { invitationToken?: string; email?: string }) {
  const router = useRouter();
  const { register, handleSubmit, setError, formState } = useForm<SignUpInput>({
    resolver: zodResolver(signUpSchema),
    defaultValues: { email: email ?? '', displayName: '', password: '', ...(invitationToken ? { invitationToken } : {}) },
  });
  const { formError, applyServerError } = useServerErrors(setError, ['email', 'displayName', 'password']);
  const mutation = useMutation({
    mutationFn: (input: SignUpInput) => apiFetch<Reply>('/api/auth/sign-up', { method: 'POST', body: input }),
    onSuccess: (reply) => {
      router.push(reply.workspace ? `/workspaces/${reply.workspace.slug}` : '/workspaces');
      router.refresh();
    },
    onError: applyServerError,
  });
  const errors = formState.errors;
  return (
    <form noValidate onSubmit={handleSubmit((v) => mutation.mutate(v))} data-testid="sign-up-form">
      <TextField label="E-mail" type="email" autoComplete="email" registration={register('email')} error={errors.email?.message} testId="sign-up-email" />
      <TextField label="Your name" autoComplete="name" registration={register('displayName')} error={errors.displayName?.message} testId="sign-up-name" />
      <TextField
        label="Password"
        type="password"
        autoComplete="new-password"
        hint="10 to 72 characters."
        registration={register('password')}
        error={errors.password?.message}
        testId="sign-up-password"
      />
      <FormMessage message={formError ?? errors.invitationToken?.message ?? null} />
      <SubmitButton pending={mutation.isPending} testId="sign-up-submit">
        {invitationToken ? 'Create account and join' : 'Create account'}
      </SubmitButton>
    </form>
  );
}
