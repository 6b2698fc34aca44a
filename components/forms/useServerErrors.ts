'use client';
import { useState } from 'react';
import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { ApiClientError } from './apiFetch';

/**
 * Puts the server's per-field messages on the form's fields and keeps the rest as one
 * form-level message, so server-side checks read exactly like client-side ones.
 */
export function useServerErrors<T extends FieldValues>(setError: UseFormSetError<T>, fieldNames: readonly string[]) {
  const [formError, setFormError] = useState<string | null>(null);
  const apply = (error: unknown) => {
    if (!(error instanceof ApiClientError)) {
      setFormError('Could not reach the server. Check your connection and try again.');
      return;
    }
    const leftovers: string[] = [];
    for (const [field, messages] of Object.entries(error.fields)) {
      if (fieldNames.includes(field)) setError(field as Path<T>, { type: 'server', message: messages.join(' ') });
      else leftovers.push(...messages);
    }
    const placed = Object.keys(error.fields).some((f) => fieldNames.includes(f));
    setFormError(placed && leftovers.length === 0 ? null : [error.message, ...leftovers].join(' '));
  };
  return { formError, setFormError, applyServerError: apply };
}
