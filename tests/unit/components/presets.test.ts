import { describe, expect, it } from 'vitest';
import { runFileSchema } from '../../../solver/runFile/schema';
import { RUN_PRESETS, presetById, defaultHubbardRunFile } from '../../../components/run/presets';
import { systemParity } from '../../../components/run/electronParity';
import { BOHR_TO_ANGSTROM } from '../../../solver/constants';

type Row = [string, number, number, number];
function atomsOf(id: string): Row[] {
  const system = presetById(id)!.runFile.system;
  if (system.type !== 'molecule') throw new Error('not a molecule');
  return system.atoms as Row[];
}
function distance(a: Row, b: Row): number {
  return Math.hypot(a[1] - b[1], a[2] - b[2], a[3] - b[3]);
}

describe('starter systems of the run builder', () => {
  it.each(RUN_PRESETS.map((p) => [p.id, p] as const))('%s is a valid run file with consistent spin', (_id, preset) => {
    const parsed = runFileSchema.safeParse(preset.runFile);
    expect(parsed.success, JSON.stringify(parsed.error?.issues)).toBe(true);
    expect(systemParity(preset.runFile.system)?.ok).toBe(true);
  });

  it('has unique ids', () => {
    expect(new Set(RUN_PRESETS.map((p) => p.id)).size).toBe(RUN_PRESETS.length);
  });

  it('places H2 at 1.4 bohr and LiH at 3.015 bohr and He2 at 5.6 bohr', () => {
    expect(distance(...(atomsOf('h2') as [Row, Row]))).toBeCloseTo(1.4, 12); // stated geometry of the preset
    expect(distance(...(atomsOf('lih') as [Row, Row]))).toBeCloseTo(3.015, 12); // stated geometry of the preset
    expect(distance(...(atomsOf('he2') as [Row, Row]))).toBeCloseTo(5.6, 12); // stated geometry of the preset
  });

  it('gives HeH+ charge +1, R = 1.4632 bohr and the Slater exponents 2.0925 / 1.24', () => {
    // Szabo & Ostlund (1996) §3.5.2–3.5.3 use this HeH+ model (R = 1.4632 bohr, ζ(He) = 2.0925, ζ(H) = 1.24)
    const system = presetById('heh-plus')!.runFile.system;
    expect(system.type).toBe('molecule');
    if (system.type !== 'molecule') return;
    expect(system.charge).toBe(1);
    expect(system.zeta).toEqual({ He: 2.0925, H: 1.24 });
    expect(distance(...(atomsOf('heh-plus') as [Row, Row]))).toBeCloseTo(1.4632, 12);
  });

  it('builds H3+ as an equilateral triangle of side 1.65 bohr', () => {
    const [a, b, c] = atomsOf('h3-plus');
    for (const d of [distance(a, b), distance(b, c), distance(c, a)]) expect(d).toBeCloseTo(1.65, 12); // stated geometry, analytic
  });

  it('builds the H4 square with equal sides and diagonals √2 longer', () => {
    const [a, b, c, d] = atomsOf('h4-square');
    for (const side of [distance(a, b), distance(b, c), distance(c, d), distance(d, a)]) expect(side).toBeCloseTo(2, 12);
    expect(distance(a, c)).toBeCloseTo(2 * Math.SQRT2, 12); // analytic
  });

  it('builds water with R(OH) = 0.9572 Å and angle 104.52°', () => {
    const [o, h1, h2] = atomsOf('h2o');
    expect(presetById('h2o')!.runFile.system).toMatchObject({ units: 'angstrom' });
    expect(distance(o, h1)).toBeCloseTo(0.9572, 12);
    expect(distance(o, h2)).toBeCloseTo(0.9572, 12);
    const cos = ((h1[1] - o[1]) * (h2[1] - o[1]) + (h1[2] - o[2]) * (h2[2] - o[2]) + (h1[3] - o[3]) * (h2[3] - o[3])) / 0.9572 ** 2;
    expect((Math.acos(cos) * 180) / Math.PI).toBeCloseTo(104.52, 10); // stated geometry, analytic
    // The same bond in bohr, through the one constants module (CODATA 2018).
    expect(0.9572 / BOHR_TO_ANGSTROM).toBeCloseTo(1.8088, 4); // 0.9572 Å / 0.529177210903 Å per bohr
  });

  it('places the two H2 molecules 10 bohr apart, each 1.4 bohr long', () => {
    const [a, b, c, d] = atomsOf('two-h2');
    expect(distance(a, b)).toBeCloseTo(1.4, 12);
    expect(distance(c, d)).toBeCloseTo(1.4, 12);
    expect(distance(a, c)).toBeCloseTo(10, 12);
  });

  it('makes H10 a chain of ten hydrogens 1.8 bohr apart', () => {
    const atoms = atomsOf('h10-chain');
    expect(atoms).toHaveLength(10);
    for (let i = 1; i < 10; i++) expect(distance(atoms[i - 1], atoms[i])).toBeCloseTo(1.8, 12);
  });

  it('starts the lattice form from a valid half-filled Hubbard chain', () => {
    const runFile = defaultHubbardRunFile();
    expect(runFileSchema.safeParse(runFile).success).toBe(true);
    expect(systemParity(runFile.system)?.ok).toBe(true);
  });
});
