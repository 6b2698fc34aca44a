/**
 * The solver's one error type. `code` decides how each face reports it: the CLI maps
 * bad-input → exit 2, over-budget → 3, not-converged → 4; the worker passes it to the page.
 * `field` names the run-file path at fault (e.g. "system.atoms[2]") so a form can show
 * the message beside the right input.
 */
export type SolverErrorCode = 'bad-input' | 'over-budget' | 'not-converged' | 'cancelled' | 'internal';

export class SolverError extends Error {
  readonly code: SolverErrorCode;
  readonly field?: string;
  readonly details?: unknown;

  constructor(code: SolverErrorCode, message: string, options: { field?: string; details?: unknown } = {}) {
    super(message);
    this.name = 'SolverError';
    this.code = code;
    this.field = options.field;
    this.details = options.details;
  }
}

export function badInput(message: string, field?: string): SolverError {
  return new SolverError('bad-input', message, { field });
}
