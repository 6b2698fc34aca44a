import { describe, expect, it } from 'vitest';
import { csvField, csvText, determinantsCsv, rootsCsv } from '../../components/results/resultsCsv';
import { parseRunFile } from '../../solver/runFile/parse';
import { runCalculation } from '../../solver/run/runCalculation';

/**
 * A strict reader of RFC 4180 (Shafranovich, RFC 4180 §2, 2005): records end in CRLF, fields
 * are separated by commas, a field is either free of '"', ',', CR and LF, or enclosed in double
 * quotes with each inner quote doubled. Anything else throws, so a sloppy writer fails the test.
 */
function readRfc4180(text: string): string[][] {
  const records: string[][] = [];
  let i = 0;
  if (!text.endsWith('\r\n')) throw new Error('the last record must end in CRLF');
  while (i < text.length) {
    const record: string[] = [];
    for (;;) {
      let field = '';
      if (text[i] === '"') {
        i++;
        for (;;) {
          if (i >= text.length) throw new Error('unterminated quoted field');
          if (text[i] === '"') {
            if (text[i + 1] === '"') {
              field += '"';
              i += 2;
            } else {
              i++;
              break;
            }
          } else field += text[i++];
        }
      } else {
        while (i < text.length && text[i] !== ',' && text[i] !== '\r') {
          if (text[i] === '"' || text[i] === '\n') throw new Error(`bare ${JSON.stringify(text[i])} in an unquoted field at ${i}`);
          field += text[i++];
        }
      }
      record.push(field);
      if (text[i] === ',') {
        i++;
        continue;
      }
      if (text[i] === '\r' && text[i + 1] === '\n') {
        i += 2;
        break;
      }
      throw new Error(`expected a comma or CRLF at ${i}`);
    }
    records.push(record);
  }
  const width = records[0].length;
  records.forEach((r, k) => {
    if (r.length !== width) throw new Error(`record ${k} has ${r.length} fields, the header ${width}`);
  });
  return records;
}

describe('CSV fields and records (RFC 4180 §2)', () => {
  it('quotes only fields with a comma, a quote, CR or LF, doubling inner quotes', () => {
    // RFC 4180 §2 rules 5–7
    expect(csvField('1100')).toBe('1100');
    expect(csvField(-1.5)).toBe('-1.5');
    expect(csvField(null)).toBe('');
    expect(csvField('a,b')).toBe('"a,b"');
    expect(csvField('say "hi"')).toBe('"say ""hi"""');
    expect(csvField('two\r\nlines')).toBe('"two\r\nlines"');
    const text = csvText([['name', 'note'], ['x', 'a, "b"\nc']]);
    expect(text).toBe('name,note\r\nx,"a, ""b""\nc"\r\n');
    expect(readRfc4180(text)).toEqual([['name', 'note'], ['x', 'a, "b"\nc']]);
  });

  it('the strict reader refuses what RFC 4180 does not allow', () => {
    expect(() => readRfc4180('a,b\nc,d\n')).toThrow();
    expect(() => readRfc4180('a,b"c\r\n')).toThrow(/bare/);
    expect(() => readRfc4180('a,b\r\nc\r\n')).toThrow(/fields/);
  });
});

describe('the results CSV files', async () => {
  const result = await runCalculation(
    parseRunFile({
      format: 'ketbook-run/1',
      system: { type: 'molecule', units: 'bohr', atoms: [['H', 0, 0, 0], ['H', 0, 0, 1.4]], charge: 0, multiplicity: 1, basis: 'STO-3G' },
      ci: { space: 'FCI', roots: 3 },
    }),
  );

  it('carry every root with the numbers of the result, to the last digit', () => {
    const records = readRfc4180(rootsCsv(result));
    expect(records[0]).toEqual(['root', 'energy_hartree', 'correlation_energy_hartree', 'excitation_energy_hartree', 's_squared', 'multiplicity', 'irrep', 'c0_squared']);
    expect(records).toHaveLength(1 + result.ci!.roots.length);
    result.ci!.roots.forEach((r, k) => {
      const row = records[k + 1];
      expect(Number(row[0])).toBe(k + 1);
      expect(Number(row[1])).toBe(r.energy);
      expect(Number(row[2])).toBe(r.correlationEnergy);
      expect(Number(row[3])).toBe(r.excitationEnergy);
      expect(Number(row[4])).toBe(r.s2);
      expect(Number(row[7])).toBe(r.referenceWeight);
    });
    // from memory of Szabo & Ostlund (1996) §4.3: H2 STO-3G full CI at 1.4 bohr ≈ −1.1373 hartree
    expect(Number(records[1][1])).toBeCloseTo(-1.1373, 3);
  });

  it('list the leading determinants of every root in the occupation notation', () => {
    const records = readRfc4180(determinantsCsv(result));
    expect(records[0]).toEqual(['root', 'rank', 'alpha', 'beta', 'coefficient', 'weight', 'excitation_level']);
    const expected = result.ci!.roots.reduce((s, r) => s + r.leadingDeterminants.length, 0);
    expect(records).toHaveLength(1 + expected);
    const first = result.ci!.roots[0].leadingDeterminants[0];
    expect(records[1]).toEqual(['1', '1', first.alpha, first.beta, String(first.coefficient), String(first.weight), String(first.excitationLevel)]);
    // H2 ground state: the leading determinant is the RHF one, α 10 β 10 (Szabo & Ostlund (1996) §2.4)
    expect(records[1].slice(2, 4)).toEqual(['10', '10']);
  });
});
