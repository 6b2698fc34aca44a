'use client';
import { zodResolver } from '@hookform/resolvers/zod';
import { useMutation } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { RunResult } from '@/solver/run/result';
import type { SavedRun } from '@/app/lib/queries/runs';
import { runDetailsFormSchema } from '@/app/lib/runs/runDetailsForm';
import type { z } from 'zod';
import { apiFetch } from '../forms/apiFetch';
import { FormMessage } from '../forms/FormMessage';
import { SubmitButton } from '../forms/SubmitButton';
import { TextField } from '../forms/TextField';
import { useServerErrors } from '../forms/useServerErrors';
import { ResultsView } from '../results/ResultsView';
import { ReproducePanel } from './ReproducePanel';
import { formatBytes } from '@/solver/formatBytes';

type DetailsIn = z.input<typeof runDetailsFormSchema>;
type DetailsOut = z.output<typeof runDetailsFormSchema>;

function EditDetails({ slug, run, onSaved, onCancel }: { slug: string; run: SavedRun; onSaved: (r: SavedRun) => void; onCancel: () => void }) {
  const { register, handleSubmit, setError, formState } = useForm<DetailsIn, unknown, DetailsOut>({
    resolver: zodResolver(runDetailsFormSchema),
    defaultValues: { title: run.title, tagsText: run.tags.join(', ') },
  });
  const { formError, applyServerError } = useServerErrors(setError, ['title']);
  const update = useMutation({
    mutationFn: (v: DetailsOut) => apiFetch<{ run: SavedRun }>(`/api/workspaces/${slug}/runs/${run.id}`, { method: 'PATCH', body: { title: v.title, tags: v.tagsText } }),
    onSuccess: (reply) => onSaved({ ...run, ...reply.run }),
    onError: applyServerError,
  });
  return (
    <form noValidate onSubmit={handleSubmit((v) => update.mutate(v))} className="grid gap-2 rounded-lg border border-ket-100 bg-ket-50/40 p-4" data-testid="edit-run-form">
      <TextField label="Title" registration={register('title')} error={formState.errors.title?.message} testId="edit-run-title" />
      <TextField label="Tags (comma-separated)" registration={register('tagsText')} error={formState.errors.tagsText?.message} testId="edit-run-tags" />
      <FormMessage message={formError} />
      <div className="flex gap-2">
        <SubmitButton pending={update.isPending} testId="edit-run-submit">
          Save changes
        </SubmitButton>
        <button type="button" onClick={onCancel} className="rounded-md px-4 py-2 text-sm text-ink-soft hover:bg-ink-soft/10">
          Cancel
        </button>
      </div>
    </form>
  );
}

/** A saved run: its details (editable by owners and editors), a reproduce check, and the stored result itself. */
export function SavedRunView({ slug, initialRun, canEdit, canDelete }: { slug: string; initialRun: SavedRun; canEdit: boolean; canDelete: boolean }) {
  const router = useRouter();
  const [run, setRun] = useState(initialRun);
  const [editing, setEditing] = useState(false);
  const remove = useMutation({
    mutationFn: () => apiFetch(`/api/workspaces/${slug}/runs/${run.id}`, { method: 'DELETE' }),
    onSuccess: () => router.push(`/workspaces/${slug}`),
  });
  const result = run.result as RunResult;
  return (
    <div className="grid gap-6">
      <header className="rounded-xl border border-ink-soft/15 bg-white p-5 shadow-sm" data-testid="saved-run-header">
        <h1 className="text-2xl font-bold tracking-tight text-ink" data-testid="saved-run-title">
          {run.title}
        </h1>
        <p className="mt-1 text-sm text-ink-soft" data-testid="saved-run-labels">
          {run.system} · {run.basis} · {run.method} · {run.determinantCount.toLocaleString('en')} determinants
        </p>
        <ul className="mt-2 flex flex-wrap gap-2" data-testid="saved-run-tags" aria-label="Tags">
          {run.tags.map((t) => (
            <li key={t} className="rounded-full bg-ket-50 px-2 py-0.5 text-xs font-medium text-ket-700">
              {t}
            </li>
          ))}
        </ul>
        <dl className="mt-3 grid grid-cols-[max-content_1fr] gap-x-4 gap-y-1 text-sm">
          <dt className="text-ink-soft">Saved</dt>
          <dd>
            {new Date(run.createdAt).toISOString().replace('T', ' ').slice(0, 19)} UTC{run.createdBy ? ` by ${run.createdBy}` : ''}
            {run.projectName ? `, project ${run.projectName}` : ''}
          </dd>
          <dt className="text-ink-soft">Run-file hash</dt>
          <dd className="font-mono text-xs" data-testid="saved-run-hash">
            {run.runFileHash}
          </dd>
          <dt className="text-ink-soft">CI vectors</dt>
          <dd data-testid="saved-run-vector">
            {run.vector ? (
              <>
                whole, {run.vector.roots} × {run.vector.length.toLocaleString('en')} values ({formatBytes(run.vector.bytes)} compressed) —{' '}
                <a className="text-ket-700 underline" href={`/api/workspaces/${slug}/runs/${run.id}/vector`} data-testid="download-vector">
                  download
                </a>{' '}
                (deflate, little-endian float64, root after root)
              </>
            ) : (
              'leading determinants only'
            )}
          </dd>
        </dl>
        <div className="mt-4 flex flex-wrap gap-2">
          {canEdit && !editing ? (
            <button type="button" onClick={() => setEditing(true)} className="rounded-md border border-ket-500 px-3 py-1.5 text-sm font-semibold text-ket-700 hover:bg-ket-50" data-testid="edit-run">
              Rename or tag
            </button>
          ) : null}
          {canDelete ? (
            <button
              type="button"
              onClick={() => {
                if (window.confirm(`Delete the run "${run.title}"? This cannot be undone.`)) remove.mutate();
              }}
              className="rounded-md border border-caution-500 px-3 py-1.5 text-sm font-semibold text-caution-700 hover:bg-caution-50"
              data-testid="delete-run"
            >
              Delete
            </button>
          ) : null}
        </div>
        {remove.isError ? <p className="mt-2 text-sm text-caution-700">{(remove.error as Error).message}</p> : null}
        {editing ? (
          <div className="mt-4">
            <EditDetails
              slug={slug}
              run={run}
              onSaved={(r) => {
                setRun(r);
                setEditing(false);
              }}
              onCancel={() => setEditing(false)}
            />
          </div>
        ) : null}
      </header>
      <ReproducePanel runFile={run.runFile} stored={result} />
      <ResultsView result={result} runFile={run.runFile} />
    </div>
  );
}
