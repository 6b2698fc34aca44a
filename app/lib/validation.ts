import type { z } from 'zod';
import { ApiError } from './errors';

/**
 * Turns zod issues into `{ field: [messages] }`. Unknown keys are rejected (every
 * request schema is a strict object), and each unknown key is reported under its own name.
 */
export function fieldErrorsFromIssues(issues: readonly z.core.$ZodIssue[]): Record<string, string[]> {
  const fields: Record<string, string[]> = {};
  const add = (key: string, message: string) => {
    (fields[key] ??= []).push(message);
  };
  for (const issue of issues) {
    if (issue.code === 'unrecognized_keys') {
      for (const key of issue.keys) add(key, 'Unknown field.');
      continue;
    }
    const key = issue.path.length > 0 ? issue.path.map(String).join('.') : '_form';
    add(key, issue.message);
  }
  return fields;
}

/** Validates an already-parsed JSON value; throws a 400 ApiError with per-field messages. */
export function parseWithSchema<S extends z.ZodType>(schema: S, value: unknown): z.output<S> {
  if (value === null || typeof value !== 'object' || Array.isArray(value)) {
    throw new ApiError('bad_request:body');
  }
  const result = schema.safeParse(value);
  if (!result.success) {
    throw new ApiError('bad_request:validation', { fields: fieldErrorsFromIssues(result.error.issues) });
  }
  return result.data;
}
