/**
 * The Hamiltonian map: the CI Hamiltonian of a run as a dense matrix with its determinants
 * ordered by excitation level relative to the reference determinant, so that the block
 * structure the Slater–Condon rules impose is visible — the reference–single block vanishes
 * for RHF orbitals (Brillouin's theorem, Szabo & Ostlund (1996) §3.3) and every element
 * between determinants differing in three or more spin orbitals is exactly zero
 * (Slater–Condon rules, Szabo & Ostlund (1996) §2.3.3).
 *
 * The map rebuilds exactly what the run's CI diagonalised — the same SCF, orbital selection,
 * core folding and determinant space — by calling the same pipeline functions, so its
 * eigenvalues are the run's full-CI root energies. It keeps a context (Hamiltonian, space,
 * order) so that a click is one Slater–Condon element, nothing more.
 */
import type { RunFile } from '../runFile/schema';
import type { OrbitalHamiltonian } from '../types';
import { badInput } from '../errors';
import { orbitalHamiltonian } from '../transform';
import { buildCiSpace, determinantIndexOfPatterns, type CiSpace } from '../ci/space';
import { estimateCiSpace } from '../ci/estimate';
import { determinantStrings } from '../ci/space';
import { occupationBitString, patternFromOrbitals } from '../ci/bits';
import { slaterCondonElement, type SlaterCondonTerm } from '../ci/slaterCondon';
import type { CiSpaceSpec } from '../ci/spaceSpec';
import { prepareSystem, type PreparedSystem } from './prepareSystem';
import { moleculeScf, modelScf, type ReferenceOrbitals } from './scfStage';
import { planCi, type CiStagePlan } from './ciStage';

/** Largest space the map draws: N² doubles = 50 MB at 2,500 determinants (common practice, no source). */
export const HAMILTONIAN_MAP_LIMIT = 2_500;

export interface RunCiHamiltonian {
  prepared: PreparedSystem;
  reference: ReferenceOrbitals | null;
  plan: CiStagePlan;
  spec: CiSpaceSpec;
  /** The Hamiltonian over the active orbitals with the core folded in, as the CI used it. */
  hamiltonian: OrbitalHamiltonian;
}

function identity(n: number): Float64Array {
  const m = new Float64Array(n * n);
  for (let i = 0; i < n; i++) m[i * n + i] = 1;
  return m;
}

/**
 * The orbital Hamiltonian a run's CI works with, built by the run's own stages
 * (prepareSystem → SCF → planCi → orbitalHamiltonian) in the same order and with the same
 * inputs as runCalculation, so that the numbers agree to the last bit.
 */
export function runCiHamiltonian(runFile: RunFile): RunCiHamiltonian {
  if (!runFile.ci) throw badInput('this run has no CI (the run file has no "ci" section), so there is no CI Hamiltonian', 'ci');
  const prepared = prepareSystem(runFile);
  let reference: ReferenceOrbitals | null = null;
  if (prepared.kind === 'molecule') reference = moleculeScf(prepared, runFile, {});
  else if (runFile.reference) reference = modelScf(prepared, runFile, {});
  if (reference && reference.scf.reference === 'UHF') {
    throw badInput('UHF orbitals differ per spin and the CI needs RHF or ROHF orbitals', 'reference');
  }
  const nOrbitals = prepared.kind === 'molecule' ? prepared.basis.nFunctions : prepared.hamiltonian.nOrbitals;
  const coreEnergy = prepared.kind === 'molecule' ? prepared.nuclearRepulsionHartree : prepared.hamiltonian.coreEnergy;
  const plan = planCi({
    ci: runFile.ci,
    nOrbitals,
    nElectrons: prepared.nElectrons,
    twoS: prepared.twoS,
    orbitalEnergies: reference?.orbitalEnergies,
    irreps: reference?.irreps ?? null,
    pointGroup: prepared.kind === 'molecule' ? prepared.pointGroup : null,
  });
  const model = prepared.kind === 'model' ? prepared.hamiltonian : null;
  const hamiltonian = orbitalHamiltonian({
    coreHamiltonianAO: reference ? reference.problem.coreHamiltonian : model!.h,
    eriAO: reference ? reference.problem.eri : model!.eri,
    coefficients: reference ? reference.coefficients : identity(nOrbitals),
    nBasis: nOrbitals,
    nuclearRepulsionHartree: coreEnergy,
    frozenOrbitals: plan.selection.core,
    activeOrbitals: plan.selection.active,
  });
  if (plan.activeIrreps) hamiltonian.orbitalIrreps = plan.activeIrreps;
  return { prepared, reference, plan, spec: plan.spec, hamiltonian };
}

/** One excitation level's stretch of rows and columns in the map. */
export interface MapLevelBlock {
  level: number;
  start: number;
  count: number;
}

/** What the page draws; the matrix is a transferable typed array. */
export interface HamiltonianMapView {
  size: number;
  /** ⟨D_I|H|D_J⟩ in map order, row-major size × size, in the run's energy unit. */
  matrix: Float64Array;
  /** Excitation level of each map position relative to the reference determinant. */
  excitationLevels: Int32Array;
  /** Occupation bit strings (Ketbook's notation) of each map position. */
  alpha: string[];
  beta: string[];
  blocks: MapLevelBlock[];
  /** Map position of the reference determinant, −1 when the space excludes it. */
  referencePosition: number;
  activeOrbitals: number;
  energyUnit: 'hartree' | 't';
}

/** What the worker keeps so that a click costs one Slater–Condon element. */
export interface HamiltonianMapContext {
  hamiltonian: OrbitalHamiltonian;
  space: CiSpace;
  /** order[position] = determinant index in the run's own determinant order. */
  order: Int32Array;
  patterns: { alpha: number; beta: number }[];
}

export interface ElementBreakdown {
  row: number;
  column: number;
  alphaI: string;
  betaI: string;
  alphaJ: string;
  betaJ: string;
  /** Spin orbitals of D_I not in D_J (the number of replacements): 0, 1, 2, or ≥ 3. */
  differingSpinOrbitals: number;
  phase: number;
  terms: SlaterCondonTerm[];
  /** Σ factor·integral over the terms. */
  termSum: number;
  /** phase × termSum: the element itself. */
  value: number;
}

function excitationLevelOf(space: CiSpace, index: number): number {
  const { alphaString, betaString } = determinantStrings(space, index);
  return space.alpha.classes[space.alpha.classOf[alphaString]].excitation + space.beta.classes[space.beta.classOf[betaString]].excitation;
}

function shrinkAdvice(count: number): string {
  return (
    `the Hamiltonian map draws at most ${HAMILTONIAN_MAP_LIMIT.toLocaleString('en-US')} determinants and this CI space has ` +
    `${count.toLocaleString('en-US')}. To shrink it: freeze core orbitals (ci.frozenCore), leave out high virtuals ` +
    '(ci.deletedVirtuals), choose a smaller active window (ci.active or ci.activeOrbitals), lower the excitation level, ' +
    'or restrict the space to one irrep (ci.irrep)'
  );
}

export function hamiltonianMap(runFile: RunFile): { view: HamiltonianMapView; context: HamiltonianMapContext } {
  const run = runCiHamiltonian(runFile);
  const estimate = estimateCiSpace(run.spec, { orbitalIrreps: run.plan.activeIrreps, roots: 1 });
  if (estimate.determinants > HAMILTONIAN_MAP_LIMIT) throw badInput(shrinkAdvice(estimate.determinants), 'ci');
  if (estimate.determinants === 0) throw badInput('the CI space is empty: no determinant satisfies the restrictions (irrep, RAS limits)', 'ci');
  const space = buildCiSpace(run.spec, run.plan.activeIrreps);
  const n = space.determinantCount;
  if (n > HAMILTONIAN_MAP_LIMIT) throw badInput(shrinkAdvice(n), 'ci');

  const levelOfIndex = Array.from({ length: n }, (_, i) => excitationLevelOf(space, i));
  // Stable sort by level: inside a level the run's own determinant order is kept.
  const orderList = Array.from({ length: n }, (_, i) => i).sort((x, y) => levelOfIndex[x] - levelOfIndex[y] || x - y);
  const order = Int32Array.from(orderList);
  const patterns = orderList.map((index) => {
    const { alphaString, betaString } = determinantStrings(space, index);
    return { alpha: space.alpha.patterns[alphaString], beta: space.beta.patterns[betaString] };
  });
  const matrix = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let j = i; j < n; j++) {
      const value = slaterCondonElement(run.hamiltonian, patterns[i], patterns[j]).value;
      matrix[i * n + j] = value;
      matrix[j * n + i] = value;
    }
  }
  const excitationLevels = Int32Array.from(orderList, (index) => levelOfIndex[index]);
  const blocks: MapLevelBlock[] = [];
  for (let i = 0; i < n; i++) {
    const last = blocks[blocks.length - 1];
    if (last && last.level === excitationLevels[i]) last.count++;
    else blocks.push({ level: excitationLevels[i], start: i, count: 1 });
  }
  const m = space.nOrbitals;
  const view: HamiltonianMapView = {
    size: n,
    matrix,
    excitationLevels,
    alpha: patterns.map((p) => occupationBitString(p.alpha, m)),
    beta: patterns.map((p) => occupationBitString(p.beta, m)),
    blocks,
    referencePosition: space.referenceIndex < 0 ? -1 : orderList.indexOf(space.referenceIndex),
    activeOrbitals: m,
    energyUnit: runFile.system.type === 'hubbard' ? 't' : 'hartree',
  };
  return { view, context: { hamiltonian: run.hamiltonian, space, order, patterns } };
}

function breakdownOf(
  hamiltonian: OrbitalHamiltonian,
  detI: { alpha: number; beta: number },
  detJ: { alpha: number; beta: number },
  row: number,
  column: number,
): ElementBreakdown {
  const element = slaterCondonElement(hamiltonian, detI, detJ);
  const termSum = element.terms.reduce((s, t) => s + t.factor * t.integral, 0);
  const m = hamiltonian.nOrbitals;
  return {
    row,
    column,
    alphaI: occupationBitString(detI.alpha, m),
    betaI: occupationBitString(detI.beta, m),
    alphaJ: occupationBitString(detJ.alpha, m),
    betaJ: occupationBitString(detJ.beta, m),
    differingSpinOrbitals: element.excitationDegree,
    phase: element.phase,
    terms: element.terms,
    termSum,
    value: element.value,
  };
}

/** The Slater–Condon breakdown of the element at map position (row, column). */
export function elementBreakdown(context: HamiltonianMapContext, row: number, column: number): ElementBreakdown {
  const n = context.patterns.length;
  for (const [name, v] of [['row', row], ['column', column]] as const) {
    if (!Number.isInteger(v) || v < 0 || v >= n) throw badInput(`${name} ${v} is outside the map (0…${n - 1})`);
  }
  return breakdownOf(context.hamiltonian, context.patterns[row], context.patterns[column], row, column);
}

function patternOfBitString(text: string, nOrbitals: number, what: string): number {
  if (typeof text !== 'string' || text.length !== nOrbitals || !/^[01]+$/.test(text)) {
    throw badInput(`${what} must be ${nOrbitals} characters of 0 and 1 (one per active orbital, orbital 0 first), got "${String(text)}"`);
  }
  const occupied: number[] = [];
  for (let p = 0; p < nOrbitals; p++) if (text[p] === '1') occupied.push(p);
  return patternFromOrbitals(occupied);
}

/** Map position of a determinant given in Ketbook's occupation notation, −1 when outside the space. */
export function mapPositionOf(context: HamiltonianMapContext, alpha: string, beta: string): number {
  const m = context.space.nOrbitals;
  const index = determinantIndexOfPatterns(context.space, patternOfBitString(alpha, m, 'the α string'), patternOfBitString(beta, m, 'the β string'));
  if (index < 0) return -1;
  return context.order.indexOf(index);
}

/** The breakdown of ⟨D_I|H|D_J⟩ for two determinants of the map picked by their bit strings. */
export function breakdownOfDeterminants(
  context: HamiltonianMapContext,
  first: { alpha: string; beta: string },
  second: { alpha: string; beta: string },
): ElementBreakdown {
  const row = mapPositionOf(context, first.alpha, first.beta);
  const column = mapPositionOf(context, second.alpha, second.beta);
  if (row < 0 || column < 0) {
    const missing = row < 0 ? first : second;
    throw badInput(`the determinant α ${missing.alpha} β ${missing.beta} is not in this run's CI space`);
  }
  return elementBreakdown(context, row, column);
}

/**
 * The breakdown for two determinants picked from the determinants table, without drawing the
 * map (so it works for spaces of any size): row and column are −1.
 */
export function pairBreakdown(
  run: RunCiHamiltonian,
  first: { alpha: string; beta: string },
  second: { alpha: string; beta: string },
): ElementBreakdown {
  const m = run.hamiltonian.nOrbitals;
  const detI = { alpha: patternOfBitString(first.alpha, m, 'the first α string'), beta: patternOfBitString(first.beta, m, 'the first β string') };
  const detJ = { alpha: patternOfBitString(second.alpha, m, 'the second α string'), beta: patternOfBitString(second.beta, m, 'the second β string') };
  return breakdownOf(run.hamiltonian, detI, detJ, -1, -1);
}
