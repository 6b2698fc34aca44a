import { elementBySymbol } from '../../solver/system/elements';
import { SolverError } from '../../solver/errors';

/**
 * What the run builder can say about electrons and spin while the user types, before any
 * worker call: the electron count and whether the multiplicity 2S+1 fits it. A determinant
 * with N electrons and spin S needs N − 2S even and 2S ≤ N (common practice, no source).
 */
export interface ElectronParity {
  electrons: number | null;
  ok: boolean;
  /** One plain sentence: the count, and what is wrong if something is. */
  message: string;
}

type AtomLike = readonly [string, number, number, number, ({ ghost?: boolean } | undefined)?] | readonly unknown[];

/** Electrons of a molecule: Σ Z over real (non-ghost) atoms minus the charge. Throws bad input on an unknown element. */
export function moleculeElectronCount(atoms: readonly AtomLike[], charge: number): number {
  let nuclear = 0;
  atoms.forEach((atom, i) => {
    const marker = atom[4] as { ghost?: boolean } | undefined;
    if (marker?.ghost) return;
    nuclear += elementBySymbol(String(atom[0]), `system.atoms.${i}`).atomicNumber;
  });
  return nuclear - charge;
}

export function checkParity(electrons: number, multiplicity: number): ElectronParity {
  if (!Number.isInteger(electrons) || !Number.isInteger(multiplicity)) {
    return { electrons: Number.isInteger(electrons) ? electrons : null, ok: false, message: 'enter whole numbers for charge and multiplicity' };
  }
  const noun = (n: number) => `${n} electron${n === 1 ? '' : 's'}`;
  if (electrons < 1) return { electrons, ok: false, message: `${noun(electrons)}: a run needs at least one electron — lower the charge` };
  if (multiplicity < 1) return { electrons, ok: false, message: 'the multiplicity 2S+1 is at least 1' };
  const twoS = multiplicity - 1;
  if (twoS > electrons) {
    return { electrons, ok: false, message: `${noun(electrons)} allow at most multiplicity ${electrons + 1}` };
  }
  if ((electrons - twoS) % 2 !== 0) {
    const options = electrons % 2 === 0 ? 'odd (1, 3, 5, …)' : 'even (2, 4, …)';
    return { electrons, ok: false, message: `${noun(electrons)} cannot have multiplicity ${multiplicity}: it must be ${options}` };
  }
  return { electrons, ok: true, message: `${noun(electrons)}, multiplicity ${multiplicity}: consistent` };
}

/** The parity of whatever system the form holds; null when the form has no counts to judge yet. */
export function systemParity(system: unknown): ElectronParity | null {
  if (!system || typeof system !== 'object') return null;
  const s = system as Record<string, unknown>;
  const multiplicity = Number(s.multiplicity ?? 1);
  if (s.type === 'molecule') {
    if (!Array.isArray(s.atoms) || s.atoms.length === 0) return null;
    let electrons: number;
    try {
      electrons = moleculeElectronCount(s.atoms as AtomLike[], Number(s.charge ?? 0));
    } catch (error) {
      const message = error instanceof SolverError ? error.message : String(error);
      return { electrons: null, ok: false, message };
    }
    return checkParity(electrons, multiplicity);
  }
  if (s.type === 'hubbard' || s.type === 'integrals') {
    return checkParity(Number(s.electrons), multiplicity);
  }
  return null;
}
