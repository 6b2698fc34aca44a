'use client';
import { zodResolver } from '@hookform/resolvers/zod';
import { useMutation, useQuery } from '@tanstack/react-query';
import Link from 'next/link';
import { useEffect, useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import type { RunResult } from '@/solver/run/result';
import { saveRunFormSchema, type SaveRunFormInput, type SaveRunFormOutput } from '@/app/lib/runs/runDetailsForm';
import { ApiClientError, apiFetch } from '../forms/apiFetch';
import { FormMessage } from '../forms/FormMessage';
import { SubmitButton } from '../forms/SubmitButton';
import { TextField } from '../forms/TextField';
import { useServerErrors } from '../forms/useServerErrors';
import { planVectorUpload, withoutVectors } from './savedRunPayload';

interface WorkspaceOption {
  slug: string;
  name: string;
  access: string;
}

const selectClass = 'mt-1 w-full rounded-md border border-ink-soft/30 bg-white px-3 py-2 text-sm';

/**
 * Saves the run on screen to a workspace: run file, result, orbitals and the CI vectors (whole,
 * compressed, when they fit the limit) in one request that the server stores in one transaction.
 */
export function SaveRunPanel({ result, runFile }: { result: RunResult; runFile: unknown }) {
  const workspaces = useQuery({
    queryKey: ['workspaces'],
    queryFn: () => apiFetch<{ workspaces: WorkspaceOption[] }>('/api/workspaces'),
    retry: false,
  });
  const writable = (workspaces.data?.workspaces ?? []).filter((w) => w.access === 'owner' || w.access === 'editor');
  const defaultTitle = (runFile as { title?: string } | null)?.title ?? '';
  const form = useForm<SaveRunFormInput, unknown, SaveRunFormOutput>({
    resolver: zodResolver(saveRunFormSchema),
    defaultValues: { title: defaultTitle, tagsText: '', slug: '', projectId: '' },
  });
  const { register, handleSubmit, setError, formState, setValue, control } = form;
  const slug = useWatch({ control, name: 'slug' });
  useEffect(() => {
    if (!slug && writable.length > 0) setValue('slug', writable[0].slug);
  }, [slug, writable, setValue]);
  const projects = useQuery({
    queryKey: ['projects', slug],
    queryFn: () => apiFetch<{ projects: { id: number; name: string }[] }>(`/api/workspaces/${slug}/projects`),
    enabled: Boolean(slug),
  });
  const { formError, applyServerError } = useServerErrors(setError, ['title', 'tags', 'projectId']);
  const [saved, setSaved] = useState<{ url: string; note: string | null } | null>(null);

  const save = useMutation({
    mutationFn: async (values: SaveRunFormOutput) => {
      const plan = await planVectorUpload(result);
      const reply = await apiFetch<{ url: string }>(`/api/workspaces/${values.slug}/runs`, {
        method: 'POST',
        body: {
          title: values.title,
          tags: values.tagsText,
          projectId: values.projectId ? Number(values.projectId) : null,
          runFile,
          result: withoutVectors(result),
          ...(plan.vector ? { vector: plan.vector } : {}),
        },
      });
      return { url: reply.url, note: plan.note };
    },
    onSuccess: setSaved,
    onError: (error) => {
      if (error instanceof ApiClientError && error.fields.tags === undefined) {
        const tagKey = Object.keys(error.fields).find((k) => k.startsWith('tags.'));
        if (tagKey) setError('tagsText', { type: 'server', message: error.fields[tagKey].join(' ') });
      }
      applyServerError(error);
    },
  });

  if (workspaces.isError) {
    const unauthenticated = workspaces.error instanceof ApiClientError && workspaces.error.status === 401;
    return (
      <p className="text-sm text-ink-soft" data-testid="save-run-signed-out">
        {unauthenticated ? (
          <>
            To keep this run, <Link className="text-ket-700 underline" href="/sign-in" target="_blank">sign in in a new tab</Link> (this tab keeps the result), then
            come back here. Or download the run file and the result below.
          </>
        ) : (
          'The workspace list could not be loaded; download the run file and the result to keep them.'
        )}
      </p>
    );
  }
  if (workspaces.isPending) return <p className="text-sm text-ink-soft">Loading your workspaces…</p>;
  if (writable.length === 0) {
    return (
      <p className="text-sm text-ink-soft" data-testid="save-run-no-workspace">
        You are not an owner or editor of any workspace, so there is nowhere to save this run. <Link className="text-ket-700 underline" href="/workspaces/new" target="_blank">Create a workspace</Link> in a new tab.
      </p>
    );
  }
  if (saved) {
    return (
      <div className="grid gap-2 text-sm" data-testid="save-run-done">
        <p>
          Saved. Its address is stable:{' '}
          <Link className="font-semibold text-ket-700 underline" href={saved.url} data-testid="saved-run-link">
            {saved.url}
          </Link>
        </p>
        {saved.note ? <p className="text-caution-700" data-testid="save-run-vector-note">{saved.note}</p> : null}
      </div>
    );
  }
  return (
    <form noValidate onSubmit={handleSubmit((v) => save.mutate(v))} className="grid gap-3 md:grid-cols-2" data-testid="save-run-form">
      <label className="text-sm font-medium text-ink">
        Workspace
        <select className={selectClass} {...register('slug')} data-testid="save-run-workspace">
          {writable.map((w) => (
            <option key={w.slug} value={w.slug}>
              {w.name}
            </option>
          ))}
        </select>
      </label>
      <label className="text-sm font-medium text-ink">
        Project (optional)
        <select className={selectClass} {...register('projectId')} data-testid="save-run-project">
          <option value="">No project</option>
          {(projects.data?.projects ?? []).map((p) => (
            <option key={p.id} value={String(p.id)}>
              {p.name}
            </option>
          ))}
        </select>
        {formState.errors.projectId ? <span className="mt-1 block text-caution-700">{formState.errors.projectId.message}</span> : null}
      </label>
      <TextField label="Title" registration={register('title')} error={formState.errors.title?.message} testId="save-run-title" />
      <TextField
        label="Tags (comma-separated, optional)"
        registration={register('tagsText')}
        error={formState.errors.tagsText?.message}
        testId="save-run-tags"
      />
      <div className="md:col-span-2">
        <FormMessage message={formError} />
        <SubmitButton pending={save.isPending} testId="save-run-submit">
          Save to workspace
        </SubmitButton>
      </div>
    </form>
  );
}
