'use client';
import { zodResolver } from '@hookform/resolvers/zod';
import { useMutation } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { createProjectSchema, type CreateProjectInput } from '@/app/api/workspaces/[slug]/projects/schema';
import { ApiClientError, apiFetch } from '../forms/apiFetch';
import { FormMessage } from '../forms/FormMessage';
import { SubmitButton } from '../forms/SubmitButton';
import { TextField } from '../forms/TextField';
import { useServerErrors } from '../forms/useServerErrors';

export interface ProjectView {
  id: number;
  name: string;
  description: string;
}

function CreateProjectForm({ slug }: { slug: string }) {
  const router = useRouter();
  const { register, handleSubmit, setError, formState, reset } = useForm<CreateProjectInput>({
    resolver: zodResolver(createProjectSchema),
    defaultValues: { name: '', description: '' },
  });
  const { formError, applyServerError } = useServerErrors(setError, ['name', 'description']);
  const mutation = useMutation({
    mutationFn: (input: CreateProjectInput) => apiFetch(`/api/workspaces/${slug}/projects`, { method: 'POST', body: input }),
    onSuccess: () => {
      reset({ name: '', description: '' });
      router.refresh();
    },
    onError: applyServerError,
  });
  return (
    <form noValidate onSubmit={handleSubmit((v) => mutation.mutate(v))} data-testid="create-project-form" className="mt-4 rounded-lg border border-ket-100 bg-ket-50/40 p-4">
      <TextField label="Project name" registration={register('name')} error={formState.errors.name?.message} testId="project-name" />
      <TextField label="Description (optional)" multiline registration={register('description')} error={formState.errors.description?.message} testId="project-description" />
      <FormMessage message={formError} />
      <SubmitButton pending={mutation.isPending} testId="create-project-submit">
        Create project
      </SubmitButton>
    </form>
  );
}

function ProjectRow({ slug, project, canEdit }: { slug: string; project: ProjectView; canEdit: boolean }) {
  const router = useRouter();
  const [editing, setEditing] = useState(false);
  const [name, setName] = useState(project.name);
  const rename = useMutation({
    mutationFn: () => apiFetch(`/api/workspaces/${slug}/projects/${project.id}`, { method: 'PATCH', body: { name } }),
    onSuccess: () => {
      setEditing(false);
      router.refresh();
    },
  });
  const remove = useMutation({
    mutationFn: () => apiFetch(`/api/workspaces/${slug}/projects/${project.id}`, { method: 'DELETE' }),
    onSuccess: () => router.refresh(),
  });
  const error = rename.error ?? remove.error;
  return (
    <li className="py-2" data-testid={`project-${project.name}`}>
      {editing ? (
        <form
          className="flex flex-wrap items-center gap-2"
          onSubmit={(e) => {
            e.preventDefault();
            rename.mutate();
          }}
        >
          <label className="sr-only" htmlFor={`project-rename-${project.id}`}>
            New name for {project.name}
          </label>
          <input id={`project-rename-${project.id}`} value={name} onChange={(e) => setName(e.target.value)} className="rounded-md border border-ink-soft/30 px-2 py-1" data-testid="project-rename-input" />
          <button type="submit" className="text-sm font-semibold text-ket-700 underline" data-testid="project-rename-save">
            Save
          </button>
          <button type="button" className="text-sm underline" onClick={() => setEditing(false)}>
            Cancel
          </button>
        </form>
      ) : (
        <div className="flex flex-wrap items-center gap-3">
          <div className="flex-1">
            <p className="font-semibold">{project.name}</p>
            {project.description ? <p className="text-sm text-ink-soft">{project.description}</p> : null}
          </div>
          {canEdit ? (
            <>
              <button type="button" className="text-sm text-ket-700 underline" data-testid={`project-rename-${project.name}`} onClick={() => setEditing(true)}>
                Rename
              </button>
              <button
                type="button"
                className="text-sm text-caution-700 underline"
                data-testid={`project-delete-${project.name}`}
                onClick={() => {
                  if (window.confirm(`Delete the project "${project.name}"?`)) remove.mutate();
                }}
              >
                Delete
              </button>
            </>
          ) : null}
        </div>
      )}
      <FormMessage message={error ? (error instanceof ApiClientError ? error.message : 'Could not reach the server.') : null} />
    </li>
  );
}

/** Projects are named folders for the workspace's future runs and scans. Viewers see them read-only. */
export function ProjectsPanel({ slug, projects, canEdit }: { slug: string; projects: ProjectView[]; canEdit: boolean }) {
  return (
    <div>
      {projects.length === 0 ? (
        <p className="text-sm text-ink-soft" data-testid="projects-empty">
          No projects yet.
        </p>
      ) : (
        <ul className="divide-y divide-ink-soft/15" data-testid="project-list">
          {projects.map((p) => (
            <ProjectRow key={p.id} slug={slug} project={p} canEdit={canEdit} />
          ))}
        </ul>
      )}
      {canEdit ? <CreateProjectForm slug={slug} /> : null}
    </div>
  );
}
