import type { RunFileInput } from '../../solver/runFile/schema';

type CiInput = NonNullable<RunFileInput['ci']>;
export type CiSpaceChoice = CiInput['space'] | 'none';

/**
 * The CI block after the user picks another space: counts they typed (frozen core, deleted
 * virtuals, roots, target multiplicity, method) carry over; what belongs to one space only
 * (the CI-k level, the CAS window) is added or dropped so the schema's cross-field rules hold.
 */
export function ciForSpace(space: CiSpaceChoice, previous: RunFileInput['ci']): RunFileInput['ci'] {
  if (space === 'none') return undefined;
  const { excitationLevel: _level, active: _active, activeOrbitals: _chosen, ras: _ras, ...kept } = previous ?? { space: 'FCI' as const };
  const next: CiInput = { frozenCore: 0, deletedVirtuals: 0, roots: 1, ...kept, space };
  if (space === 'CI') next.excitationLevel = previous?.excitationLevel ?? 2;
  if (space === 'CAS') next.active = previous?.active ?? { electrons: 2, orbitals: 2 };
  return next;
}

export const CI_SPACE_CHOICES: { id: CiSpaceChoice; label: string }[] = [
  { id: 'none', label: 'none (SCF only)' },
  { id: 'CIS', label: 'CIS' },
  { id: 'CISD', label: 'CISD' },
  { id: 'CISDT', label: 'CISDT' },
  { id: 'CISDTQ', label: 'CISDTQ' },
  { id: 'FCI', label: 'FCI' },
  { id: 'CAS', label: 'CAS (CASCI)' },
  { id: 'CI', label: 'CI-k (choose the level)' },
];
