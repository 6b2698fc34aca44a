/**
 * Size of a CI space by counting, without building it: per spin, the number of strings
 * in each class is accumulated orbital by orbital (a product of binomial choices, done as
 * a small dynamic programme in doubles so that e.g. 30 orbitals cannot overflow), then
 * determinants = Σ over allowed blocks of count_α·count_β.
 *
 * The memory model (bytes) is an upper estimate of what solveCi allocates:
 *   Davidson vectors  (2·M + 5·k + 7)·N·8        M = max subspace, k = roots, N = determinants:
 *                                                 the flat V and AV stores (2·M), Ritz vectors and
 *                                                 residuals (2·k), start vectors (k + 2), returned
 *                                                 and normalised vectors (2·k), diagonal, one
 *                                                 candidate, two transposed sigma work vectors and
 *                                                 the transpose permutation (Int32, ≤ 1);
 *                     or 3·N²·8 when N ≤ the dense limit (matrix, eigenvectors, work);
 *   string tables     (56 + 4·n_σ) bytes per string;
 *   single lists      32 bytes × n_σ(n − n_σ + 1) per string (two views, diagonal included);
 *   same-spin lists   36 bytes × min(strings, n_σ(n−n_σ) + C(n_σ,2)·C(n−n_σ,2)) per string;
 *   integrals         n⁴·8 (the unpacked (pq|rs) table the sigma build reads).
 */
import { formatBytes } from '../formatBytes';
import { SolverError } from '../errors';
import { blockAllowed, CiSpaceSpec, classKeyCode, spinOrbitalRoles, SpinOrbitalRoles, StringClassKey, validateSpec } from './spaceSpec';
import { DENSE_LIMIT_DETERMINANTS, defaultMaxSubspace } from './davidsonSettings';

export interface CiSpaceEstimate {
  determinants: number;
  alphaStrings: number;
  betaStrings: number;
  bytes: number;
}

interface CountedClass {
  key: StringClassKey;
  count: number;
}

/** Strings of one spin per class, by a dynamic programme over orbitals. */
function countStringClasses(roles: SpinOrbitalRoles): CountedClass[] {
  const n = roles.nOrbitals;
  const ne = roles.nElectrons;
  // state key: electrons placed, excitation, electrons in RAS1, particles, irrep
  type State = { electrons: number; excitation: number; inRas1: number; particles: number; irrep: number; count: number };
  let states = new Map<string, State>();
  states.set('0,0,0,0,0', { electrons: 0, excitation: 0, inRas1: 0, particles: 0, irrep: 0, count: 1 });
  for (let p = 0; p < n; p++) {
    const next = new Map<string, State>();
    const add = (s: State): void => {
      const key = `${s.electrons},${s.excitation},${s.inRas1},${s.particles},${s.irrep}`;
      const existing = next.get(key);
      if (existing) existing.count += s.count;
      else next.set(key, s);
    };
    for (const s of states.values()) {
      add({ ...s }); // orbital p empty
      if (s.electrons === ne) continue;
      const excitation = s.excitation + roles.isVirtual[p];
      const particles = s.particles + roles.inRas3[p];
      if (excitation > roles.maxExcitation || particles > roles.maxParticles) continue;
      add({
        electrons: s.electrons + 1,
        excitation,
        inRas1: s.inRas1 + roles.inRas1[p],
        particles,
        irrep: s.irrep ^ roles.irrep[p],
        count: s.count,
      });
    }
    states = next;
  }
  const classes: CountedClass[] = [];
  for (const s of states.values()) {
    if (s.electrons !== ne) continue;
    const holes = roles.ras1Size - s.inRas1;
    if (holes > roles.maxHoles) continue;
    classes.push({ key: { excitation: s.excitation, holes, particles: s.particles, irrep: s.irrep }, count: s.count });
  }
  return classes;
}

function binomial(n: number, k: number): number {
  if (k < 0 || k > n) return 0;
  let value = 1;
  for (let i = 1; i <= k; i++) value = (value * (n - k + i)) / i;
  return Math.round(value);
}

export function estimateCiSpace(spec: CiSpaceSpec, options: { orbitalIrreps?: Int32Array; roots?: number } = {}): CiSpaceEstimate {
  validateSpec(spec, options.orbitalIrreps);
  const alphaClasses = countStringClasses(spinOrbitalRoles(spec, 'alpha', options.orbitalIrreps));
  const betaClasses = countStringClasses(spinOrbitalRoles(spec, 'beta', options.orbitalIrreps));
  const usedAlpha = new Set<number>();
  const usedBeta = new Set<number>();
  let determinants = 0;
  for (const a of alphaClasses) {
    for (const b of betaClasses) {
      if (!blockAllowed(spec, a.key, b.key)) continue;
      determinants += a.count * b.count;
      usedAlpha.add(classKeyCode(a.key));
      usedBeta.add(classKeyCode(b.key));
    }
  }
  const alphaStrings = alphaClasses.filter((c) => usedAlpha.has(classKeyCode(c.key))).reduce((s, c) => s + c.count, 0);
  const betaStrings = betaClasses.filter((c) => usedBeta.has(classKeyCode(c.key))).reduce((s, c) => s + c.count, 0);

  const n = spec.nOrbitals;
  const roots = options.roots ?? 1;
  const subspace = Math.min(defaultMaxSubspace(roots), Math.max(determinants, 1));
  const vectorBytes =
    determinants <= DENSE_LIMIT_DETERMINANTS ? 3 * determinants * determinants * 8 : (2 * subspace + 5 * roots + 7) * determinants * 8;
  const spinTables = (strings: number, ne: number): number => {
    const singles = ne * (n - ne + 1);
    const sameSpin = Math.min(strings, ne * (n - ne) + binomial(ne, 2) * binomial(n - ne, 2));
    return strings * (56 + 4 * ne + 32 * singles + 36 * sameSpin);
  };
  const bytes = vectorBytes + spinTables(alphaStrings, spec.nAlpha) + spinTables(betaStrings, spec.nBeta) + n ** 4 * 8;
  return { determinants, alphaStrings, betaStrings, bytes };
}

function formatCount(x: number): string {
  if (x < 1e15) return Math.round(x).toString().replace(/\B(?=(\d{3})+(?!\d))/g, ',');
  return x.toExponential(3);
}


/** Refuses a space whose estimated memory exceeds the budget (default 1 GiB). */
export function checkBudget(estimate: CiSpaceEstimate, budgetBytes: number = 2 ** 30): void {
  if (estimate.bytes <= budgetBytes) return;
  const message =
    `The CI space has ${formatCount(estimate.determinants)} determinants ` +
    `(${formatCount(estimate.alphaStrings)} alpha × ${formatCount(estimate.betaStrings)} beta strings) and would need about ` +
    `${formatBytes(estimate.bytes)}, more than the ${formatBytes(budgetBytes)} budget. ` +
    'To shrink it: freeze core orbitals, delete high virtual orbitals, lower the excitation level (e.g. CISD instead of full CI), ' +
    'choose a smaller active window, or use a smaller basis.';
  throw new SolverError('over-budget', message, { details: { ...estimate, budgetBytes } });
}
