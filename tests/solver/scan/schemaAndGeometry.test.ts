import { describe, expect, it } from 'vitest';
import { parseRunFile } from '../../../solver/runFile/parse';
import { SolverError } from '../../../solver/errors';
import { planScan } from '../../../solver/scan';
import { BOHR_TO_ANGSTROM } from '../../../solver/constants';

type AtomRow = [string, number, number, number];

const water = {
  type: 'molecule',
  units: 'bohr',
  // O–H 1.809 bohr, H–O–H 104.5° (common practice, no source; the geometry only has to be bent).
  atoms: [['O', 0, 0, 0], ['H', 0, 1.4305, 1.1074], ['H', 0, -1.4305, 1.1074]] as AtomRow[],
  basis: 'STO-3G',
};
const h2 = { type: 'molecule', units: 'bohr', atoms: [['H', 0, 0, 0], ['H', 0, 0, 1.4]], basis: 'STO-3G' };

const run = (system: object, scan: object, methods?: object[], extra: object = {}) =>
  ({ format: 'ketbook-run/1', system, scan, ...(methods ? { methods } : {}), ...extra }) as unknown;

function issueOf(input: unknown): { field?: string; message: string } {
  try {
    parseRunFile(input);
  } catch (error) {
    expect(error).toBeInstanceOf(SolverError);
    const e = error as SolverError;
    expect(e.code).toBe('bad-input');
    return { field: e.field, message: e.message };
  }
  throw new Error('expected the run file to be refused');
}

const atoms = (runFile: { system: unknown }) => (runFile.system as { atoms: AtomRow[] }).atoms;
const dist = (a: AtomRow, b: AtomRow) => Math.hypot(a[1] - b[1], a[2] - b[2], a[3] - b[3]);
const angle = (a: AtomRow, o: AtomRow, b: AtomRow) => {
  const u = [a[1] - o[1], a[2] - o[2], a[3] - o[3]];
  const v = [b[1] - o[1], b[2] - o[2], b[3] - o[3]];
  const dot = u[0] * v[0] + u[1] * v[1] + u[2] * v[2];
  const cross = Math.hypot(u[1] * v[2] - u[2] * v[1], u[2] * v[0] - u[0] * v[2], u[0] * v[1] - u[1] * v[0]);
  return (Math.atan2(cross, dot) * 180) / Math.PI; // atan2 keeps precision near 180° (acos does not)
};

describe('scan geometries', () => {
  it('a distance scan in ångström moves the chosen group rigidly along the bond', () => {
    const plan = planScan(parseRunFile(run(water, { coordinate: { type: 'distance', atoms: [0, 1], move: [1, 2] }, points: [1.0, 1.2], units: 'angstrom' })));
    for (const [k, value] of [1.0, 1.2].entries()) {
      const a = atoms(plan.pointRunFiles[k]);
      // 1 bohr = 0.529177210903 Å (CODATA 2018).
      expect(dist(a[0], a[1]) * BOHR_TO_ANGSTROM).toBeCloseTo(value, 12);
      // A rigid shift keeps the moved group's own geometry (analytic).
      expect(dist(a[1], a[2])).toBeCloseTo(2 * 1.4305, 12);
    }
  });

  it('a symmetric stretch sets every bond and leaves the angle alone', () => {
    const plan = planScan(parseRunFile(run(water, { coordinate: { type: 'stretch', bonds: [[0, 1], [0, 2]] }, from: 1.6, to: 2.0, step: 0.2, units: 'bohr' })));
    expect(plan.points).toEqual([1.6, 1.8, 2.0]);
    plan.pointRunFiles.forEach((rf, k) => {
      const a = atoms(rf);
      expect(dist(a[0], a[1])).toBeCloseTo(plan.points[k], 12);
      expect(dist(a[0], a[2])).toBeCloseTo(plan.points[k], 12);
      expect(angle(a[1], a[0], a[2])).toBeCloseTo(angle(water.atoms[1], water.atoms[0], water.atoms[2]), 10);
    });
  });

  it('an angle scan turns the moved atom about the apex and keeps its bond length', () => {
    const plan = planScan(parseRunFile(run(water, { coordinate: { type: 'angle', atoms: [1, 0, 2] }, points: [90, 120, 180], units: 'degree' })));
    plan.pointRunFiles.forEach((rf, k) => {
      const a = atoms(rf);
      expect(angle(a[1], a[0], a[2])).toBeCloseTo(plan.points[k], 8);
      expect(dist(a[0], a[2])).toBeCloseTo(dist(water.atoms[0], water.atoms[2]), 12);
    });
  });

  it('the default fragments of a distance scan are the moved group and the rest, neutral and of lowest spin', () => {
    const plan = planScan(parseRunFile(run(h2, { coordinate: { type: 'distance', atoms: [0, 1] }, from: 1, to: 2, step: 0.5, units: 'bohr' })));
    expect(plan.fragments!.map((f) => [f.atoms, f.charge, f.multiplicity])).toEqual([[[0], 0, 1 + 1], [[1], 0, 2]]);
    expect(plan.dissociation).toBe('fragments');
  });
});

describe('scan fields of the run file: bad input is refused with a message naming the field', () => {
  const distance = { coordinate: { type: 'distance', atoms: [0, 1] }, from: 0.5, to: 6, step: 0.1, units: 'bohr' };
  const cases: [string, unknown, RegExp, string?][] = [
    ['an atom that does not exist', run(h2, { ...distance, coordinate: { type: 'distance', atoms: [0, 2] } }), /atom 2 does not exist/, 'scan.coordinate'],
    ['a zero step', run(h2, { ...distance, step: 0 }), /step must not be zero/, 'scan.step'],
    ['a step of the wrong sign', run(h2, { ...distance, step: -0.1 }), /never goes from/, 'scan.step'],
    ['both points and a range', run(h2, { ...distance, points: [1, 2] }), /either points or from/, 'scan.points'],
    ['a range without a step', run(h2, { coordinate: distance.coordinate, from: 1, to: 2, units: 'bohr' }), /from, to and step/, 'scan.step'],
    ['degrees for a distance', run(h2, { ...distance, units: 'degree' }), /"bohr" or "angstrom"/, 'scan.units'],
    ['an angle over 180°', run(water, { coordinate: { type: 'angle', atoms: [1, 0, 2] }, points: [100, 190], units: 'degree' }), /\(0, 180\]/, 'scan.points'],
    ['a moved group holding the fixed atom', run(h2, { ...distance, coordinate: { type: 'distance', atoms: [0, 1], move: [0, 1] } }), /cannot move/, 'scan.coordinate.move'],
    ['methods without a scan', { format: 'ketbook-run/1', system: h2, methods: [{ reference: 'RHF' }] }, /goes with a scan/, 'methods'],
    ['a UHF method with a CI space', run(h2, distance, [{ reference: 'UHF', space: 'FCI' }]), /UHF methods are SCF only/, 'methods.0.space'],
    ['+Q on full CI', run(h2, distance, [{ space: 'FCI', plusQ: true }]), /plusQ goes with a truncated CI/, 'methods.0.plusQ'],
    ['excited roots without a CI', run(h2, distance, [{ reference: 'RHF', roots: 2 }]), /one root/, 'methods.0.roots'],
    ['a reference method that does not exist', run(h2, { ...distance, referenceMethod: 3 }, [{ reference: 'RHF' }]), /no method 3/, 'scan.referenceMethod'],
    ['a scan of a Hubbard model', run({ type: 'hubbard', sites: 4, U: 4, electrons: 4 }, distance), /needs a molecule/, 'scan'],
    ['ci beside methods', run(h2, distance, [{ reference: 'RHF' }], { ci: { space: 'FCI' } }), /put the CI settings in methods/, 'ci'],
    ['too many points', run(h2, { ...distance, step: 0.001, to: 10 }), /more than 2000 points/, 'scan.step'],
  ];
  for (const [what, input, message, field] of cases) {
    it(`refuses ${what}`, () => {
      const issue = issueOf(input);
      expect(issue.message).toMatch(message);
      if (field) expect(issue.field).toBe(field);
    });
  }

  it('refuses a point that puts two atoms on top of each other, before computing anything', () => {
    const rf = parseRunFile(run(h2, { coordinate: { type: 'distance', atoms: [0, 1] }, points: [1.0, 0.01], units: 'bohr' }));
    expect(() => planScan(rf)).toThrow(/puts atoms 0 and 1/);
  });

  it('a charged molecule needs its fragments named', () => {
    const rf = parseRunFile(run({ ...h2, charge: 1, multiplicity: 2 }, distance, [{ reference: 'UHF' }]));
    expect(() => planScan(rf)).toThrow(/which fragment carries the charge/);
    const named = parseRunFile(
      run({ ...h2, charge: 1, multiplicity: 2 }, { ...distance, fragments: [{ atoms: [0], charge: 1 }, { atoms: [1] }] }, [{ reference: 'UHF' }]),
    );
    expect(planScan(named).fragments!.map((f) => [f.charge, f.multiplicity])).toEqual([[1, 1], [0, 2]]);
  });

  it('without a methods list the run\'s own reference and ci are the one method', () => {
    const plan = planScan(parseRunFile(run(h2, distance, undefined, { ci: { space: 'CISD' } })));
    expect(plan.methods.map((m) => m.label)).toEqual(['CISD']);
    expect(plan.points).toHaveLength(56);
    expect(plan.points[55]).toBe(6);
  });
});
