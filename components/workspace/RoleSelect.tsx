'use client';
import { useId } from 'react';
import type { UseFormRegisterReturn } from 'react-hook-form';
import { WORKSPACE_ROLES } from '@/app/lib/permissions';

export function RoleSelect({ label, registration, error, testId }: { label: string; registration: UseFormRegisterReturn; error?: string; testId?: string }) {
  const id = useId();
  return (
    <div className="mb-4">
      <label htmlFor={id} className="block text-sm font-semibold text-ink">
        {label}
      </label>
      <select id={id} aria-describedby={`${id}-error`} aria-invalid={error ? true : undefined} data-testid={testId} className="mt-1 block rounded-md border border-ink-soft/30 px-3 py-2" {...registration}>
        {WORKSPACE_ROLES.map((r) => (
          <option key={r} value={r}>
            {r}
          </option>
        ))}
      </select>
      <p id={`${id}-error`} aria-live="polite" className="mt-1 min-h-4 text-sm text-caution-700">
        {error ?? ''}
      </p>
    </div>
  );
}
