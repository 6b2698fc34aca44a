import { describe, expect, it } from 'vitest';
import { parseRunFile } from '../../../solver/runFile/parse';
import { canonicalJson, runFileHash } from '../../../solver/runFile/canonical';
import { toJsonSafe } from '../../../solver/runFile/jsonSafety';
import { SolverError } from '../../../solver/errors';

const h2 = {
  format: 'ketbook-run/1',
  system: { type: 'molecule', units: 'bohr', atoms: [['H', 0, 0, 0], ['H', 0, 0, 1.4]], charge: 0, multiplicity: 1, basis: 'STO-3G' },
  reference: 'RHF',
  ci: { space: 'FCI' },
};

function issuesOf(value: unknown): { path: string; message: string }[] {
  try {
    parseRunFile(value);
  } catch (e) {
    expect(e).toBeInstanceOf(SolverError);
    return (e as SolverError).details as { path: string; message: string }[];
  }
  throw new Error('expected the run file to be refused');
}

describe('the run-file schema', () => {
  it('accepts the documented layout and fills defaults', () => {
    const run = parseRunFile(h2);
    expect(run.ci?.roots).toBe(1);
    expect(run.ci?.frozenCore).toBe(0);
    expect(run.symmetry).toBe(true);
  });

  it('accepts ghost atoms, Hubbard lattices and integral files', () => {
    expect(() => parseRunFile({ ...h2, system: { ...h2.system, atoms: [['H', 0, 0, 0], ['H', 0, 0, 1.4, { ghost: true }]] } })).not.toThrow();
    expect(() => parseRunFile({ format: 'ketbook-run/1', system: { type: 'hubbard', sites: 4, periodic: true, t: 1, U: 4, electrons: 4 }, ci: { space: 'FCI' } })).not.toThrow();
  });

  it('refuses an excitation level that clashes with the named space', () => {
    expect(issuesOf({ ...h2, ci: { space: 'CISD', excitationLevel: 3 } })[0].path).toBe('ci.excitationLevel');
    expect(issuesOf({ ...h2, ci: { space: 'CI' } })[0].message).toMatch(/needs an excitationLevel/);
  });

  it('refuses CI on UHF orbitals, a two-site ring, unknown fields and a wrong format', () => {
    expect(issuesOf({ ...h2, reference: 'UHF' })[0].message).toMatch(/UHF runs are SCF only/);
    expect(issuesOf({ format: 'ketbook-run/1', system: { type: 'hubbard', sites: 2, periodic: true, U: 1, electrons: 2 } })[0].message).toMatch(/ring needs at least 3/);
    expect(issuesOf({ ...h2, colour: 'blue' }).length).toBeGreaterThan(0);
    expect(issuesOf({ ...h2, format: 'ketbook-run/2' })[0].path).toBe('format');
  });

  it('hashes the same meaning to the same digest', async () => {
    const reordered = { ci: { space: 'FCI' }, reference: 'RHF', system: h2.system, format: 'ketbook-run/1' };
    expect(canonicalJson(reordered)).toBe(canonicalJson(h2));
    const a = await runFileHash(parseRunFile(h2));
    const b = await runFileHash(parseRunFile(reordered));
    expect(a).toBe(b);
    expect(a).toMatch(/^[0-9a-f]{64}$/);
  });

  it('never lets a NaN or an infinity into JSON', () => {
    expect(toJsonSafe({ e: new Float64Array([1, 2]) })).toEqual({ e: [1, 2] });
    expect(() => toJsonSafe({ energies: { roots: [-1, Number.NaN] } })).toThrow(/energies\.roots\[1\]/);
    expect(() => toJsonSafe({ x: Infinity })).toThrow(SolverError);
  });
});
