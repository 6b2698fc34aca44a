import { describe, expect, it } from 'vitest';
import { symmetryFrame, characterTable, type PointGroupName } from '../../../solver/symmetry';
import type { Molecule, Vec3 } from '../../../solver/types';
import { atom, distance, molecule, moved, rotationMatrix } from './fixtures';

// Shapes in bohr. The numbers only fix shapes; the point groups are facts of the trade
// (Cotton (1990) ch. 3) reduced to their largest abelian subgroup within D2h.
const H2 = molecule([atom('H', 1, [0, 0, 0]), atom('H', 1, [0, 0, 1.4])]);
const HeHplus = molecule([atom('He', 2, [0, 0, 0]), atom('H', 1, [0, 0, 1.4632])], 1);
const water = molecule([atom('O', 8, [0, 0, 0]), atom('H', 1, [1.4305, 1.1093, 0]), atom('H', 1, [-1.4305, 1.1093, 0])]);
const ammoniaLike = molecule([
  atom('N', 7, [0, 0, 0.3]),
  ...[0, 1, 2].map((k) => atom('H', 1, [1.77 * Math.cos((2 * Math.PI * k) / 3), 1.77 * Math.sin((2 * Math.PI * k) / 3), -0.4])),
]);
const methaneLike = molecule([
  atom('C', 6, [0, 0, 0]),
  atom('H', 1, [1.19, 1.19, 1.19]),
  atom('H', 1, [1.19, -1.19, -1.19]),
  atom('H', 1, [-1.19, 1.19, -1.19]),
  atom('H', 1, [-1.19, -1.19, 1.19]),
]);
const squareH4 = molecule([atom('H', 1, [1, 1, 0]), atom('H', 1, [-1, 1, 0]), atom('H', 1, [-1, -1, 0]), atom('H', 1, [1, -1, 0])]);
const rectangleH4 = molecule([atom('H', 1, [0.7, 1.5, 0]), atom('H', 1, [-0.7, 1.5, 0]), atom('H', 1, [-0.7, -1.5, 0]), atom('H', 1, [0.7, -1.5, 0])]);
const chainH3 = molecule([atom('H', 1, [0, 0, 0]), atom('H', 1, [0, 0, 1.4]), atom('H', 1, [0, 0, 3.4])], 1);
const randomCluster = molecule([
  atom('H', 1, [0.13, -0.42, 0.77]),
  atom('H', 1, [1.91, 0.35, -0.28]),
  atom('Li', 3, [-0.64, 1.52, 0.41]),
  atom('H', 1, [0.22, 0.08, -1.66]),
]);
const transPeroxideLike = molecule([
  atom('O', 8, [1.37, 0, 0]),
  atom('O', 8, [-1.37, 0, 0]),
  atom('H', 1, [1.9, 1.7, 0]),
  atom('H', 1, [-1.9, -1.7, 0]),
]);
// Skew: a C2 along y swaps the halves (x, y, z) → (−x, y, −z); dihedral angle not 0 or 180°.
const skewPeroxideLike = molecule([
  atom('O', 8, [1.37, 0, 0]),
  atom('O', 8, [-1.37, 0, 0]),
  atom('H', 1, [1.9, 1.7 * Math.cos(0.95), 1.7 * Math.sin(0.95)]),
  atom('H', 1, [-1.9, 1.7 * Math.cos(0.95), -1.7 * Math.sin(0.95)]),
]);
const centrosymmetric = molecule([
  atom('H', 1, [1, 0.3, 0.2]),
  atom('H', 1, [-1, -0.3, -0.2]),
  atom('F', 9, [0.2, 1.1, -0.4]),
  atom('F', 9, [-0.2, -1.1, 0.4]),
  atom('Li', 3, [-0.5, 0.2, 1.3]),
  atom('Li', 3, [0.5, -0.2, -1.3]),
]);
const octahedralLike = molecule([
  atom('S', 16, [0, 0, 0]),
  ...([
    [3, 0, 0],
    [-3, 0, 0],
    [0, 3, 0],
    [0, -3, 0],
    [0, 0, 3],
    [0, 0, -3],
  ] as Vec3[]).map((p) => atom('F', 9, p)),
]);
const hexagonLike = molecule(
  Array.from({ length: 6 }, (_, k) => atom('C', 6, [2.6 * Math.cos((k * Math.PI) / 3), 2.6 * Math.sin((k * Math.PI) / 3), 0])),
);
const staggeredEthaneLike = molecule([
  atom('C', 6, [0, 0, 1.45]),
  atom('C', 6, [0, 0, -1.45]),
  ...[0, 1, 2].map((k) => atom('H', 1, [1.9 * Math.cos((2 * Math.PI * k) / 3), 1.9 * Math.sin((2 * Math.PI * k) / 3), 2.1])),
  ...[0, 1, 2].map((k) => atom('H', 1, [1.9 * Math.cos((2 * Math.PI * k) / 3 + Math.PI / 3), 1.9 * Math.sin((2 * Math.PI * k) / 3 + Math.PI / 3), -2.1])),
]);
const alleneLike = molecule([
  atom('C', 6, [0, 0, 0]),
  atom('C', 6, [0, 0, 2.5]),
  atom('C', 6, [0, 0, -2.5]),
  atom('H', 1, [1.75, 0, 3.5]),
  atom('H', 1, [-1.75, 0, 3.5]),
  atom('H', 1, [0, 1.75, -3.5]),
  atom('H', 1, [0, -1.75, -3.5]),
]);

const ROTATION = rotationMatrix(0.7, 1.1, -0.4);
const SHIFT: Vec3 = [0.3, -1.2, 2.5];

function expectFrameConsistent(input: Molecule, result: ReturnType<typeof symmetryFrame>) {
  const R = result.rotation;
  // A proper rotation: orthonormal rows, determinant +1.
  for (let i = 0; i < 3; i++) for (let j = 0; j < 3; j++) expect(R[i].reduce((s, v, k) => s + v * R[j][k], 0)).toBeCloseTo(i === j ? 1 : 0, 12);
  const det =
    R[0][0] * (R[1][1] * R[2][2] - R[1][2] * R[2][1]) - R[0][1] * (R[1][0] * R[2][2] - R[1][2] * R[2][0]) + R[0][2] * (R[1][0] * R[2][1] - R[1][1] * R[2][0]);
  expect(det).toBeCloseTo(1, 12);
  // r_frame = R (r − origin), up to the symmetrising moves (< tolerance).
  input.atoms.forEach((a, index) => {
    const d = a.positionBohr.map((x, k) => x - result.originBohr[k]);
    const expected = R.map((row) => row[0] * d[0] + row[1] * d[1] + row[2] * d[2]) as Vec3;
    expect(distance(expected, result.molecule.atoms[index].positionBohr)).toBeLessThan(1e-6);
    expect(result.molecule.atoms[index].symbol).toBe(a.symbol);
    expect(result.molecule.atoms[index].ghost).toBe(a.ghost);
  });
  // Every operation of the group maps each atom exactly onto its listed image.
  const table = characterTable(result.pointGroup);
  expect(result.operations.map((op) => op.name)).toEqual(table.operations.map((op) => op.name));
  result.operations.forEach((op, k) => {
    const perm = result.atomPermutations[k];
    result.molecule.atoms.forEach((a, index) => {
      const image = a.positionBohr.map((x, c) => op.signs[c] * x) as Vec3;
      expect(distance(image, result.molecule.atoms[perm[index]].positionBohr)).toBeLessThan(1e-12);
      expect(result.molecule.atoms[perm[index]].symbol).toBe(a.symbol);
    });
  });
}

const CASES: [string, Molecule, PointGroupName][] = [
  ['H2 (D∞h → D2h)', H2, 'D2h'],
  ['HeH+ (C∞v → C2v)', HeHplus, 'C2v'],
  ['H2O', water, 'C2v'],
  ['NH3-like (C3v → Cs)', ammoniaLike, 'Cs'],
  ['CH4-like (Td → D2)', methaneLike, 'D2'],
  ['square H4 (D4h → D2h)', squareH4, 'D2h'],
  ['rectangular H4', rectangleH4, 'D2h'],
  ['linear H3+ with unequal bonds (C∞v → C2v)', chainH3, 'C2v'],
  ['no symmetry', randomCluster, 'C1'],
  ['trans-planar HOOH-like', transPeroxideLike, 'C2h'],
  ['skew HOOH-like', skewPeroxideLike, 'C2'],
  ['inversion centre only', centrosymmetric, 'Ci'],
  ['SF6-like (Oh → D2h)', octahedralLike, 'D2h'],
  ['benzene-ring-like C6 (D6h → D2h)', hexagonLike, 'D2h'],
  ['staggered ethane-like (D3d → C2h)', staggeredEthaneLike, 'C2h'],
  ['allene-like (D2d → D2, by the stated tie order)', alleneLike, 'D2'],
];

describe('symmetryFrame', () => {
  for (const [name, m, group] of CASES) {
    it(`finds ${group} for ${name}, in any orientation`, () => {
      const plain = symmetryFrame(m);
      expect(plain.pointGroup).toBe(group);
      expectFrameConsistent(m, plain);
      const turned = moved(m, ROTATION, SHIFT);
      const result = symmetryFrame(turned);
      expect(result.pointGroup).toBe(group);
      expectFrameConsistent(turned, result);
    });
  }

  it('puts a linear molecule on z', () => {
    for (const m of [H2, HeHplus, chainH3]) {
      const { molecule: framed } = symmetryFrame(moved(m, ROTATION, SHIFT));
      for (const a of framed.atoms) {
        expect(a.positionBohr[0]).toBe(0);
        expect(a.positionBohr[1]).toBe(0);
      }
    }
  });

  it('puts water in the yz plane with its C2 axis on z (Ketbook convention)', () => {
    const { molecule: framed, originBohr } = symmetryFrame(moved(water, ROTATION, SHIFT));
    for (const a of framed.atoms) expect(a.positionBohr[0]).toBe(0);
    const [o, h1, h2] = framed.atoms.map((a) => a.positionBohr);
    expect(o[1]).toBe(0);
    expect(h1[1]).toBeCloseTo(-h2[1], 12);
    expect(h1[2]).toBe(h2[2]);
    // The origin is the centre of nuclear charge: Σ Z r = 0 in the frame.
    expect(8 * o[2] + h1[2] + h2[2]).toBeCloseTo(0, 12);
    expect(originBohr.length).toBe(3);
  });

  it('puts planar D2h molecules in the yz plane and the square’s axes through its atoms', () => {
    for (const m of [squareH4, rectangleH4, hexagonLike]) {
      const { molecule: framed } = symmetryFrame(moved(m, ROTATION, SHIFT));
      for (const a of framed.atoms) expect(Math.abs(a.positionBohr[0])).toBe(0);
    }
    const { molecule: square } = symmetryFrame(moved(squareH4, ROTATION, SHIFT));
    for (const a of square.atoms) {
      const [, y, z] = a.positionBohr;
      expect(Math.min(Math.abs(y), Math.abs(z))).toBeLessThan(1e-12);
      expect(Math.hypot(y, z)).toBeCloseTo(Math.SQRT2, 12);
    }
    // Rectangle: the longer direction (larger spread) is z.
    const { molecule: rect } = symmetryFrame(rectangleH4);
    expect(Math.abs(rect.atoms[0].positionBohr[2])).toBeCloseTo(1.5, 12);
    expect(Math.abs(rect.atoms[0].positionBohr[1])).toBeCloseTo(0.7, 12);
  });

  it('puts the C2 axis on z for C2h and C2, and the mirror in xy for Cs', () => {
    const trans = symmetryFrame(moved(transPeroxideLike, ROTATION, SHIFT)).molecule;
    for (const a of trans.atoms) expect(a.positionBohr[2]).toBe(0); // the molecular plane is the mirror, ⟂ C2(z)
    const skew = symmetryFrame(moved(skewPeroxideLike, ROTATION, SHIFT)).molecule;
    const [o1, o2, h1, h2] = skew.atoms.map((a) => a.positionBohr);
    for (const [a, b] of [[o1, o2], [h1, h2]]) {
      expect(a[0]).toBeCloseTo(-b[0], 12);
      expect(a[1]).toBeCloseTo(-b[1], 12);
      expect(a[2]).toBeCloseTo(b[2], 12);
    }
    const nh3 = symmetryFrame(moved(ammoniaLike, ROTATION, SHIFT)).molecule;
    const inPlane = nh3.atoms.filter((a) => a.positionBohr[2] === 0).map((a) => a.symbol);
    expect(inPlane.sort()).toEqual(['H', 'N']);
  });

  it('lets a ghost atom break symmetry exactly as a real atom would', () => {
    const ghostH2 = molecule([atom('H', 1, [0, 0, 0]), atom('H', 1, [0, 0, 1.4], true)]);
    expect(symmetryFrame(H2).pointGroup).toBe('D2h');
    expect(symmetryFrame(ghostH2).pointGroup).toBe('C2v');
    const waterOneGhost = molecule([water.atoms[0], water.atoms[1], { ...water.atoms[2], ghost: true }]);
    expect(symmetryFrame(moved(waterOneGhost, ROTATION, SHIFT)).pointGroup).toBe('Cs');
    // A ghost on the C2 axis keeps C2v; one off every element removes all symmetry but the plane.
    const waterGhostOnAxis = molecule([...water.atoms, atom('He', 2, [0, -2, 0], true)]);
    expect(symmetryFrame(moved(waterGhostOnAxis, ROTATION, SHIFT)).pointGroup).toBe('C2v');
    const waterGhostInPlane = molecule([...water.atoms, atom('He', 2, [1, -2, 0], true)]);
    expect(symmetryFrame(moved(waterGhostInPlane, ROTATION, SHIFT)).pointGroup).toBe('Cs');
    const waterGhostAnywhere = molecule([...water.atoms, atom('He', 2, [1, -2, 0.5], true)]);
    expect(symmetryFrame(waterGhostAnywhere).pointGroup).toBe('C1');
  });

  it('snaps a geometry that is symmetric within the tolerance, and refuses a looser one', () => {
    const noisy = molecule([atom('O', 8, [0, 0, 0]), atom('H', 1, [1.4305 + 3e-7, 1.1093, -2e-7]), atom('H', 1, [-1.4305, 1.1093 - 1e-7, 0])]);
    const result = symmetryFrame(noisy);
    expect(result.pointGroup).toBe('C2v');
    const [, h1, h2] = result.molecule.atoms.map((a) => a.positionBohr);
    expect(h1[0]).toBe(0);
    expect(h1[1]).toBe(-h2[1]);
    expect(h1[2]).toBe(h2[2]);
    const distorted = molecule([atom('O', 8, [0, 0, 0]), atom('H', 1, [1.4305 + 1e-3, 1.1093, 0]), atom('H', 1, [-1.4305, 1.1093, 0])]);
    expect(symmetryFrame(distorted).pointGroup).toBe('Cs');
    expect(symmetryFrame(distorted, 1e-2).pointGroup).toBe('C2v');
  });

  it('keeps the input axes for Ci and C1, and gives a lone atom D2h', () => {
    const { rotation } = symmetryFrame(randomCluster);
    expect(rotation).toEqual([
      [1, 0, 0],
      [0, 1, 0],
      [0, 0, 1],
    ]);
    const lone = symmetryFrame(molecule([atom('Ne', 10, [1, 2, 3])]));
    expect(lone.pointGroup).toBe('D2h');
    expect(lone.molecule.atoms[0].positionBohr).toEqual([0, 0, 0]);
    expect(lone.originBohr).toEqual([1, 2, 3]);
  });

  it('stays fast on a symmetric 20-atom cluster', () => {
    const atoms = [];
    for (let k = 0; k < 10; k++) {
      const t = (2 * Math.PI * k) / 10;
      atoms.push(atom('C', 6, [2.8 * Math.cos(t), 2.8 * Math.sin(t), 1.2]), atom('C', 6, [2.8 * Math.cos(t), 2.8 * Math.sin(t), -1.2]));
    }
    const start = performance.now();
    // D10h → D2h
    expect(symmetryFrame(moved(molecule(atoms), ROTATION, SHIFT)).pointGroup).toBe('D2h');
    expect(performance.now() - start).toBeLessThan(2000);
  });
});
