import { describe, expect, it } from 'vitest';
import { atomsFromXyz, atomsToXyz } from '../../../components/run/xyzText';
import { integralsFromJson } from '../../../components/run/integralsUpload';
import { downloadName } from '../../../components/results/downloadJson';
import { BOHR_TO_ANGSTROM } from '../../../solver/constants';

describe('XYZ box', () => {
  it('writes the form atoms as XYZ in ångström and reads them back', () => {
    const text = atomsToXyz([['H', 0, 0, 0], ['H', 0, 0, 1.4]], 'bohr', 'H2');
    expect(text.split('\n')[0]).toBe('2');
    const back = atomsFromXyz(text);
    expect('atoms' in back).toBe(true);
    if (!('atoms' in back)) return;
    expect(back.comment).toBe('H2');
    expect(back.atoms[1][3]).toBeCloseTo(1.4 * BOHR_TO_ANGSTROM, 8); // CODATA 2018 bohr radius via solver/constants.ts
  });

  it('turns a malformed XYZ into the parser message naming the line', () => {
    const out = atomsFromXyz('2\nwater?\nO 0 0 0\nH 0 0 abc\n');
    expect('error' in out && out.error).toMatch(/line 4/);
  });

  it('refuses a count that does not match the atom lines', () => {
    const out = atomsFromXyz('3\n\nH 0 0 0\nH 0 0 0.74\n');
    expect('error' in out && out.error).toMatch(/3 atoms/);
  });
});

describe('integral-file upload', () => {
  const layout = { type: 'integrals', orbitals: 1, electrons: 1, multiplicity: 2, coreEnergy: 0, oneBody: [[-0.5]], twoBody: [] };

  it('accepts the integral layout on its own or inside a run file', () => {
    expect(integralsFromJson(JSON.stringify(layout))).toEqual({ system: layout });
    expect(integralsFromJson(JSON.stringify({ format: 'ketbook-run/1', system: layout }))).toEqual({ system: layout });
  });

  it('explains a file that is not JSON or not an integral layout', () => {
    expect(integralsFromJson('{oops')).toMatchObject({ error: expect.stringContaining('not valid JSON') });
    expect(integralsFromJson('{"type":"molecule"}')).toMatchObject({ error: expect.stringContaining('"type": "integrals"') });
  });
});

describe('download names', () => {
  it('makes a file-system-safe name from the title', () => {
    expect(downloadName('H2 at 1.4 bohr', 'run')).toBe('h2-at-1-4-bohr.run.json');
    expect(downloadName(undefined, 'result')).toBe('ketbook.result.json');
  });
});
