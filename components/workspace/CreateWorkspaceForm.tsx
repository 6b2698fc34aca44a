'use client';
import { zodResolver } from '@hookform/resolvers/zod';
import { useMutation } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { createWorkspaceSchema, type CreateWorkspaceInput } from '@/app/api/workspaces/schema';
import { apiFetch } from '../forms/apiFetch';
import { FormMessage } from '../forms/FormMessage';
import { SubmitButton } from '../forms/SubmitButton';
import { TextField } from '../forms/TextField';
import { useServerErrors } from '../forms/useServerErrors';

/** Suggests an address from the name until the user edits the address themself. */
export function slugFromName(name: string): string {
  return name
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 80)
    .replace(/-+$/g, '');
}

export function CreateWorkspaceForm() {
  const router = useRouter();
  const [slugTouched, setSlugTouched] = useState(false);
  const { register, handleSubmit, setError, setValue, formState } = useForm<CreateWorkspaceInput>({
    resolver: zodResolver(createWorkspaceSchema),
    defaultValues: { name: '', slug: '', description: '' },
  });
  const { formError, applyServerError } = useServerErrors(setError, ['name', 'slug', 'description']);
  const mutation = useMutation({
    mutationFn: (input: CreateWorkspaceInput) =>
      apiFetch<{ workspace: { slug: string } }>('/api/workspaces', { method: 'POST', body: input }),
    onSuccess: (reply) => {
      router.push(`/workspaces/${reply.workspace.slug}`);
      router.refresh();
    },
    onError: applyServerError,
  });
  const nameField = register('name', {
    onChange: (e: React.ChangeEvent<HTMLInputElement>) => {
      if (!slugTouched) setValue('slug', slugFromName(e.target.value));
    },
  });
  const slugField = register('slug', { onChange: () => setSlugTouched(true) });
  return (
    <form noValidate onSubmit={handleSubmit((v) => mutation.mutate(v))} data-testid="create-workspace-form">
      <TextField label="Group name" registration={nameField} error={formState.errors.name?.message} testId="workspace-name" />
      <TextField
        label="Address"
        hint="Shown in links: /workspaces/<address>. Lower-case letters, digits and hyphens."
        registration={slugField}
        error={formState.errors.slug?.message}
        testId="workspace-slug"
      />
      <TextField label="Description (optional)" multiline registration={register('description')} error={formState.errors.description?.message} testId="workspace-description" />
      <FormMessage message={formError} />
      <SubmitButton pending={mutation.isPending} testId="create-workspace-submit">
        Create workspace
      </SubmitButton>
    </form>
  );
}
