import { parseXyz } from '../../solver/system/xyz';
import { SolverError } from '../../solver/errors';
import { BOHR_TO_ANGSTROM } from '../../solver/constants';

type AtomRow = [string, number, number, number];

/** Atoms from pasted XYZ text (ångström), or the parser's message naming the bad line. */
export function atomsFromXyz(text: string): { atoms: AtomRow[]; comment: string } | { error: string } {
  try {
    const content = parseXyz(text);
    return { atoms: content.atoms.map((a) => [a.symbol, a.position[0], a.position[1], a.position[2]]), comment: content.comment };
  } catch (error) {
    return { error: error instanceof SolverError ? error.message : String(error) };
  }
}

/** The form's atoms written as XYZ text in ångström, so the paste box starts from what is loaded. */
export function atomsToXyz(atoms: readonly (readonly unknown[])[], units: 'bohr' | 'angstrom', comment: string): string {
  const scale = units === 'bohr' ? BOHR_TO_ANGSTROM : 1;
  const lines = atoms.map((atom) => {
    const [symbol, x, y, z] = atom as AtomRow;
    return [symbol.padEnd(2), ...[x, y, z].map((c) => (c * scale).toFixed(8).padStart(14))].join(' ');
  });
  return [String(atoms.length), comment.replace(/\n/g, ' '), ...lines].join('\n');
}
