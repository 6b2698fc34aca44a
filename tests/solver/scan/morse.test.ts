import { describe, expect, it } from 'vitest';
import { parseRunFile } from '../../../solver/runFile/parse';
import { planScan, assembleScan, fitMinimum, type PointResult } from '../../../solver/scan';
import { HARTREE_TO_INVERSE_CM, DALTON_TO_ELECTRON_MASS } from '../../../solver/constants';

// Morse, Phys. Rev. 34, 57 (1929): V(R) = E∞ − De + De (1 − e^{−a(R − Re)})², whose curvature at
// Re is k = 2 De a², so ω_e = a √(2 De / μ) in atomic units. The parameters are arbitrary
// H2-like inputs, not reference values.
const De = 0.1745;
const a = 1.03;
const Re = 1.401;
const asymptote = -1.0;
const morse = (r: number) => asymptote - De + De * (1 - Math.exp(-a * (r - Re))) ** 2;

const runFile = parseRunFile({
  format: 'ketbook-run/1',
  system: { type: 'molecule', units: 'bohr', atoms: [['H', 0, 0, 0], ['H', 0, 0, 1.4]], basis: 'STO-3G' },
  scan: { coordinate: { type: 'distance', atoms: [0, 1] }, from: 0.8, to: 6.0, step: 0.1, units: 'bohr' },
  methods: [{ reference: 'RHF' }],
});

/** Point results carrying the Morse energies in place of solver energies, so only the fitting code runs. */
function morseResults(points: number[]): PointResult[] {
  return points.map((r) => ({
    value: r,
    pointGroup: null,
    atomsBohr: [],
    solutions: {},
    methods: [{ energies: [morse(r)], s2: [0], multiplicities: [1], irreps: [null], leading: [[]], referenceEnergy: morse(r), determinantCount: 1, warnings: [] }],
    warnings: [],
    timingsMs: 0,
  }));
}

describe('constants of an analytic Morse curve through the scan fitting code', () => {
  const plan = planScan(runFile);
  // μ of ¹H¹H from the AME2020 ¹H mass (Wang et al., Chin. Phys. C 45, 030003 (2021), from memory) and CODATA 2018 u/m_e.
  const mu = (1.00782503223 / 2) * DALTON_TO_ELECTRON_MASS;
  const omegaExpected = a * Math.sqrt((2 * De) / mu) * HARTREE_TO_INVERSE_CM; // Morse (1929)

  it('uses the reduced mass of two most abundant hydrogen isotopes', () => {
    expect(plan.reducedMassElectron! / mu - 1).toBeCloseTo(0, 9);
  });

  for (const fit of ['spline', 'polynomial'] as const) {
    it(`returns R_e to 1e-4 bohr and D_e, ω_e to 0.1 % (${fit} fit, then direct minimisation)`, async () => {
      let calls = 0;
      const scan = await assembleScan({ ...plan, fit }, morseResults(plan.points), {
        evaluate: async (_m, _root, r) => {
          calls++;
          return morse(r);
        },
        fragmentEnergy: async () => ({ energy: asymptote, note: null }),
      });
      const c = scan.constants[0];
      expect(c.fit).toBe(`${fit}+refined`);
      expect(Math.abs(c.Re! - Re)).toBeLessThan(1e-4); // Morse (1929): the minimum is at Re
      expect(Math.abs(c.De! / De - 1)).toBeLessThan(1e-3); // Morse (1929): depth De below the asymptote
      expect(c.DeReference).toBe('fragments');
      expect(Math.abs(c.omegaE! / omegaExpected - 1)).toBeLessThan(1e-3); // Morse (1929): k = 2 De a²
      expect(Math.abs(c.Emin! - (asymptote - De))).toBeLessThan(1e-6);
      expect(calls).toBeGreaterThan(0);
      expect(calls).toBeLessThan(60);
    });
  }

  it('without extra solver calls the fit alone lands near the minimum', async () => {
    const scan = await assembleScan(plan, morseResults(plan.points));
    const c = scan.constants[0];
    expect(c.fit).toBe('spline');
    // A cubic spline with a 0.1 bohr step: error O(h⁴) in value, a few 1e-4 bohr in position (common practice, no source).
    expect(Math.abs(c.Re! - Re)).toBeLessThan(2e-3);
    expect(Math.abs(c.curvature! / (2 * De * a * a) - 1)).toBeLessThan(0.03);
  });

  it('the far end of the scan as D_e reference warns when it is not flat', async () => {
    const scan = await assembleScan({ ...plan, dissociation: 'far-end' }, morseResults(plan.points));
    const c = scan.constants[0];
    expect(c.DeReference).toBe('far-end');
    // At 6 bohr the Morse curve still lies De·(1 − e^{−a·4.6})² below the asymptote (Morse (1929)).
    expect(c.De).toBeCloseTo(morse(6.0) - c.Emin!, 12);
    expect(c.warnings.join(' ')).toMatch(/not flat/);
  });

  it('refuses to invent a minimum at the end of a scan or from fewer than five points', () => {
    expect(fitMinimum([1, 2, 3, 4, 5, 6], [6, 5, 4, 3, 2, 1], 'spline')).toMatchObject({ ok: false });
    expect(fitMinimum([1, 2, 3, 4], [2, 1, 1.5, 3], 'spline')).toMatchObject({ ok: false });
  });
});
