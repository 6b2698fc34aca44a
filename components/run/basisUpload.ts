/**
 * Reads an uploaded basis-set file: one of Ketbook's set objects (`"type": "custom"` or
 * `"even-tempered"`, layouts in solver/basis/schema.ts), or a run file whose molecule carries one.
 * Only the kind is checked here; the run-file schema checks every shell once it is in the form.
 */
export function basisFromJson(text: string): { basis: Record<string, unknown> } | { error: string } {
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (error) {
    return { error: `the file is not valid JSON: ${(error as Error).message}` };
  }
  const inner = (json as { system?: { basis?: unknown } } | null)?.system?.basis;
  const candidate = inner && typeof inner === 'object' ? inner : json;
  const type = (candidate as { type?: unknown } | null)?.type;
  if (!candidate || typeof candidate !== 'object' || Array.isArray(candidate) || (type !== 'custom' && type !== 'even-tempered')) {
    return { error: 'expected a basis-set object with "type": "custom" or "even-tempered" (or a run file whose system.basis is one)' };
  }
  return { basis: candidate as Record<string, unknown> };
}
