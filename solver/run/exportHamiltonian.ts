import type { RunFile } from '../runFile/schema';
import { integralsFromOrbitalHamiltonian } from '../system/integralsFile';
import { badInput } from '../errors';
import { prepareSystem } from './prepareSystem';
import { moleculeProblem } from './scfStage';
import { runCiHamiltonian } from './hamiltonianMap';

/**
 * The Hamiltonian a run's CI diagonalises, over its active orbitals with the core folded in,
 * written in Ketbook's integral layout (`"type": "integrals"`), so that a user's own code can
 * start from exactly the same numbers — and so that Ketbook itself can read it back.
 * Integrals below `dropBelow` in magnitude are left out (0 keeps every non-zero one).
 * A run file without a CI section exports the full-CI orbital Hamiltonian of its SCF orbitals.
 */
export function exportOrbitalHamiltonian(runFile: RunFile, dropBelow = 0) {
  const withCi: RunFile = runFile.ci ? runFile : { ...runFile, ci: { space: 'FCI', frozenCore: 0, deletedVirtuals: 0, roots: 1, method: 'auto' } as RunFile['ci'] };
  const { spec, hamiltonian } = runCiHamiltonian(withCi);
  return {
    type: 'integrals' as const,
    electrons: spec.nAlpha + spec.nBeta,
    multiplicity: Math.abs(spec.nAlpha - spec.nBeta) + 1,
    ...integralsFromOrbitalHamiltonian(hamiltonian, dropBelow),
  };
}

/**
 * The molecule's Hamiltonian over its basis functions, before any SCF: the core Hamiltonian
 * T + V, the electron-repulsion integrals (μν|λσ), the nuclear repulsion as `coreEnergy`, and
 * the overlap matrix S, in the same integral layout. Reading it back orthogonalises the
 * functions first (Löwdin 1950), so its full-CI energy is the molecule's.
 */
export function exportBasisHamiltonian(runFile: RunFile, dropBelow = 0) {
  const prepared = prepareSystem(runFile);
  if (prepared.kind !== 'molecule') throw badInput('only molecule runs have basis functions; export the orbital Hamiltonian instead', 'system.type');
  const problem = moleculeProblem(prepared);
  const n = prepared.basis.nFunctions;
  const overlap: number[][] = [];
  for (let p = 0; p < n; p++) overlap.push(Array.from(problem.overlap.subarray(p * n, (p + 1) * n)));
  return {
    type: 'integrals' as const,
    electrons: prepared.nElectrons,
    multiplicity: prepared.twoS + 1,
    ...integralsFromOrbitalHamiltonian(
      { nOrbitals: n, coreEnergy: prepared.nuclearRepulsionHartree, h: problem.coreHamiltonian, eri: problem.eri },
      dropBelow,
    ),
    overlap,
  };
}
