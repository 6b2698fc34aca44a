import { describe, expect, it } from 'vitest';
import { parseRunFile } from '../../../solver/runFile/parse';
import { runCalculation } from '../../../solver/run';
import { runScan, runScanPoint, planScan, scanToCsv, type AssembledScan } from '../../../solver/scan';

const points = [2.6, 2.8, 3.0, 3.2, 3.4, 3.6];
const input = parseRunFile({
  format: 'ketbook-run/1',
  system: { type: 'molecule', units: 'bohr', atoms: [['Li', 0, 0, 0], ['H', 0, 0, 3.0]], basis: 'STO-3G' },
  scan: { coordinate: { type: 'distance', atoms: [0, 1] }, points, units: 'bohr', refine: false },
  methods: [{ reference: 'RHF' }, { space: 'CISD' }, { space: 'CISD', plusQ: true }, { space: 'FCI' }, { space: 'FCI', frozenCore: 1 }],
});

describe('LiH in STO-3G near equilibrium', () => {
  let scan: AssembledScan;

  it('runs every method at each point; FCI is the default reference method', async () => {
    scan = await runScan(input);
    expect(scan.curves.map((c) => c.label)).toEqual(['RHF', 'CISD', 'CISD+Q', 'FCI', 'FCI']);
    expect(planScan(input).referenceMethod).toBe(3);
  });

  it('variational methods lie above FCI in order; +Q lowers CISD and is left out of that order', () => {
    const e = (k: number) => scan.curves[k].energies as number[];
    points.forEach((_, p) => {
      // Nested variational spaces (common practice, no source).
      expect(e(0)[p]).toBeGreaterThan(e(1)[p]);
      expect(e(1)[p]).toBeGreaterThanOrEqual(e(3)[p] - 1e-10);
      // Freezing the Li 1s removes correlation, so the frozen-core FCI lies above the all-electron one (common practice, no source).
      expect(e(4)[p]).toBeGreaterThan(e(3)[p]);
      // E(+Q) = E_CISD + (1 − c0²)(E_CISD − E_ref) < E_CISD (Langhoff & Davidson, Int. J. Quantum Chem. 8, 61 (1974)).
      expect(e(2)[p]).toBeLessThan(e(1)[p]);
    });
    // CISD misses a little of the FCI correlation of four electrons: its error is positive everywhere.
    expect(scan.curves[1].errors!.every((x) => x! > 0)).toBe(true);
  });

  it('D_e is measured against Li and H computed alone in the same method and basis', async () => {
    const atom = async (symbol: string, extra: object) =>
      (
        await runCalculation(
          parseRunFile({ format: 'ketbook-run/1', system: { type: 'molecule', units: 'bohr', atoms: [[symbol, 0, 0, 0]], multiplicity: 2, basis: 'STO-3G' }, reference: 'ROHF', ...extra }),
        )
      ).energies.roots[0];
    // The core guess: the Hückel-like one lands on Li 1s²2p (see the next test).
    const li = await atom('Li', { scf: { guess: 'core' }, ci: { space: 'FCI' } });
    const h = await atom('H', {});
    const fci = scan.constants[3];
    expect(fci.DeReference).toBe('fragments');
    expect(fci.fragmentEnergy!).toBeCloseTo(li + h, 9); // the same sum, computed apart
    expect(fci.De!).toBeCloseTo(li + h - fci.Emin!, 12);
    // LiH is bound (common practice, no source).
    expect(fci.De!).toBeGreaterThan(0.05);
    expect(scan.constants[4].De).toBeNull();
    expect(scan.constants[4].warnings.join(' ')).toMatch(/do not carry over to fragments/);
  });

  it('of the SCF starts the lowest is kept: both built-in guesses reach Li 1s²2s', async () => {
    const plan = planScan(input);
    const li = plan.fragments!.find((f) => f.atoms.includes(0))!;
    const point = await runScanPoint(li.runFile, [{ ...plan.methods[0], reference: 'ROHF' }]);
    const record = point.solutions.ROHF!;
    const energies = record.candidates.map((c) => c.energy!);
    expect(record.energy).toBe(Math.min(...energies));
    // The Hückel-like guess keeps one-centre core-Hamiltonian elements, so it no longer lands on
    // 1s²2p: both starts agree on 1s²2s, which lies below 1s²2p (common practice, no source).
    expect(Math.max(...energies) - record.energy).toBeLessThan(1e-8);
    expect(record.energy).toBeCloseTo(-7.3155, 4); // Li STO-3G Hartree–Fock, from memory of published STO-3G atomic energies
  });

  it('exports the curves as CSV, one row per point', () => {
    const csv = scanToCsv(scan).trim().split('\n');
    expect(csv).toHaveLength(points.length + 1);
    expect(csv[0].split(',').slice(0, 3)).toEqual(['coordinate (bohr)', 'RHF (hartree)', 'CISD (hartree)']);
    const row = csv[3].split(',').map(Number);
    expect(row[0]).toBe(points[2]);
    expect(row[4]).toBe(scan.curves[3].energies[2]);
    // The error columns follow the energies: CISD − FCI.
    expect(row[1 + scan.curves.length + 1]).toBeCloseTo(scan.curves[1].energies[2]! - scan.curves[3].energies[2]!, 14);
  });
});
