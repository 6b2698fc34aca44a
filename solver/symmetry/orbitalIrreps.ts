/**
 * Irrep labels of molecular orbitals from their characters. For MO i with coefficient column
 * c_i and a group operation R, χ_R(i) = c_iᵀ S (R c_i) / (c_iᵀ S c_i); a symmetry-pure MO has
 * χ_R = ±1 under every R, and the signs under the group's generators give its irrep integer
 * (see characterTables.ts).
 *
 * Exactly degenerate MOs (e.g. πx and πy of a linear molecule) may come out of a diagonaliser
 * as any rotation of each other, and then |χ| < 1. Such MOs are symmetrised inside their
 * degenerate set: the set is projected onto each irrep with P_Γ = (1/h) Σ_R χ_Γ(R) R
 * (Cotton (1990), ch. 6, projection operators) and each projected part re-orthonormalised in
 * the S metric (Gram–Schmidt with pivoting). Rotating within a degenerate set leaves the SCF
 * solution, its energy and density unchanged. The degenerate sets are MOs whose orbital
 * energies differ by less than 1e-8 hartree (when `orbitalEnergies` is given), otherwise the
 * smallest sets of MOs that the group's operations mix among themselves; when an energy set
 * cannot be symmetrised, the mixed set is used instead if its energies agree within 1e-6 hartree.
 *
 * Coefficients are row-major nFunctions × nOrbitals, MO j in column j: C[μ·nOrbitals + j].
 * The returned `coefficients` is the input array when nothing needed rotating, otherwise a new
 * array whose rotated MOs follow the phase rule (largest-|c| coefficient positive). A set that
 * cannot be symmetrised (the orbitals break the symmetry, e.g. a symmetry-broken SCF) is left
 * as it was; its MOs are labelled by the sign of each character and listed in `impureOrbitals`.
 */
import type { BasisSet } from '../types';
import { SolverError } from '../errors';
import { characterTable } from './characterTables';
import { basisFunctionOperation } from './basisFunctionOperation';
import type { MolecularSymmetry } from './symmetryFrame';

export interface OrbitalIrreps {
  /** Irrep integer of each MO (XOR-multiplying, see characterTables.ts). */
  irreps: Int32Array;
  /** Irrep label of each MO, e.g. "B1u". */
  labels: string[];
  /** Largest ||χ| − 1| of the input MOs under the group's generators, before any symmetrising. */
  maxDeviation: number;
  /** The MO coefficients with every MO symmetry-pure (the input array if unchanged). */
  coefficients: Float64Array;
  /** MOs that were rotated within their degenerate set. */
  symmetrised: number[];
  /** MOs that stayed impure: labels for these are only the nearest signs. */
  impureOrbitals: number[];
}

/** |χ| may miss 1 by this much and the MO still counts as pure. */
const PURITY_TOLERANCE = 1e-6;
const DEGENERACY_HARTREE = 1e-8;
const LOOSE_DEGENERACY_HARTREE = 1e-6;
/** A projected part shorter than this (S-norm) is taken as zero. */
const PROJECTION_FLOOR = 1e-3;

type SymmetryInput = Pick<MolecularSymmetry, 'pointGroup' | 'operations' | 'atomPermutations'>;

export function orbitalIrreps(
  basis: BasisSet,
  symmetry: SymmetryInput,
  coefficients: Float64Array,
  overlap: Float64Array,
  nOrbitals: number,
  orbitalEnergies?: ArrayLike<number>,
): OrbitalIrreps {
  const n = basis.nFunctions;
  const table = characterTable(symmetry.pointGroup);
  const h = table.operations.length;
  // R acting on a coefficient vector, for every operation of the group.
  const maps = table.operations.map((op) => {
    const k = symmetry.operations.findIndex((o) => o.name === op.name);
    if (k < 0) throw new SolverError('internal', `symmetry data lacks ${op.symbol} of ${table.group}`);
    return basisFunctionOperation(basis, op, symmetry.atomPermutations[k]);
  });
  const generatorOps = table.generators.map((g) => table.operations.findIndex((o) => o.name === g.name));

  const scratch = new Float64Array(n);
  const sx = new Float64Array(n);
  const applyOperation = (o: number, v: Float64Array, out: Float64Array) => {
    const { target, sign } = maps[o];
    for (let mu = 0; mu < n; mu++) out[target[mu]] = sign[mu] * v[mu];
  };
  const sInner = (a: Float64Array, b: Float64Array) => {
    // aᵀ S b
    let total = 0;
    for (let mu = 0; mu < n; mu++) {
      let row = 0;
      const base = mu * n;
      for (let nu = 0; nu < n; nu++) row += overlap[base + nu] * b[nu];
      total += a[mu] * row;
    }
    return total;
  };
  const column = (c: Float64Array, j: number) => {
    const v = new Float64Array(n);
    for (let mu = 0; mu < n; mu++) v[mu] = c[mu * nOrbitals + j];
    return v;
  };
  // Characters of a vector under the generators.
  const generatorCharacters = (v: Float64Array): number[] => {
    const normSq = sInner(v, v);
    return generatorOps.map((o) => {
      applyOperation(o, v, scratch);
      return sInner(v, scratch) / normSq;
    });
  };
  const irrepFromCharacters = (chi: number[]) => chi.reduce((x, c, j) => (c < 0 ? x | (1 << j) : x), 0);

  const irreps = new Int32Array(nOrbitals);
  const deviations = new Float64Array(nOrbitals);
  let maxDeviation = 0;
  const impure: number[] = [];
  for (let j = 0; j < nOrbitals; j++) {
    const chi = generatorCharacters(column(coefficients, j));
    let dev = 0;
    for (const c of chi) dev = Math.max(dev, Math.abs(Math.abs(c) - 1));
    deviations[j] = dev;
    maxDeviation = Math.max(maxDeviation, dev);
    irreps[j] = irrepFromCharacters(chi);
    if (dev > PURITY_TOLERANCE) impure.push(j);
  }

  let result = coefficients;
  const symmetrised: number[] = [];
  const stillImpure: number[] = [];
  if (impure.length > 0) {
    result = Float64Array.from(coefficients);
    const handled = new Set<number>();
    for (const j of impure) {
      if (handled.has(j)) continue;
      let set = orbitalEnergies ? degenerateSet(j, orbitalEnergies, nOrbitals) : mixingSet(j);
      let rotated = projectSet(set);
      if (!rotated && orbitalEnergies) {
        // An SCF converged loosely may split a degenerate pair by more than 1e-8 hartree; accept
        // the set the operations actually mix if its energies still agree within 1e-6 hartree.
        const mixing = mixingSet(j);
        const energies = mixing.map((k) => orbitalEnergies[k]);
        if (Math.max(...energies) - Math.min(...energies) < LOOSE_DEGENERACY_HARTREE) {
          const retry = projectSet(mixing);
          if (retry) {
            set = mixing;
            rotated = retry;
          }
        }
      }
      set.forEach((k) => handled.add(k));
      if (!rotated) {
        for (const k of set) if (deviations[k] > PURITY_TOLERANCE) stillImpure.push(k);
        continue;
      }
      set.forEach((k, t) => {
        const v = rotated.vectors[t];
        fixPhase(v);
        for (let mu = 0; mu < n; mu++) result[mu * nOrbitals + k] = v[mu];
        irreps[k] = rotated.irreps[t];
        symmetrised.push(k);
      });
    }
  }

  return {
    irreps,
    labels: Array.from(irreps, (x) => table.labels[x]),
    maxDeviation,
    coefficients: result,
    symmetrised: symmetrised.sort((a, b) => a - b),
    impureOrbitals: stillImpure.sort((a, b) => a - b),
  };

  /** MOs the group's operations mix with MO j, found by following couplings c_kᵀ S R c_j. */
  function mixingSet(j: number): number[] {
    const members = new Set<number>([j]);
    const queue = [j];
    while (queue.length > 0) {
      const i = queue.pop()!;
      const ci = column(coefficients, i);
      for (let o = 0; o < h; o++) {
        applyOperation(o, ci, scratch);
        // sx = S R c_i, then its overlap with every MO.
        for (let mu = 0; mu < n; mu++) {
          let row = 0;
          for (let nu = 0; nu < n; nu++) row += overlap[mu * n + nu] * scratch[nu];
          sx[mu] = row;
        }
        for (let k = 0; k < nOrbitals; k++) {
          if (members.has(k)) continue;
          let d = 0;
          for (let mu = 0; mu < n; mu++) d += coefficients[mu * nOrbitals + k] * sx[mu];
          if (Math.abs(d) > PURITY_TOLERANCE) {
            members.add(k);
            queue.push(k);
          }
        }
      }
    }
    return [...members].sort((a, b) => a - b);
  }

  /** Projects the MOs of `set` onto each irrep; null unless the set spans whole irreps. */
  function projectSet(set: number[]): { vectors: Float64Array[]; irreps: number[] } | null {
    const columns = set.map((k) => column(coefficients, k));
    const vectors: Float64Array[] = [];
    const labels: number[] = [];
    const image = new Float64Array(n);
    for (let g = 0; g < table.labels.length; g++) {
      const candidates = columns.map((c) => {
        const p = new Float64Array(n);
        for (let o = 0; o < h; o++) {
          applyOperation(o, c, image);
          const chi = table.characters[g][o] / h;
          for (let mu = 0; mu < n; mu++) p[mu] += chi * image[mu];
        }
        return p;
      });
      const kept: Float64Array[] = [];
      // Gram–Schmidt in the S metric, longest remaining candidate first.
      for (;;) {
        let bestIndex = -1;
        let bestNorm = PROJECTION_FLOOR;
        candidates.forEach((p, t) => {
          const length = Math.sqrt(Math.max(0, sInner(p, p)));
          if (length > bestNorm) {
            bestNorm = length;
            bestIndex = t;
          }
        });
        if (bestIndex < 0 || kept.length === set.length) break;
        const u = candidates[bestIndex];
        for (let mu = 0; mu < n; mu++) u[mu] /= bestNorm;
        candidates.splice(bestIndex, 1);
        kept.push(u);
        for (const p of candidates) {
          const overlapWithU = sInner(u, p);
          for (let mu = 0; mu < n; mu++) p[mu] -= overlapWithU * u[mu];
        }
      }
      for (const u of kept) {
        vectors.push(u);
        labels.push(g);
      }
    }
    if (vectors.length !== set.length) return null;
    for (let t = 0; t < vectors.length; t++) {
      const chi = generatorCharacters(vectors[t]);
      if (chi.some((c) => Math.abs(Math.abs(c) - 1) > PURITY_TOLERANCE)) return null;
    }
    return { vectors, irreps: labels };
  }
}

/** MOs whose energies chain to MO j's within DEGENERACY_HARTREE. */
function degenerateSet(j: number, energies: ArrayLike<number>, nOrbitals: number): number[] {
  const order = Array.from({ length: nOrbitals }, (_, k) => k).sort((a, b) => energies[a] - energies[b]);
  let lo = order.indexOf(j);
  let hi = lo;
  while (lo > 0 && energies[order[lo]] - energies[order[lo - 1]] < DEGENERACY_HARTREE) lo--;
  while (hi < nOrbitals - 1 && energies[order[hi + 1]] - energies[order[hi]] < DEGENERACY_HARTREE) hi++;
  return order.slice(lo, hi + 1).sort((a, b) => a - b);
}

function fixPhase(v: Float64Array) {
  let largest = 0;
  for (let mu = 0; mu < v.length; mu++) if (Math.abs(v[mu]) > Math.abs(v[largest])) largest = mu;
  if (v[largest] < 0) for (let mu = 0; mu < v.length; mu++) v[mu] = -v[mu];
}
