import type { RunFileInput } from '../../solver/runFile/schema';

type IntegralsSystem = Extract<RunFileInput['system'], { type: 'integrals' }>;

/**
 * Reads an uploaded integral file: Ketbook's integral layout (`"type": "integrals"`) on its
 * own, or a whole run file whose system is one. The numbers themselves are checked by the
 * run-file schema once they are in the form, and by the solver when it reads them.
 */
export function integralsFromJson(text: string): { system: IntegralsSystem } | { error: string } {
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (error) {
    return { error: `the file is not valid JSON: ${(error as Error).message}` };
  }
  const candidate =
    json && typeof json === 'object' && (json as { system?: unknown }).system && typeof (json as { system?: unknown }).system === 'object'
      ? (json as { system: unknown }).system
      : json;
  if (!candidate || typeof candidate !== 'object' || (candidate as { type?: unknown }).type !== 'integrals') {
    return { error: 'expected an object with "type": "integrals" (or a run file whose system is one)' };
  }
  return { system: candidate as IntegralsSystem };
}

export async function readIntegralsUpload(file: File): Promise<{ system: IntegralsSystem } | { error: string }> {
  return integralsFromJson(await file.text());
}
