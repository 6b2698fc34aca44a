import { zodResolver } from '@hookform/resolvers/zod';
import type { FieldError, FieldErrors, Resolver } from 'react-hook-form';
import { runFileSchema, type RunFile, type RunFileInput } from '../../solver/runFile/schema';
import { systemParity } from './electronParity';

/**
 * The run builder's validation: the one run-file schema (solver/runFile/schema.ts), plus the
 * electron-count/multiplicity parity, which the schema leaves to the solver because it needs
 * the elements' nuclear charges. Doing it here puts the message beside the multiplicity
 * field as the user types, and keeps an impossible run from reaching the worker.
 */
const schemaResolver = zodResolver(runFileSchema);

/** Put `error` at a dotted path inside react-hook-form's nested error object. */
export function withErrorAt<T extends Record<string, unknown>>(errors: T, path: string, error: FieldError): T {
  const keys = path.split('.');
  const root: Record<string, unknown> = { ...errors };
  let node = root;
  keys.forEach((key, i) => {
    if (i === keys.length - 1) {
      node[key] = error;
      return;
    }
    const child = node[key];
    const copy = child && typeof child === 'object' ? { ...(child as Record<string, unknown>) } : {};
    node[key] = copy;
    node = copy;
  });
  return root as T;
}

export const runBuilderResolver: Resolver<RunFileInput, unknown, RunFile> = async (values, context, options) => {
  const outcome = await schemaResolver(values, context, options);
  const parity = systemParity(values.system);
  if (!parity || parity.ok) return outcome;
  const path = parity.electrons === null && values.system.type === 'molecule' ? 'system.atoms' : 'system.multiplicity';
  const errors = withErrorAt(outcome.errors as Record<string, unknown>, path, { type: 'parity', message: parity.message });
  return { values: {}, errors: errors as FieldErrors<RunFileInput> };
};

export interface FlatError {
  path: string;
  message: string;
}

/** Every message in a nested error object, with its dotted path (for the summary beside Run). */
export function flattenErrors(errors: unknown, prefix = ''): FlatError[] {
  if (!errors || typeof errors !== 'object') return [];
  const record = errors as Record<string, unknown>;
  if (typeof record.message === 'string' && ('type' in record || 'ref' in record)) {
    return [{ path: prefix, message: record.message }];
  }
  const out: FlatError[] = [];
  for (const [key, value] of Object.entries(record)) {
    if (key === 'ref' || key === 'type' || key === 'types') continue;
    out.push(...flattenErrors(value, prefix ? `${prefix}.${key}` : key));
  }
  return out;
}

/** Solver error fields are written "system.atoms[2]" or "system.atoms.2"; forms use dots. */
export function normaliseFieldPath(field: string): string {
  return field.replace(/\[(\d+)\]/g, '.$1').replace(/^\./, '');
}
