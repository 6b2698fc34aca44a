import type { RunFileInput } from '../../solver/runFile/schema';

/** What the orbital picker shows per SCF orbital, from a quick SCF-only run. */
export interface PickerOrbital {
  index: number;
  energyHartree: number;
  irrep: string | null;
  /** Electrons in the reference: 0, 1 or 2. */
  occupation: number;
}

export type RasRole = 'ras1' | 'ras2' | 'ras3';

type Ci = NonNullable<RunFileInput['ci']>;

/**
 * A CAS window from ticked orbitals: its electrons are those the reference puts in them, so the
 * orbitals left out below the window stay doubly occupied (core) and those above stay empty
 * (outside), which is how the solver reads `activeOrbitals` (solver/run/orbitalSelection.ts).
 */
export function casFromPicked(current: RunFileInput['ci'], orbitals: PickerOrbital[], picked: number[]): Ci {
  const chosen = [...picked].sort((a, b) => a - b);
  const electrons = chosen.reduce((n, p) => n + (orbitals.find((o) => o.index === p)?.occupation ?? 0), 0);
  const { excitationLevel: _level, ras: _ras, ...rest } = current ?? { roots: 1, method: 'auto' as const };
  return { ...rest, space: 'CAS', active: { electrons, orbitals: chosen.length }, activeOrbitals: chosen, frozenCore: 0, deletedVirtuals: 0 };
}

/** RAS limits from the picker's per-orbital roles; only correlated orbitals can be in ras1 or ras3. */
export function rasFromRoles(roles: Map<number, RasRole>, maxHoles: number, maxParticles: number): NonNullable<Ci['ras']> {
  const pick = (role: RasRole) => [...roles.entries()].filter(([, r]) => r === role).map(([p]) => p).sort((a, b) => a - b);
  return { ras1: pick('ras1'), ras3: pick('ras3'), maxHoles, maxParticles };
}
