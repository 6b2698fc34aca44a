import type { Vec3 } from '../types';
import { badInput } from '../errors';
import { ELEMENTS, normaliseSymbol } from './elements';

export interface XyzContent {
  comment: string;
  /** Positions in ångström, as the XYZ format writes them. */
  atoms: { symbol: string; position: Vec3 }[];
}

const KNOWN = new Set(ELEMENTS.map((e) => e.symbol));

function parseAtomLine(line: string, lineNumber: number): { symbol: string; position: Vec3 } {
  const columns = line.trim().split(/\s+/);
  if (columns.length < 4) {
    throw badInput(`line ${lineNumber}: expected "symbol x y z" but found ${columns.length} column${columns.length === 1 ? '' : 's'}`);
  }
  const symbol = normaliseSymbol(columns[0]);
  if (!KNOWN.has(symbol)) {
    throw badInput(`line ${lineNumber}: unknown element "${columns[0]}" (supported: H to Ne)`);
  }
  const position = [0, 0, 0] as Vec3;
  for (let k = 0; k < 3; k++) {
    const text = columns[k + 1];
    // Number("") and Number("0x10") are too lenient; accept plain decimal/exponent notation only.
    const value = /^[+-]?(\d+\.?\d*|\.\d+)([eEdD][+-]?\d+)?$/.test(text) ? Number(text.replace(/[dD]/, 'e')) : NaN;
    if (!Number.isFinite(value)) {
      throw badInput(`line ${lineNumber}: coordinate ${'xyz'[k]} "${text}" is not a number`);
    }
    position[k] = value;
  }
  return { symbol, position };
}

/**
 * Reads the open XYZ format: a line with the atom count, a comment line, then one
 * "symbol x y z" line per atom in ångström (extra columns are ignored). A bare list of
 * atom lines without the two header lines is accepted too, since that is what people paste.
 * Errors are bad input naming the 1-based line.
 */
export function parseXyz(text: string): XyzContent {
  const lines = text.replace(/\r\n?/g, '\n').split('\n');
  // Trailing blank lines are harmless; inner blank lines in the atom block are not allowed.
  while (lines.length > 0 && lines[lines.length - 1].trim() === '') lines.pop();
  let first = 0;
  while (first < lines.length && lines[first].trim() === '') first++;
  if (first >= lines.length) throw badInput('the XYZ text is empty');

  const head = lines[first].trim();
  if (/^\d+$/.test(head)) {
    const count = Number(head);
    if (count < 1) throw badInput(`line ${first + 1}: the atom count must be at least 1`);
    const comment = first + 1 < lines.length ? lines[first + 1].trim() : '';
    const atomLines = lines.slice(first + 2);
    if (atomLines.length !== count) {
      throw badInput(
        `line ${first + 1}: the count says ${count} atom${count === 1 ? '' : 's'} but ${atomLines.length} atom line${atomLines.length === 1 ? ' follows' : 's follow'}`,
      );
    }
    return { comment, atoms: atomLines.map((line, i) => parseAtomLine(line, first + 3 + i)) };
  }
  const atoms = [] as { symbol: string; position: Vec3 }[];
  for (let i = first; i < lines.length; i++) {
    if (lines[i].trim() === '') throw badInput(`line ${i + 1}: blank line inside the atom list`);
    atoms.push(parseAtomLine(lines[i], i + 1));
  }
  return { comment: '', atoms };
}
