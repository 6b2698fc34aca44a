import { describe, expect, it } from 'vitest';
import { basisFunctionOperation, cartesianComponents, symmetryFrame, operationByName } from '../../../solver/symmetry';
import { atom, molecule, moved, rotationMatrix, testBasis, testOverlap, STO3G_LIKE } from './fixtures';

const water = molecule([atom('O', 8, [0, 0, 0]), atom('H', 1, [1.4305, 1.1093, 0]), atom('H', 1, [-1.4305, 1.1093, 0])]);
// An X atom (s, p and d shells) in the middle of a rectangle of four more: D2h with d functions.
const withD = molecule([
  atom('X', 5, [0, 0, 0]),
  atom('X', 5, [0.9, 1.7, 0]),
  atom('X', 5, [-0.9, 1.7, 0]),
  atom('X', 5, [-0.9, -1.7, 0]),
  atom('X', 5, [0.9, -1.7, 0]),
]);

describe('cartesianComponents', () => {
  it('orders p as x, y, z and d as xx, xy, xz, yy, yz, zz', () => {
    // Ketbook convention (DEVELOPERS.md), common practice, no source
    expect(Array.from(cartesianComponents(1))).toEqual([1, 0, 0, 0, 1, 0, 0, 0, 1]);
    expect(Array.from(cartesianComponents(2))).toEqual([2, 0, 0, 1, 1, 0, 1, 0, 1, 0, 2, 0, 0, 1, 1, 0, 0, 2]);
    expect(cartesianComponents(3).length / 3).toBe(10);
  });
});

describe('basisFunctionOperation', () => {
  it('gives each Cartesian function the product of the signs on its powers', () => {
    const frame = symmetryFrame(withD);
    const basis = testBasis(frame.molecule, STO3G_LIKE);
    const k = frame.operations.findIndex((op) => op.name === 'C2z');
    const { target, sign } = basisFunctionOperation(basis, operationByName('C2z'), frame.atomPermutations[k]);
    // Central atom's shells: s, p (x y z), d (xx xy xz yy yz zz). C2(z) reverses x and y.
    const central = Array.from({ length: 10 }, (_, mu) => [target[mu], sign[mu]]);
    expect(central).toEqual([
      [0, 1],
      [1, -1],
      [2, -1],
      [3, 1],
      [4, 1],
      [5, 1],
      [6, -1],
      [7, 1],
      [8, -1],
      [9, 1],
    ]);
  });

  it('leaves the overlap matrix invariant under every operation of the group', () => {
    // analytic: S_{R(μ)R(ν)} s_μ s_ν = S_μν because the overlap is invariant under orthogonal maps
    for (const m of [water, withD]) {
      const frame = symmetryFrame(moved(m, rotationMatrix(0.3, 2.0, 1.1), [1, 2, -3]));
      const basis = testBasis(frame.molecule, STO3G_LIKE);
      const S = testOverlap(basis);
      const n = basis.nFunctions;
      frame.operations.forEach((op, k) => {
        const { target, sign } = basisFunctionOperation(basis, op, frame.atomPermutations[k]);
        expect(new Set(target).size).toBe(n);
        let worst = 0;
        for (let mu = 0; mu < n; mu++) {
          for (let nu = 0; nu < n; nu++) {
            worst = Math.max(worst, Math.abs(S[target[mu] * n + target[nu]] * sign[mu] * sign[nu] - S[mu * n + nu]));
          }
        }
        expect(worst).toBeLessThan(1e-12);
      });
    }
  });

  it('the same map with a wrong sign would not leave the overlap invariant', () => {
    // guards the test above: flipping one sign must break invariance
    const frame = symmetryFrame(water);
    const basis = testBasis(frame.molecule, STO3G_LIKE);
    const S = testOverlap(basis);
    const n = basis.nFunctions;
    const k = frame.operations.findIndex((op) => op.name === 'syz');
    const { target, sign } = basisFunctionOperation(basis, frame.operations[k], frame.atomPermutations[k]);
    sign[4] = -sign[4]; // O 2pz
    let worst = 0;
    for (let mu = 0; mu < n; mu++) for (let nu = 0; nu < n; nu++) worst = Math.max(worst, Math.abs(S[target[mu] * n + target[nu]] * sign[mu] * sign[nu] - S[mu * n + nu]));
    expect(worst).toBeGreaterThan(1e-2);
  });

  it('refuses a basis that does not follow the atom permutation', () => {
    const frame = symmetryFrame(water);
    const basis = testBasis(frame.molecule, { ...STO3G_LIKE });
    basis.shells[basis.shells.length - 1] = { ...basis.shells[basis.shells.length - 1], exponents: Float64Array.from([1, 2, 3]) };
    const k = frame.operations.findIndex((op) => op.name === 'C2z');
    expect(() => basisFunctionOperation(basis, frame.operations[k], frame.atomPermutations[k])).toThrow(/not symmetric/);
  });
});
