import type { RunFile } from '../runFile/schema';
import { orbitalHamiltonian } from '../transform';
import { integralsFromOrbitalHamiltonian } from '../system/integralsFile';
import { badInput } from '../errors';
import { prepareSystem } from './prepareSystem';
import { moleculeScf } from './scfStage';
import { planCi } from './ciStage';

/**
 * The Hamiltonian a run's CI diagonalises, over its active orbitals with the core folded in,
 * written in Ketbook's integral layout (`"type": "integrals"`), so that a user's own code can
 * start from exactly the same numbers — and so that Ketbook itself can read it back.
 * Integrals below `dropBelow` in magnitude are left out (0 keeps every non-zero one).
 */
export function exportOrbitalHamiltonian(runFile: RunFile, dropBelow = 0) {
  const prepared = prepareSystem(runFile);
  if (prepared.kind !== 'molecule') throw badInput('only molecule runs have SCF orbitals to export', 'system.type');
  const reference = moleculeScf(prepared, runFile, {});
  if (reference.scf.reference === 'UHF') throw badInput('UHF orbitals differ per spin; export RHF or ROHF orbitals', 'reference');
  const n = prepared.basis.nFunctions;
  const ci = runFile.ci ?? { space: 'FCI' as const, frozenCore: 0, deletedVirtuals: 0, roots: 1, method: 'auto' as const };
  const { selection, spec } = planCi({
    ci,
    nOrbitals: n,
    nElectrons: prepared.nElectrons,
    twoS: prepared.twoS,
    irreps: null,
    pointGroup: null,
  });
  const ham = orbitalHamiltonian({
    coreHamiltonianAO: reference.problem.coreHamiltonian,
    eriAO: reference.problem.eri,
    coefficients: reference.coefficients,
    nBasis: n,
    nuclearRepulsionHartree: prepared.nuclearRepulsionHartree,
    frozenOrbitals: selection.core,
    activeOrbitals: selection.active,
  });
  return {
    type: 'integrals' as const,
    electrons: spec.nAlpha + spec.nBeta,
    multiplicity: Math.abs(spec.nAlpha - spec.nBeta) + 1,
    ...integralsFromOrbitalHamiltonian(ham, dropBelow),
  };
}
