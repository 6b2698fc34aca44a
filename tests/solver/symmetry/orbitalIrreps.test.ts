import { describe, expect, it } from 'vitest';
import { EigenvalueDecomposition, Matrix } from 'ml-matrix';
import {
  basisFunctionOperation,
  characterTable,
  numberedOrbitalLabels,
  orbitalIrreps,
  symmetryFrame,
} from '../../../solver/symmetry';
import type { BasisSet } from '../../../solver/types';
import { atom, molecule, moved, rotationMatrix, testBasis, testOverlap } from './fixtures';

const ROTATION = rotationMatrix(-0.6, 0.9, 2.2);

/**
 * S-orthonormal orbitals that commute with the symmetry: eigenvectors u_k of S scaled by
 * 1/√λ_k (canonical orthogonalisation, Szabo & Ostlund (1996) §3.4.5), with λ as "energies".
 */
function canonicalOrbitals(S: Float64Array, n: number) {
  const rows = Array.from({ length: n }, (_, i) => Array.from(S.subarray(i * n, (i + 1) * n)));
  const eig = new EigenvalueDecomposition(new Matrix(rows), { assumeSymmetric: true });
  const values = eig.realEigenvalues;
  const vectors = eig.eigenvectorMatrix;
  const order = values.map((_, k) => k).sort((a, b) => values[a] - values[b]);
  const C = new Float64Array(n * n);
  order.forEach((k, j) => {
    for (let mu = 0; mu < n; mu++) C[mu * n + j] = vectors.get(mu, k) / Math.sqrt(values[k]);
  });
  return { C, energies: Float64Array.from(order, (k) => values[k]) };
}

function countLabels(labels: string[]): Record<string, number> {
  const counts: Record<string, number> = {};
  for (const l of labels) counts[l] = (counts[l] ?? 0) + 1;
  return counts;
}

function sMetricGram(C: Float64Array, S: Float64Array, n: number, cols: number[]): number[][] {
  return cols.map((i) =>
    cols.map((j) => {
      let s = 0;
      for (let mu = 0; mu < n; mu++) for (let nu = 0; nu < n; nu++) s += C[mu * n + i] * S[mu * n + nu] * C[nu * n + j];
      return s;
    }),
  );
}

/** Irrep multiplicities from traces of the basis representation, n_Γ = (1/h) Σ_R χ(R) χ_Γ(R). */
function reductionCounts(basis: BasisSet, frame: ReturnType<typeof symmetryFrame>): Record<string, number> {
  // Cotton (1990) ch. 4, reduction formula
  const table = characterTable(frame.pointGroup);
  const traces = table.operations.map((op) => {
    const k = frame.operations.findIndex((o) => o.name === op.name);
    const { target, sign } = basisFunctionOperation(basis, op, frame.atomPermutations[k]);
    let trace = 0;
    for (let mu = 0; mu < basis.nFunctions; mu++) if (target[mu] === mu) trace += sign[mu];
    return trace;
  });
  const counts: Record<string, number> = {};
  table.labels.forEach((label, g) => {
    const m = traces.reduce((s, t, o) => s + t * table.characters[g][o], 0) / traces.length;
    if (m > 0) counts[label] = m;
  });
  return counts;
}

describe('orbitalIrreps', () => {
  it('labels the minimal-basis H2 orbitals σg = Ag and σu = B1u', () => {
    // Szabo & Ostlund (1996) §3.5.2: ψ1 = (φ1 + φ2)/√(2(1+S)), ψ2 = (φ1 − φ2)/√(2(1−S))
    const frame = symmetryFrame(moved(molecule([atom('H', 1, [0, 0, 0]), atom('H', 1, [0, 0, 1.4])]), ROTATION, [0.5, 0, 0]));
    const basis = testBasis(frame.molecule);
    const S = testOverlap(basis);
    const s12 = S[1];
    const a = 1 / Math.sqrt(2 * (1 + s12));
    const b = 1 / Math.sqrt(2 * (1 - s12));
    const C = Float64Array.from([a, b, a, -b]);
    const result = orbitalIrreps(basis, frame, C, S, 2);
    expect(frame.pointGroup).toBe('D2h');
    expect(result.labels).toEqual(['Ag', 'B1u']);
    expect(Array.from(result.irreps)).toEqual([0, 5]);
    expect(result.maxDeviation).toBeLessThan(1e-12);
    expect(result.coefficients).toBe(C);
    const swapped = orbitalIrreps(basis, frame, Float64Array.from([b, a, -b, a]), S, 2);
    expect(swapped.labels).toEqual(['B1u', 'Ag']);
  });

  it('splits the water minimal basis into 4 a1 + 1 b1 + 2 b2 with the molecule in the yz plane', () => {
    // analytic: reduction formula on the basis representation (Cotton (1990) ch. 4); b1 = out of plane (x)
    const water = molecule([atom('O', 8, [0, 0, 0]), atom('H', 1, [1.4305, 1.1093, 0]), atom('H', 1, [-1.4305, 1.1093, 0])]);
    const frame = symmetryFrame(moved(water, ROTATION, [0, 1, 0]));
    const basis = testBasis(frame.molecule);
    const S = testOverlap(basis);
    const n = basis.nFunctions;
    const { C, energies } = canonicalOrbitals(S, n);
    const result = orbitalIrreps(basis, frame, C, S, n, energies);
    expect(result.maxDeviation).toBeLessThan(1e-10);
    expect(result.symmetrised).toEqual([]);
    expect(countLabels(result.labels)).toEqual({ A1: 4, B1: 1, B2: 2 });
    expect(countLabels(result.labels)).toEqual(reductionCounts(basis, frame));
    // The out-of-plane O 2p (x) is the b1 orbital: its only non-zero coefficient is O 2px.
    const j = result.labels.indexOf('B1');
    const column = Array.from({ length: n }, (_, mu) => Math.abs(C[mu * n + j]));
    expect(column.findIndex((c) => c > 1e-12)).toBe(2);
    expect(column.filter((c) => c > 1e-12).length).toBe(1);
  });

  it('symmetrises degenerate π orbitals that were rotated into each other (O2 in D2h)', () => {
    // analytic: per atom s, s, px, py, pz → 3 Ag + 3 B1u (σ), B3u + B2g (x), B2u + B3g (y)
    const o2 = molecule([atom('O', 8, [0, 0, 0]), atom('O', 8, [0, 0, 2.28])]);
    const frame = symmetryFrame(moved(o2, ROTATION, [0, 0, 1]));
    const basis = testBasis(frame.molecule);
    const S = testOverlap(basis);
    const n = basis.nFunctions;
    const { C, energies } = canonicalOrbitals(S, n);
    // Mix every exactly degenerate pair by a rotation of 0.5 rad.
    const mixed = Float64Array.from(C);
    const pairs: [number, number][] = [];
    for (let j = 0; j + 1 < n; j++) if (Math.abs(energies[j + 1] - energies[j]) < 1e-10) pairs.push([j, j + 1]);
    expect(pairs.length).toBe(2);
    for (const [p, q] of pairs) {
      for (let mu = 0; mu < n; mu++) {
        const x = C[mu * n + p];
        const y = C[mu * n + q];
        mixed[mu * n + p] = Math.cos(0.5) * x + Math.sin(0.5) * y;
        mixed[mu * n + q] = -Math.sin(0.5) * x + Math.cos(0.5) * y;
      }
    }
    // A loosely converged SCF may split a degenerate pair by a little more than 1e-8 hartree.
    const looseEnergies = Float64Array.from(energies);
    looseEnergies[pairs[0][1]] += 5e-8;
    for (const energiesGiven of [energies, looseEnergies, undefined]) {
      const result = orbitalIrreps(basis, frame, mixed, S, n, energiesGiven);
      expect(result.maxDeviation).toBeGreaterThan(0.1);
      expect(result.impureOrbitals).toEqual([]);
      expect(result.symmetrised).toEqual(pairs.flat());
      expect(countLabels(result.labels)).toEqual({ Ag: 3, B1u: 3, B3u: 1, B2g: 1, B2u: 1, B3g: 1 });
      expect(countLabels(result.labels)).toEqual(reductionCounts(basis, frame));
      // The new orbitals are pure, S-orthonormal, and span the same pair spaces.
      const again = orbitalIrreps(basis, frame, result.coefficients, S, n);
      expect(again.maxDeviation).toBeLessThan(1e-10);
      expect(Array.from(again.irreps)).toEqual(Array.from(result.irreps));
      const gram = sMetricGram(result.coefficients, S, n, Array.from({ length: n }, (_, k) => k));
      gram.forEach((row, i) => row.forEach((v, j) => expect(v).toBeCloseTo(i === j ? 1 : 0, 10)));
      for (const [p, q] of pairs) {
        for (let mu = 0; mu < n; mu++) {
          for (let nu = 0; nu < n; nu++) {
            const before = mixed[mu * n + p] * mixed[nu * n + p] + mixed[mu * n + q] * mixed[nu * n + q];
            const after = result.coefficients[mu * n + p] * result.coefficients[nu * n + p] + result.coefficients[mu * n + q] * result.coefficients[nu * n + q];
            expect(after).toBeCloseTo(before, 10);
          }
        }
        // Ketbook phase rule: the largest-|c| coefficient of each rotated MO is positive.
        for (const j of [p, q]) {
          let largest = 0;
          for (let mu = 0; mu < n; mu++) if (Math.abs(result.coefficients[mu * n + j]) > Math.abs(result.coefficients[largest * n + j])) largest = mu;
          expect(result.coefficients[largest * n + j]).toBeGreaterThan(0);
        }
      }
      expect(mixed).not.toBe(result.coefficients);
    }
  });

  it('reports orbitals that break the symmetry instead of relabelling them', () => {
    // analytic: ψ = cosθ σg + sinθ σu has χ(i) = cos²θ − sin²θ = cos 2θ
    const frame = symmetryFrame(molecule([atom('H', 1, [0, 0, 0]), atom('H', 1, [0, 0, 1.4])]));
    const basis = testBasis(frame.molecule);
    const S = testOverlap(basis);
    const s12 = S[1];
    const a = 1 / Math.sqrt(2 * (1 + s12));
    const b = 1 / Math.sqrt(2 * (1 - s12));
    const t = 0.3;
    const C = Float64Array.from([
      Math.cos(t) * a + Math.sin(t) * b,
      -Math.sin(t) * a + Math.cos(t) * b,
      Math.cos(t) * a - Math.sin(t) * b,
      -Math.sin(t) * a - Math.cos(t) * b,
    ]);
    const broken = orbitalIrreps(basis, frame, C, S, 2, [-0.5, 0.6]);
    expect(broken.maxDeviation).toBeCloseTo(1 - Math.cos(2 * t), 12);
    expect(broken.impureOrbitals).toEqual([0, 1]);
    expect(broken.coefficients).toEqual(C);
    // The same two orbitals declared degenerate are rotated back to σg and σu.
    const fixed = orbitalIrreps(basis, frame, C, S, 2, [0.1, 0.1]);
    expect(fixed.impureOrbitals).toEqual([]);
    expect(fixed.labels).toEqual(['Ag', 'B1u']);
    expect(fixed.coefficients[0]).toBeCloseTo(a, 12);
    expect(fixed.coefficients[2]).toBeCloseTo(a, 12);
  });
});

describe('numberedOrbitalLabels', () => {
  it('counts within each irrep in energy order', () => {
    // common practice, no source
    expect(numberedOrbitalLabels('C2v', [0, 0, 3, 0, 2, 0, 3])).toEqual(['1a1', '2a1', '1b2', '3a1', '1b1', '4a1', '2b2']);
    expect(numberedOrbitalLabels('Cs', [0, 1, 0])).toEqual(["1a'", "1a''", "2a'"]);
  });
});
