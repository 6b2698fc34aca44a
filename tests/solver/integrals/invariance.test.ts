import { describe, expect, it } from 'vitest';
import { EigenvalueDecomposition, Matrix } from 'ml-matrix';
import { buildMolecule, nuclearRepulsionHartree, rotateMolecule, translateMolecule } from '../../../solver/system/molecule';
import { buildBasis, type BasisSpec } from '../../../solver/basis';
import { overlapMatrix, kineticMatrix, nuclearAttractionMatrix, electronRepulsionIntegrals, eriIndex } from '../../../solver/integrals';
import type { Molecule } from '../../../solver/types';

// Fact of the trade: energies and spectra do not depend on where a molecule sits or how it is turned.
const water = buildMolecule({
  atoms: [
    { symbol: 'O', position: [0, 0, 0.1173] },
    { symbol: 'H', position: [0, 0.7572, -0.4692] },
    { symbol: 'H', position: [0, -0.7572, -0.4692] },
  ],
  units: 'angstrom',
  charge: 0,
  multiplicity: 1,
});

function rotation(axis: [number, number, number], angle: number): number[][] {
  const [x, y, z] = axis.map((v) => v / Math.hypot(...axis));
  const c = Math.cos(angle), s = Math.sin(angle), k = 1 - c;
  // Rodrigues' rotation formula (analytic)
  return [
    [c + x * x * k, x * y * k - z * s, x * z * k + y * s],
    [y * x * k + z * s, c + y * y * k, y * z * k - x * s],
    [z * x * k - y * s, z * y * k + x * s, c + z * z * k],
  ];
}

const sorted = (values: number[]) => [...values].sort((a, b) => a - b);
const toMatrix = (m: Float64Array, n: number) => new Matrix(Array.from({ length: n }, (_, i) => Array.from(m.subarray(i * n, i * n + n))));

/** Eigenvalues of S, and of the core Hamiltonian in the orthonormalised basis, plus a two-electron energy. */
function invariants(molecule: Molecule, spec: BasisSpec) {
  const basis = buildBasis(molecule, spec);
  const n = basis.nFunctions;
  const s = overlapMatrix(basis);
  const t = kineticMatrix(basis);
  const v = nuclearAttractionMatrix(basis, molecule);
  const sEig = new EigenvalueDecomposition(toMatrix(s, n), { assumeSymmetric: true });
  // Normalised Cartesian d components do not rotate orthogonally (xy carries √3 against xx), so
  // the eigenvalues of S are invariant only after reweighting dxy, dxz, dyz by √(2/3): the basis
  // xx, √2·xy, … is orthonormal under the rotation-invariant Frobenius product of quadratic forms
  // (analytic result). For s and p functions the weight is 1.
  const weight = basis.functionLabels.map((label) => (/d(xy|xz|yz)$/.test(label) ? Math.sqrt(2 / 3) : 1));
  const weighted = toMatrix(s, n);
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) weighted.set(i, j, weighted.get(i, j) * weight[i] * weight[j]);
  const wEig = new EigenvalueDecomposition(weighted, { assumeSymmetric: true });
  const x = sEig.eigenvectorMatrix.mmul(Matrix.diag(sEig.realEigenvalues.map((e) => 1 / Math.sqrt(e))));
  const h = toMatrix(t, n).add(toMatrix(v, n));
  const hEig = new EigenvalueDecomposition(x.transpose().mmul(h).mmul(x), { assumeSymmetric: true });
  // Closed-shell density of the five lowest core orbitals; E₂ = ½ΣP_μν P_λσ[(μν|λσ) − ½(μλ|νσ)] is a scalar.
  const order = hEig.realEigenvalues.map((e, i) => [e, i]).sort((a, b) => a[0] - b[0]);
  const c = x.mmul(hEig.eigenvectorMatrix);
  const p = new Float64Array(n * n);
  for (let k = 0; k < 5; k++) {
    const col = order[k][1];
    for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) p[i * n + j] += 2 * c.get(i, col) * c.get(j, col);
  }
  const eri = electronRepulsionIntegrals(basis);
  let e2 = 0;
  for (let a = 0; a < n; a++) for (let b = 0; b < n; b++) for (let cc = 0; cc < n; cc++) for (let d = 0; d < n; d++) {
    e2 += 0.5 * p[a * n + b] * p[cc * n + d] * (eri[eriIndex(a, b, cc, d)] - 0.5 * eri[eriIndex(a, cc, b, d)]);
  }
  let trace = 0;
  for (let i = 0; i < n; i++) trace += t[i * n + i] + v[i * n + i];
  return { sValues: sorted(sEig.realEigenvalues), weightedSValues: sorted(wEig.realEigenvalues), hValues: sorted(hEig.realEigenvalues), e2, trace, repulsion: nuclearRepulsionHartree(molecule) };
}

const moved = (m: Molecule) => rotateMolecule(translateMolecule(m, [0.7, -1.3, 2.1]), rotation([0.3, -0.5, 0.8], 1.1));

const dSet: BasisSpec = {
  type: 'even-tempered',
  elements: {
    O: { s: { count: 4, alpha: 0.3, beta: 3 }, p: { count: 2, alpha: 0.4, beta: 3 }, d: { count: 1, alpha: 1.2, beta: 2 } },
    H: { s: { count: 3, alpha: 0.15, beta: 3.5 }, p: { count: 1, alpha: 0.8, beta: 2 } },
  },
};

describe('invariance under translation and rotation', () => {
  for (const [name, spec] of [['STO-3G', 'STO-3G'], ['even-tempered with d', dSet]] as [string, BasisSpec][]) {
    it(name, () => {
      const a = invariants(water, spec);
      const b = invariants(moved(water), spec);
      expect(Math.abs(a.repulsion - b.repulsion)).toBeLessThan(1e-12);
      a.weightedSValues.forEach((value, i) => expect(Math.abs(value - b.weightedSValues[i])).toBeLessThan(1e-11));
      if (spec === 'STO-3G') a.sValues.forEach((value, i) => expect(Math.abs(value - b.sValues[i])).toBeLessThan(1e-11));
      a.hValues.forEach((value, i) => expect(Math.abs(value - b.hValues[i])).toBeLessThan(1e-9));
      expect(Math.abs(a.e2 - b.e2)).toBeLessThan(1e-9);
      expect(a.e2).toBeGreaterThan(1); // the two-electron energy is a sizeable positive number, not a trivial 0
    });
  }

  it('translation alone leaves S eigenvalues and the core-Hamiltonian trace of a d set unchanged', () => {
    const a = invariants(water, dSet);
    const b = invariants(translateMolecule(water, [3, -2, 1]), dSet);
    expect(Math.abs(a.trace - b.trace)).toBeLessThan(1e-10);
    a.sValues.forEach((value, i) => expect(Math.abs(value - b.sValues[i])).toBeLessThan(1e-11));
  });

  it('plain S eigenvalues of normalised Cartesian d functions do change under rotation', () => {
    // The reason for the reweighting above (analytic: the 6×6 rotation matrix of normalised
    // components is not orthogonal), checked so the comment cannot silently become false.
    const a = invariants(water, dSet);
    const b = invariants(moved(water), dSet);
    expect(Math.max(...a.sValues.map((value, i) => Math.abs(value - b.sValues[i])))).toBeGreaterThan(1e-3);
  });
});
