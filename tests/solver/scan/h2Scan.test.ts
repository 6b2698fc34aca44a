import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { parseRunFile } from '../../../solver/runFile/parse';
import { runCalculation } from '../../../solver/run';
import { runScan, planScan, type AssembledScan, type PointResult } from '../../../solver/scan';

const grid = [0.8, 1.0, 1.2, 1.4, 1.6, 1.8, 2.0, 2.2, 2.4, 2.6, 2.8, 3.0, 3.5, 4.0, 5.0, 6.0, 8.0, 20.0, 22.0, 25.0, 30.0];

const h2Scan = (methods: object[], extra: object = {}) =>
  parseRunFile({
    format: 'ketbook-run/1',
    system: { type: 'molecule', units: 'bohr', atoms: [['H', 0, 0, 0], ['H', 0, 0, 1.4]], basis: 'STO-3G' },
    scan: { coordinate: { type: 'distance', atoms: [0, 1] }, points: grid, units: 'bohr', ...extra },
    methods,
  });

describe('H2 in STO-3G along the bond', () => {
  let scan: AssembledScan;
  const saved: (PointResult | null)[] = [];
  let twoAtoms = 0;

  it('runs RHF, UHF, CISD and FCI at every point', async () => {
    const input = h2Scan([{ reference: 'RHF' }, { reference: 'UHF' }, { space: 'CISD' }, { space: 'FCI' }]);
    scan = await runScan(input, { onPoint: (p, r) => (saved[p] = r) });
    const atom = await runCalculation(
      parseRunFile({ format: 'ketbook-run/1', system: { type: 'molecule', units: 'bohr', atoms: [['H', 0, 0, 0]], multiplicity: 2, basis: 'STO-3G' }, reference: 'UHF' }),
    );
    twoAtoms = 2 * atom.energies.reference;
    expect(atom.energies.reference).toBeCloseTo(-0.46658, 5); // from memory of common STO-3G tables (−0.46658 Eh)
    expect(scan.points).toEqual(grid);
    expect(scan.curves.map((c) => c.label)).toEqual(['RHF', 'UHF', 'CISD', 'FCI']);
    expect(saved.filter(Boolean)).toHaveLength(grid.length);
    for (const curve of scan.curves) expect(curve.energies.every((e) => e !== null)).toBe(true);
  });

  const energies = (k: number) => scan.curves[k].energies as number[];

  it('UHF at 20 bohr and beyond is twice the hydrogen atom within 1e-6 Eh, approaching it from below', () => {
    grid.forEach((r, p) => {
      // Two separated atoms: the spin-broken UHF determinant is a product of atomic ones (common practice, no source).
      if (r >= 20) expect(Math.abs(energies(1)[p] - twoAtoms)).toBeLessThan(1e-6);
      // Approached from below: the residual attraction of the two atoms (common practice, no source).
      if (r >= 4) expect(energies(1)[p]).toBeLessThanOrEqual(twoAtoms + 1e-9);
    });
    const at8 = grid.indexOf(8);
    expect(energies(1)[at8]).toBeLessThan(twoAtoms);
  });

  it('RHF at large R stays far above two atoms (ionic terms it cannot shed)', () => {
    grid.forEach((r, p) => {
      // Restricted H2 dissociates into half H + H and half H+ + H− (common practice, no source).
      if (r >= 20) expect(energies(0)[p] - twoAtoms).toBeGreaterThan(0.3);
    });
  });

  it('FCI lies at or below every variational method, and CISD equals FCI for two electrons', () => {
    grid.forEach((_, p) => {
      // Variational principle over nested spaces (common practice, no source).
      for (const k of [0, 1, 2]) expect(energies(3)[p]).toBeLessThanOrEqual(energies(k)[p] + 1e-10);
      // Two electrons are at most doubly excited (common practice, no source).
      expect(Math.abs(energies(2)[p] - energies(3)[p])).toBeLessThan(1e-10);
    });
  });

  it('the FCI curve is smooth: direct runs between grid points match cubic interpolation', async () => {
    // Four-point Lagrange interpolation at a midpoint errs by at most (9/16)·h⁴/4!·|E⁗| ≈ 7.5e-4 Eh for h = 0.2 bohr and
    // |E⁗| ≲ 20 Eh/bohr⁴ (common practice, no source); a jump between solutions or states would be far larger.
    const e = energies(3);
    for (const p of [2, 6, 9]) {
      const mid = (grid[p] + grid[p + 1]) / 2;
      const cubic = (-e[p - 1] + 9 * e[p] + 9 * e[p + 1] - e[p + 2]) / 16;
      const direct = await runCalculation(
        parseRunFile({ format: 'ketbook-run/1', system: { type: 'molecule', units: 'bohr', atoms: [['H', 0, 0, 0], ['H', 0, 0, mid]], basis: 'STO-3G' }, ci: { space: 'FCI' } }),
      );
      expect(Math.abs(direct.energies.roots[0] - cubic)).toBeLessThan(7.5e-4);
    }
  });

  it('marks the Coulson–Fischer point where UHF leaves RHF', () => {
    const cf = scan.coulsonFischer!;
    expect(cf).not.toBeNull();
    const [before, after] = cf.between;
    // Two signals that must agree: the RHF triplet Hessian eigenvalue changes sign where a lower UHF
    // solution appears (Seeger & Pople (1977); common practice, no source).
    expect(Math.abs(energies(1)[before] - energies(0)[before])).toBeLessThan(1e-8);
    for (let p = after + 1; p < grid.length; p++) expect(energies(1)[p]).toBeLessThan(energies(0)[p] - 1e-6);
    // Minimal-basis H2: stable at 2.0 bohr, unstable at 2.6 bohr (as in tests/solver/scf; from memory, near 2.3 bohr).
    expect(cf.value).toBeGreaterThan(2.0);
    expect(cf.value).toBeLessThan(2.6);
    expect(scan.flags.some((f) => f.type === 'coulson-fischer')).toBe(true);
  });

  it('keeps the lowest stable SCF solution and records why', () => {
    const far = saved[grid.indexOf(20)]!;
    const uhf = far.solutions.UHF!;
    // Two uncoupled spins in one determinant: ⟨S²⟩ = 1 (common practice, no source).
    expect(uhf.s2).toBeCloseTo(1, 6);
    expect(uhf.stability?.stable).toBe(true);
    expect(uhf.candidates.map((c) => c.source)).toEqual(['neighbour', 'huckel', 'core', 'broken-symmetry']);
    expect(uhf.orbitals.nBasis).toBe(2);
    expect(uhf.orbitals.alpha).toHaveLength(4);
    const rhf = far.solutions.RHF!;
    expect(rhf.stability!.rhfToUhf!).toBeLessThan(0);
    const near = saved[grid.indexOf(1.4)]!;
    expect(near.solutions.UHF!.s2).toBeLessThan(1e-8); // UHF = RHF near equilibrium (common practice, no source)
  });

  it('RHF R_e of minimal-basis H2 and the harmonic frequencies in cm⁻¹', () => {
    const rhf = scan.constants[0];
    expect(rhf.Re).toBeCloseTo(1.346, 3); // from memory of Szabo & Ostlund (1996) ch. 3, table of H2 bond lengths (STO-3G 1.346)
    expect(rhf.fit).toBe('spline+refined');
    expect(rhf.Emin!).toBeLessThan(Math.min(...energies(0)));
    // D_e against two atoms in the same method: UHF atoms for UHF, ROHF atoms for RHF (the same for one electron).
    expect(scan.constants[1].De).toBeCloseTo(twoAtoms - scan.constants[1].Emin!, 12);
    expect(scan.constants[1].DeReference).toBe('fragments');
    expect(scan.constants[3].fragmentEnergy).toBeCloseTo(twoAtoms, 9);
    // Correlation lengthens the bond and softens it (common practice, no source).
    expect(scan.constants[3].Re!).toBeGreaterThan(rhf.Re!);
    expect(scan.constants[3].omegaE!).toBeLessThan(rhf.omegaE!);
  });

  it('errors against FCI: CISD has none; the UHF non-parallelity error is the spread of its error', () => {
    expect(scan.constants[2].maxError!).toBeLessThan(1e-10);
    const errors = scan.curves[1].errors as number[];
    expect(scan.constants[1].nonParallelityError).toBeCloseTo(Math.max(...errors) - Math.min(...errors), 14);
    expect(scan.constants[1].maxError).toBeCloseTo(Math.max(...errors.map(Math.abs)), 14);
  });

  it('size-extensivity rows: E(H···H) − 2E(H) in mEh vanishes for UHF and FCI at 20 bohr', () => {
    const rows = scan.sizeExtensivity!;
    const p = grid.indexOf(20);
    for (const method of [1, 3]) expect(Math.abs(rows.find((r) => r.method === method)!.differenceMilliHartree[p]!)).toBeLessThan(1e-3);
    const rhf = rows.find((r) => r.method === 0)!;
    // 1 Eh = 627.5095 kcal/mol (CODATA 2018 hartree and the thermochemical calorie).
    expect(rhf.differenceKcalPerMol[p]! / (rhf.differenceMilliHartree[p]! / 1000)).toBeCloseTo(627.5095, 3);
  });

  it('resumes from saved points without recomputing them', async () => {
    const input = h2Scan([{ reference: 'RHF' }, { reference: 'UHF' }, { space: 'CISD' }, { space: 'FCI' }], { refine: false, dissociation: 'none' });
    const recomputed: number[] = [];
    const partial = saved.map((r, p) => (p < 5 ? r : null));
    const again = await runScan(input, { resume: partial, onPoint: (p) => recomputed.push(p) });
    expect(recomputed).toEqual(grid.map((_, p) => p).slice(5));
    for (let k = 0; k < 4; k++) {
      again.curves[k].energies.forEach((e, p) => expect(Math.abs(e! - scan.curves[k].energies[p]!)).toBeLessThan(1e-9));
    }
  });
});

describe('the example scan run file', () => {
  it('parses and plans its points in order', () => {
    const file = JSON.parse(readFileSync(path.join(__dirname, 'h2-scan.json'), 'utf8'));
    const plan = planScan(parseRunFile(file));
    expect(plan.points[0]).toBe(file.scan.from);
    expect(plan.points[plan.points.length - 1]).toBe(file.scan.to);
    expect(plan.points).toHaveLength(Math.round((file.scan.to - file.scan.from) / file.scan.step) + 1);
    expect(plan.methods.map((m) => m.label)).toEqual(['RHF', 'UHF', 'CISD', 'FCI']);
  });
});
