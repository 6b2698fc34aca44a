import { describe, expect, it } from 'vitest';
import { atomPermutation, operationByName, symmetricEigen3, symmetryFrame, atomKinds } from '../../../solver/symmetry';
import { atom, molecule, rotationMatrix } from './fixtures';

describe('symmetricEigen3', () => {
  it('diagonalises a symmetric matrix: A v = λ v with orthonormal v, ascending λ', () => {
    // analytic: Q diag(−1, 0.5, 3) Qᵀ has eigenvalues −1, 0.5, 3 and eigenvectors the columns of Q
    const Q = rotationMatrix(0.4, 1.3, -2.1);
    const d = [-1, 0.5, 3];
    const A = [0, 1, 2].map((i) => [0, 1, 2].map((j) => d.reduce((s, dk, k) => s + Q[i][k] * dk * Q[j][k], 0)));
    const { values, vectors } = symmetricEigen3(A);
    values.forEach((v, k) => expect(v).toBeCloseTo(d[k], 13));
    vectors.forEach((v, k) => {
      for (let i = 0; i < 3; i++) expect(A[i][0] * v[0] + A[i][1] * v[1] + A[i][2] * v[2]).toBeCloseTo(values[k] * v[i], 12);
      vectors.forEach((w, m) => expect(v[0] * w[0] + v[1] * w[1] + v[2] * w[2]).toBeCloseTo(k === m ? 1 : 0, 13));
      // Same line as Q's column k (up to sign).
      expect(Math.abs(v[0] * Q[0][k] + v[1] * Q[1][k] + v[2] * Q[2][k])).toBeCloseTo(1, 12);
    });
  });

  it('returns an orthonormal basis of a degenerate eigenspace', () => {
    const Q = rotationMatrix(1.0, 0.2, 0.7);
    const d = [2, 2, 5];
    const A = [0, 1, 2].map((i) => [0, 1, 2].map((j) => d.reduce((s, dk, k) => s + Q[i][k] * dk * Q[j][k], 0)));
    const { values, vectors } = symmetricEigen3(A);
    expect(values[0]).toBeCloseTo(2, 13);
    expect(values[1]).toBeCloseTo(2, 13);
    expect(values[2]).toBeCloseTo(5, 13);
    for (const v of vectors.slice(0, 2)) expect(v[0] * Q[0][2] + v[1] * Q[1][2] + v[2] * Q[2][2]).toBeCloseTo(0, 12);
  });
});

describe('atomPermutation and atomKinds', () => {
  it('maps water’s hydrogens onto each other under C2(z) and σ(xz), and fixes them under σ(yz)', () => {
    // common practice, no source: water in the yz plane
    const frame = symmetryFrame(molecule([atom('O', 8, [0, 0, 0]), atom('H', 1, [1.43, 1.11, 0]), atom('H', 1, [-1.43, 1.11, 0])]));
    expect(Array.from(atomPermutation(frame.molecule, operationByName('C2z'))!)).toEqual([0, 2, 1]);
    expect(Array.from(atomPermutation(frame.molecule, operationByName('sxz'))!)).toEqual([0, 2, 1]);
    expect(Array.from(atomPermutation(frame.molecule, operationByName('syz'))!)).toEqual([0, 1, 2]);
    expect(atomPermutation(frame.molecule, operationByName('C2x'))).toBeNull();
    expect(atomPermutation(frame.molecule, operationByName('i'))).toBeNull();
  });

  it('gives ghosts a kind of their own', () => {
    const kinds = atomKinds(molecule([atom('H', 1, [0, 0, 0]), atom('H', 1, [0, 0, 1], true), atom('H', 1, [0, 0, 2]), atom('He', 2, [0, 0, 3])]));
    expect(Array.from(kinds)).toEqual([0, 1, 0, 2]);
  });
});
