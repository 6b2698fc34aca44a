'use client';
import { useId } from 'react';
import type { UseFormRegisterReturn } from 'react-hook-form';

/**
 * A labelled input whose error sits in an aria-live region tied to it by
 * aria-describedby, so screen readers announce a message when it appears.
 */
export function TextField({
  label,
  registration,
  error,
  hint,
  type = 'text',
  autoComplete,
  testId,
  multiline = false,
}: {
  label: string;
  registration: UseFormRegisterReturn;
  error?: string;
  hint?: string;
  type?: string;
  autoComplete?: string;
  testId?: string;
  multiline?: boolean;
}) {
  const id = useId();
  const errorId = `${id}-error`;
  const hintId = `${id}-hint`;
  const describedBy = [hint ? hintId : null, errorId].filter(Boolean).join(' ');
  const className =
    'mt-1 block w-full rounded-md border px-3 py-2 text-ink shadow-sm focus:outline-none focus:ring-2 focus:ring-ket-500 ' +
    (error ? 'border-caution-500' : 'border-ink-soft/30');
  return (
    <div className="mb-4">
      <label htmlFor={id} className="block text-sm font-semibold text-ink">
        {label}
      </label>
      {hint ? (
        <p id={hintId} className="text-xs text-ink-soft">
          {hint}
        </p>
      ) : null}
      {multiline ? (
        <textarea id={id} rows={3} aria-invalid={error ? true : undefined} aria-describedby={describedBy} className={className} data-testid={testId} {...registration} />
      ) : (
        <input
          id={id}
          type={type}
          autoComplete={autoComplete}
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy}
          className={className}
          data-testid={testId}
          {...registration}
        />
      )}
      <p id={errorId} aria-live="polite" className="mt-1 min-h-4 text-sm text-caution-700" data-testid={testId ? `${testId}-error` : undefined}>
        {error ?? ''}
      </p>
    </div>
  );
}
