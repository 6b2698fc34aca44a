'use client';
import { zodResolver } from '@hookform/resolvers/zod';
import { useMutation } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { useForm } from 'react-hook-form';
import { createInvitationSchema, type CreateInvitationInput } from '@/app/api/workspaces/[slug]/invitations/schema';
import { apiFetch } from '../forms/apiFetch';
import { FormMessage } from '../forms/FormMessage';
import { SubmitButton } from '../forms/SubmitButton';
import { TextField } from '../forms/TextField';
import { useServerErrors } from '../forms/useServerErrors';
import { RoleSelect } from './RoleSelect';

export function InviteForm({ slug }: { slug: string }) {
  const router = useRouter();
  const { register, handleSubmit, setError, formState, reset } = useForm<CreateInvitationInput>({
    resolver: zodResolver(createInvitationSchema),
    defaultValues: { email: '', role: 'viewer' },
  });
  const { formError, applyServerError } = useServerErrors(setError, ['email', 'role']);
  const mutation = useMutation({
    mutationFn: (input: CreateInvitationInput) =>
      apiFetch<{ mailSent: boolean; invitation: { email: string } }>(`/api/workspaces/${slug}/invitations`, { method: 'POST', body: input }),
    onSuccess: () => {
      reset({ email: '', role: 'viewer' });
      router.refresh();
    },
    onError: applyServerError,
  });
  const sent = mutation.data
    ? mutation.data.mailSent
      ? `Invitation sent to ${mutation.data.invitation.email}.`
      : `Invitation created for ${mutation.data.invitation.email}, but the e-mail could not be sent.`
    : null;
  return (
    <form noValidate onSubmit={handleSubmit((v) => mutation.mutate(v))} data-testid="invite-form" className="grid gap-2 sm:grid-cols-[1fr_auto]">
      <TextField label="Colleague's e-mail" type="email" registration={register('email')} error={formState.errors.email?.message} testId="invite-email" />
      <RoleSelect label="Role" registration={register('role')} error={formState.errors.role?.message} testId="invite-role" />
      <div className="sm:col-span-2">
        <FormMessage message={formError ?? sent} tone={formError ? 'error' : 'ok'} />
        <SubmitButton pending={mutation.isPending} testId="invite-submit">
          Send invitation
        </SubmitButton>
      </div>
    </form>
  );
}
