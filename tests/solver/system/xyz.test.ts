import { describe, expect, it } from 'vitest';
import { parseXyz } from '../../../solver/system/xyz';
import { SolverError } from '../../../solver/errors';

function message(text: string): string {
  try {
    parseXyz(text);
  } catch (error) {
    expect(error).toBeInstanceOf(SolverError);
    expect((error as SolverError).code).toBe('bad-input');
    return (error as SolverError).message;
  }
  throw new Error('expected a bad-input error');
}

describe('parseXyz', () => {
  it('reads the count, comment and atom lines (common practice, no source: XYZ layout)', () => {
    const content = parseXyz('3\nwater, experimental geometry\nO 0.0 0.0 0.1173\nH 0 0.7572 -0.4692\nh 0 -0.7572 -0.4692 extra\n\n');
    expect(content.comment).toBe('water, experimental geometry');
    expect(content.atoms).toEqual([
      { symbol: 'O', position: [0, 0, 0.1173] },
      { symbol: 'H', position: [0, 0.7572, -0.4692] },
      { symbol: 'H', position: [0, -0.7572, -0.4692] },
    ]);
  });

  it('accepts a bare list of atom lines, CRLF line ends and exponent notation', () => {
    const content = parseXyz('He 0 0 0\r\nH 1.5e0 -2E-1 +.5\r\n');
    expect(content.comment).toBe('');
    expect(content.atoms[1].position).toEqual([1.5, -0.2, 0.5]);
  });

  it('names the line of each error', () => {
    expect(message('2\ncomment\nH 0 0 0\n')).toBe('line 1: the count says 2 atoms but 1 atom line follows');
    expect(message('1\ncomment\nXe 0 0 0')).toMatch(/^line 3: unknown element "Xe"/);
    expect(message('H 0 0 0\nH 0 zero 0')).toBe('line 2: coordinate y "zero" is not a number');
    expect(message('H 0 0 0\nH 0 0')).toBe('line 2: expected "symbol x y z" but found 3 columns');
    expect(message('H 0 0 0\n\nH 0 0 1')).toBe('line 2: blank line inside the atom list');
    expect(message('   \n')).toBe('the XYZ text is empty');
    expect(message('H 0 0x10 0')).toMatch(/^line 1: coordinate y/);
  });
});
