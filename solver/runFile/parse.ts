import { runFileSchema, type RunFile } from './schema';
import { SolverError } from '../errors';

export interface FieldIssue {
  /** Dotted path into the run file, e.g. "system.atoms.2". */
  path: string;
  message: string;
}

/** Validate a parsed JSON value as a run file; bad input becomes one SolverError listing every issue. */
export function parseRunFile(value: unknown): RunFile {
  const parsed = runFileSchema.safeParse(value);
  if (parsed.success) return parsed.data;
  const issues: FieldIssue[] = parsed.error.issues.map((issue) => ({
    path: issue.path.map(String).join('.'),
    message: issue.message,
  }));
  const first = issues[0];
  const summary = issues.map((i) => (i.path ? `${i.path}: ${i.message}` : i.message)).join('; ');
  throw new SolverError('bad-input', `invalid run file — ${summary}`, { field: first?.path, details: issues });
}
