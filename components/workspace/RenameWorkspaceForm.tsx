'use client';
import { zodResolver } from '@hookform/resolvers/zod';
import { useMutation } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { useForm } from 'react-hook-form';
import { updateWorkspaceSchema, type UpdateWorkspaceInput } from '@/app/api/workspaces/[slug]/schema';
import { apiFetch } from '../forms/apiFetch';
import { FormMessage } from '../forms/FormMessage';
import { SubmitButton } from '../forms/SubmitButton';
import { TextField } from '../forms/TextField';
import { useServerErrors } from '../forms/useServerErrors';

export function RenameWorkspaceForm({ slug, name, description }: { slug: string; name: string; description: string }) {
  const router = useRouter();
  const { register, handleSubmit, setError, formState } = useForm<UpdateWorkspaceInput>({
    resolver: zodResolver(updateWorkspaceSchema),
    defaultValues: { name, description },
  });
  const { formError, applyServerError } = useServerErrors(setError, ['name', 'description']);
  const mutation = useMutation({
    mutationFn: (input: UpdateWorkspaceInput) => apiFetch(`/api/workspaces/${slug}`, { method: 'PATCH', body: input }),
    onSuccess: () => router.refresh(),
    onError: applyServerError,
  });
  return (
    <form noValidate onSubmit={handleSubmit((v) => mutation.mutate(v))} data-testid="rename-workspace-form">
      <TextField label="Group name" registration={register('name')} error={formState.errors.name?.message} testId="rename-workspace-name" />
      <TextField label="Description" multiline registration={register('description')} error={formState.errors.description?.message} testId="rename-workspace-description" />
      <FormMessage message={formError ?? (mutation.isSuccess ? 'Saved.' : null)} tone={formError ? 'error' : 'ok'} />
      <SubmitButton pending={mutation.isPending} tone="quiet" testId="rename-workspace-submit">
        Save
      </SubmitButton>
    </form>
  );
}
