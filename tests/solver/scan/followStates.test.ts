import { describe, expect, it } from 'vitest';
import { followStates, runScan, type PointMethodResult } from '../../../solver/scan';
import { parseRunFile } from '../../../solver/runFile/parse';

const xs = Array.from({ length: 11 }, (_, k) => k / 10);

/** The lower and upper eigenpairs of the two-state model [[x, g], [g, 1 − x]] over two determinants (analytic 2×2). */
function twoState(x: number, g: number, irreps: [string | null, string | null] | 'same' | 'none'): PointMethodResult {
  const a = x;
  const b = 1 - x;
  const mean = (a + b) / 2;
  const half = Math.sqrt(((a - b) / 2) ** 2 + g * g);
  const theta = 0.5 * Math.atan2(2 * g, a - b);
  // Lower eigenvector (−sin θ, cos θ), upper (cos θ, sin θ) for the angle θ of the rotation that diagonalises it.
  const vectors = [
    [-Math.sin(theta), Math.cos(theta)],
    [Math.cos(theta), Math.sin(theta)],
  ];
  const labels = irreps === 'same' ? ['A1', 'A1'] : irreps === 'none' ? [null, null] : irreps;
  return {
    energies: [mean - half, mean + half],
    s2: [0, 0],
    multiplicities: [1, 1],
    irreps: labels as (string | null)[],
    leading: vectors.map((v) => [
      { alpha: '10', beta: '10', coefficient: v[0] },
      { alpha: '01', beta: '01', coefficient: v[1] },
    ]),
    referenceEnergy: 0,
    determinantCount: 2,
    warnings: [],
  };
}

describe('following states along a scan', () => {
  it('states of different symmetry cross: each curve keeps its label and the crossing is flagged', () => {
    // Different irreps do not interact, so their curves may cross (von Neumann & Wigner, Phys. Z. 30, 467 (1929)).
    const results = xs.map((x) => {
      const lowIsA = x < 0.5;
      const [eA, eB] = [x, 1 - x];
      return {
        energies: lowIsA ? [eA, eB] : [eB, eA],
        s2: [0, 0],
        multiplicities: [1, 1],
        irreps: lowIsA ? ['A1', 'B2'] : ['B2', 'A1'],
        leading: [[], []],
        referenceEnergy: 0,
        determinantCount: 2,
        warnings: [],
      } as PointMethodResult;
    });
    const followed = followStates(results, xs, 0);
    expect(followed.irreps).toEqual(['A1', 'B2']);
    xs.forEach((x, p) => {
      expect(results[p].energies[followed.rootAtPoint[0][p]!]).toBeCloseTo(x, 14);
      expect(results[p].energies[followed.rootAtPoint[1][p]!]).toBeCloseTo(1 - x, 14);
    });
    const crossings = followed.flags.filter((f) => f.type === 'crossing');
    expect(crossings).toHaveLength(1);
    expect(crossings[0].value).toBeCloseTo(0.5, 12); // linear curves meet at x = ½ (analytic)
  });

  it('states of one symmetry do not cross: curves stay in energy order and the avoided crossing is flagged', () => {
    const results = xs.map((x) => twoState(x, 0.02, 'same'));
    const followed = followStates(results, xs, 0);
    xs.forEach((_, p) => expect(followed.rootAtPoint[0][p]).toBe(0));
    expect(followed.flags.filter((f) => f.type === 'crossing')).toHaveLength(0);
    const avoided = followed.flags.filter((f) => f.type === 'avoided-crossing');
    expect(avoided).toHaveLength(1);
    // The characters exchange where the diabatic energies x and 1 − x meet, at x = ½ (analytic two-state model).
    expect(xs[avoided[0].between[0]]).toBeLessThanOrEqual(0.5);
    expect(xs[avoided[0].between[1]]).toBeGreaterThanOrEqual(0.5);
  });

  it('without symmetry labels, states are followed by the overlap of their leading determinants', () => {
    // A vanishing coupling: each state keeps its determinant, so the curves cross (analytic two-state model, g → 0).
    const results = xs.map((x) => twoState(x, 1e-6, 'none'));
    const followed = followStates(results, xs, 0);
    xs.forEach((x, p) => expect(results[p].energies[followed.rootAtPoint[1][p]!]).toBeCloseTo(1 - x, 5));
    expect(followed.flags.filter((f) => f.type === 'crossing')).toHaveLength(1);
  });

  it('H2 STO-3G full CI, four roots: every curve keeps one symmetry, and swaps of energy order are flagged', async () => {
    const points = [0.8, 1.2, 1.6, 2.0, 2.4, 2.8, 3.2, 3.6, 4.0, 5.0, 6.0];
    const scan = await runScan(
      parseRunFile({
        format: 'ketbook-run/1',
        system: { type: 'molecule', units: 'bohr', atoms: [['H', 0, 0, 0], ['H', 0, 0, 1.4]], basis: 'STO-3G' },
        scan: { coordinate: { type: 'distance', atoms: [0, 1] }, points, units: 'bohr', refine: false, dissociation: 'none' },
        methods: [{ space: 'FCI', roots: 4 }],
      }),
    );
    // The four states of minimal-basis H2: X ¹Σg+, ³Σu+, ¹Σu+, and the doubly excited ¹Σg+ (Szabo & Ostlund (1996) §4.2);
    // in D2h the Σg+ states are Ag and the Σu+ ones B1u.
    expect(scan.curves.map((c) => [c.irrep, c.multiplicity])).toEqual([['Ag', 1], ['B1u', 3], ['B1u', 1], ['Ag', 1]]);
    for (const curve of scan.curves) expect(curve.energies.every((e) => e !== null)).toBe(true);
    for (let c1 = 0; c1 < 4; c1++) {
      for (let c2 = c1 + 1; c2 < 4; c2++) {
        for (let p = 0; p + 1 < points.length; p++) {
          const d0 = scan.curves[c1].energies[p]! - scan.curves[c2].energies[p]!;
          const d1 = scan.curves[c1].energies[p + 1]! - scan.curves[c2].energies[p + 1]!;
          if (Math.sign(d0) !== Math.sign(d1) && Math.abs(d0) > 1e-7 && Math.abs(d1) > 1e-7) {
            expect(scan.flags.some((f) => f.type === 'crossing' && f.between[0] === p && f.curves!.includes(c1) && f.curves!.includes(c2))).toBe(true);
          }
        }
      }
    }
  });
});
