import { describe, expect, it } from 'vitest';
import { parseRunFile } from '../../../solver/runFile/parse';
import { runCalculation } from '../../../solver/run';
import { planLadder, runLadder } from '../../../solver/scan';
import { SolverError } from '../../../solver/errors';

const system = (atoms: [string, number, number, number][]) => ({ type: 'molecule', units: 'bohr', atoms, basis: 'STO-3G' });
const lih = system([['Li', 0, 0, 0], ['H', 0, 0, 3.015]]); // near the LiH equilibrium distance, common practice, no source

describe('ladders: the same system across bases and excitation levels', () => {
  it('H2 from STO-2G to STO-6G: CIS recovers 0 % and CISD 100 % of the full-CI correlation energy', async () => {
    const ladder = await runLadder(
      parseRunFile({
        format: 'ketbook-run/1',
        system: system([['H', 0, 0, 0], ['H', 0, 0, 1.4]]),
        ladder: { bases: ['STO-2G', 'STO-3G', 'STO-4G', 'STO-5G', 'STO-6G'] },
        methods: [{ space: 'CIS' }, { space: 'CISD' }, { space: 'FCI' }],
      }),
    );
    expect(ladder.bases).toEqual(['STO-2G', 'STO-3G', 'STO-4G', 'STO-5G', 'STO-6G']);
    expect(ladder.fullCiMethod).toBe(2);
    for (const row of ladder.rows) {
      // Brillouin's theorem: singles do not mix with the HF determinant, so the CIS ground root is HF (Brillouin (1934)).
      expect(Math.abs(row!.methods[0].percentOfFullCi!)).toBeLessThan(1e-6);
      // Two electrons: CISD is full CI (common practice, no source).
      expect(row!.methods[1].percentOfFullCi!).toBeCloseTo(100, 8);
      expect(row!.methods[2].percentOfFullCi).toBe(100);
      expect(row!.basisFunctions).toBe(2);
    }
    // The STO-3G row against a plain run: E_corr(FCI) ≈ −0.0206 Eh at 1.4 bohr (Szabo & Ostlund (1996) ch. 4).
    expect(ladder.rows[1]!.fullCiCorrelation).toBeCloseTo(-0.0206, 4);
  });

  it('LiH in two bases: shares grow with the excitation level, CISDTQ is full CI for four electrons, the full CI is added when missing', async () => {
    const evenTempered = {
      type: 'even-tempered',
      name: 'small even-tempered',
      elements: { H: { s: { count: 3, alpha: 0.1, beta: 3 } }, Li: { s: { count: 4, alpha: 0.05, beta: 4 }, p: { count: 1, alpha: 0.1, beta: 2 } } },
    };
    const input = parseRunFile({
      format: 'ketbook-run/1',
      system: lih,
      ladder: { bases: ['STO-3G', evenTempered] },
      methods: [{ space: 'CISD' }, { space: 'CISDT' }, { space: 'CISDTQ' }],
    });
    const plan = planLadder(input);
    expect(plan.fullCiAdded).toBe(true);
    expect(plan.bases).toEqual(['STO-3G', 'small even-tempered']);
    const ladder = await runLadder(input);
    expect(ladder.warnings.join(' ')).toMatch(/added as the 100 %/);
    for (const row of ladder.rows) {
      const shares = row!.methods.map((m) => m.percentOfFullCi!);
      // Nested variational spaces: non-decreasing shares, none above full CI (common practice, no source).
      expect(shares[0]).toBeGreaterThan(90);
      expect(shares[0]).toBeLessThan(100);
      expect(shares[1]).toBeGreaterThanOrEqual(shares[0] - 1e-9);
      // Four electrons are at most quadruply excited (common practice, no source).
      expect(shares[2]).toBeCloseTo(100, 8);
    }
    // The STO-3G rung is the ordinary run of that basis.
    const direct = await runCalculation(parseRunFile({ format: 'ketbook-run/1', system: lih, ci: { space: 'CISD' } }));
    expect(ladder.rows[0]!.methods[0].energy).toBeCloseTo(direct.energies.roots[0], 10);
    expect(ladder.rows[0]!.referenceEnergy).toBeCloseTo(direct.energies.reference, 10);
    expect(ladder.rows[1]!.basisFunctions).toBe(3 + 4 + 3);
  });

  it('refuses a ladder beside a scan, and of a model Hamiltonian', () => {
    const both = { format: 'ketbook-run/1', system: lih, ladder: { bases: ['STO-3G'] }, scan: { coordinate: { type: 'distance', atoms: [0, 1] }, points: [3], units: 'bohr' } };
    expect(() => parseRunFile(both)).toThrow(SolverError);
    expect(() => parseRunFile(both)).toThrow(/a scan or a ladder, not both/);
    expect(() => parseRunFile({ format: 'ketbook-run/1', system: { type: 'hubbard', sites: 4, U: 4, electrons: 4 }, ladder: { bases: ['STO-3G'] } })).toThrow(/needs a molecule/);
  });
});
