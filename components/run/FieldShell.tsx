'use client';
import { useId } from 'react';

/**
 * A labelled control with its hint and its error beside it. The error sits in an aria-live
 * region that the control names in aria-describedby, so a screen reader announces it.
 * `children` receives the ids and the invalid flag to put on the control.
 */
export interface FieldControlProps {
  id: string;
  'aria-describedby': string;
  'aria-invalid': true | undefined;
}

export function FieldShell({
  label,
  error,
  hint,
  testId,
  children,
  className = '',
}: {
  label: string;
  error?: string;
  hint?: React.ReactNode;
  testId: string;
  children: (control: FieldControlProps) => React.ReactNode;
  className?: string;
}) {
  const id = useId();
  const hintId = `${id}-hint`;
  const errorId = `${id}-error`;
  return (
    <div className={`min-w-0 ${className}`}>
      <label htmlFor={id} className="block text-sm font-semibold text-ink">
        {label}
      </label>
      {children({ id, 'aria-describedby': hint ? `${hintId} ${errorId}` : errorId, 'aria-invalid': error ? true : undefined })}
      {hint ? (
        <p id={hintId} className="mt-1 text-xs text-ink-soft" data-testid={`${testId}-hint`}>
          {hint}
        </p>
      ) : null}
      <p id={errorId} aria-live="polite" className="mt-1 min-h-4 text-sm text-caution-700" data-testid={`${testId}-error`}>
        {error ?? ''}
      </p>
    </div>
  );
}

export function controlClass(invalid: boolean): string {
  return (
    'mt-1 block w-full rounded-md border bg-white px-3 py-2 text-sm text-ink shadow-sm focus:outline-none focus:ring-2 focus:ring-ket-500 ' +
    (invalid ? 'border-caution-500' : 'border-ink-soft/30')
  );
}

export function SectionCard({ title, children, testId, aside }: { title: string; children: React.ReactNode; testId: string; aside?: React.ReactNode }) {
  return (
    <section className="rounded-xl border border-ink-soft/15 bg-white p-5 shadow-sm" aria-label={title} data-testid={testId}>
      <div className="mb-3 flex items-baseline justify-between gap-3">
        <h2 className="text-lg font-semibold text-ink">{title}</h2>
        {aside}
      </div>
      {children}
    </section>
  );
}
