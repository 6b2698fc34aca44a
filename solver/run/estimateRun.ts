import type { RunFile } from '../runFile/schema';
import { DEFAULT_BUDGET_BYTES } from '../runFile/schema';
import { estimateCiSpace, checkBudget } from '../ci';
import { SolverError } from '../errors';
import { prepareSystem } from './prepareSystem';
import { planCi } from './ciStage';
import type { RunEstimate } from './result';
import { formatBytes } from '../formatBytes';

/**
 * The size of a run before anything large is allocated: determinant count and memory,
 * from combinatorics alone. Before the SCF the orbitals' irreps are unknown, so an irrep
 * restriction is not counted here (the figure is then an upper bound; the run itself
 * checks the budget again with the exact count).
 */
export function estimateRun(runFile: RunFile): RunEstimate {
  const prepared = prepareSystem(runFile);
  const orbitals = prepared.kind === 'molecule' ? prepared.basis.nFunctions : prepared.hamiltonian.nOrbitals;
  const budgetBytes = runFile.budget?.memoryBytes ?? DEFAULT_BUDGET_BYTES;
  if (!runFile.ci) {
    const bytes = 8 * orbitals ** 4; // the AO integrals dominate an SCF-only run
    return { determinants: 1, bytes, budgetBytes, withinBudget: bytes <= budgetBytes, orbitals, activeOrbitals: 0, message: 'SCF only' };
  }
  const { irrep: _irrep, ...ciWithoutIrrep } = runFile.ci;
  const { spec } = planCi({
    ci: ciWithoutIrrep,
    nOrbitals: orbitals,
    nElectrons: prepared.nElectrons,
    twoS: prepared.twoS,
    irreps: null,
    pointGroup: null,
  });
  const estimate = estimateCiSpace(spec, { roots: runFile.ci.roots });
  let message = `${estimate.determinants.toLocaleString('en-US')} determinants, about ${formatBytes(estimate.bytes)}`;
  let withinBudget = true;
  try {
    checkBudget(estimate, budgetBytes);
  } catch (error) {
    if (!(error instanceof SolverError) || error.code !== 'over-budget') throw error;
    withinBudget = false;
    message = error.message;
  }
  if (runFile.ci.irrep) message += ' (before the irrep restriction, which shrinks it)';
  return {
    determinants: estimate.determinants,
    bytes: estimate.bytes,
    budgetBytes,
    withinBudget,
    orbitals,
    activeOrbitals: spec.nOrbitals,
    message,
  };
}
