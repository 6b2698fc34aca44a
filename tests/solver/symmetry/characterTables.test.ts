import { describe, expect, it } from 'vitest';
import {
  POINT_GROUP_NAMES,
  characterTable,
  composeOperations,
  irrepCharacter,
  irrepIndex,
  irrepLabel,
  irrepOfParity,
  irrepProduct,
  operationByName,
} from '../../../solver/symmetry';
import { SolverError } from '../../../solver/errors';

const popcountParity = (x: number) => ((x & 1) ^ ((x >> 1) & 1) ^ ((x >> 2) & 1)) as 0 | 1;

describe('character tables of D2h and its subgroups', () => {
  it('carry the usual Mulliken labels, in table order', () => {
    // Cotton (1990), appendix (fact of the trade)
    expect(characterTable('D2h').labels).toEqual(['Ag', 'B1g', 'B2g', 'B3g', 'Au', 'B1u', 'B2u', 'B3u']);
    expect(characterTable('D2').labels).toEqual(['A', 'B1', 'B2', 'B3']);
    expect(characterTable('C2v').labels).toEqual(['A1', 'A2', 'B1', 'B2']);
    expect(characterTable('C2h').labels).toEqual(['Ag', 'Bg', 'Au', 'Bu']);
    expect(characterTable('C2').labels).toEqual(['A', 'B']);
    expect(characterTable('Cs').labels).toEqual(["A'", "A''"]);
    expect(characterTable('Ci').labels).toEqual(['Ag', 'Au']);
    expect(characterTable('C1').labels).toEqual(['A']);
  });

  it('XOR of irrep integers is the direct product: characters multiply for every pair', () => {
    // common practice, no source: in an abelian group χ_(a⊗b)(R) = χ_a(R) χ_b(R)
    for (const group of POINT_GROUP_NAMES) {
      const table = characterTable(group);
      const h = table.operations.length;
      expect(table.labels.length).toBe(h);
      for (let a = 0; a < h; a++) {
        for (let b = 0; b < h; b++) {
          const product = irrepProduct(a, b);
          expect(product).toBeLessThan(h);
          for (let k = 0; k < h; k++) {
            expect(table.characters[product][k]).toBe(table.characters[a][k] * table.characters[b][k]);
          }
        }
      }
    }
  });

  it('rows are orthogonal with norm h (great orthogonality theorem)', () => {
    // Cotton (1990) ch. 4, great orthogonality theorem
    for (const group of POINT_GROUP_NAMES) {
      const { characters, operations } = characterTable(group);
      const h = operations.length;
      for (let a = 0; a < h; a++) {
        for (let b = 0; b < h; b++) {
          const sum = characters[a].reduce((s, c, k) => s + c * characters[b][k], 0);
          expect(sum).toBe(a === b ? h : 0);
        }
      }
    }
  });

  it('tables agree with the sign patterns acting on x^a y^b z^c', () => {
    // analytic: an operation reversing the axes in mask f multiplies a monomial of parity p by (−1)^|p∧f|
    for (const group of POINT_GROUP_NAMES) {
      const table = characterTable(group);
      for (let parity = 0; parity < 8; parity++) {
        const irrep = irrepOfParity(group, parity);
        for (const op of table.operations) {
          expect(irrepCharacter(group, irrep, op)).toBe(popcountParity(parity & op.flipMask) ? -1 : 1);
        }
      }
    }
  });

  it('place x, y, z and the binary products where the printed tables do', () => {
    // Cotton (1990), appendix: the linear and quadratic function columns
    const X = 0b001;
    const Y = 0b010;
    const Z = 0b100;
    const label = (g: string, p: number) => irrepLabel(g, irrepOfParity(g, p));
    expect([label('D2h', X), label('D2h', Y), label('D2h', Z)]).toEqual(['B3u', 'B2u', 'B1u']);
    expect([label('D2h', X | Y), label('D2h', X | Z), label('D2h', Y | Z), label('D2h', 7)]).toEqual(['B1g', 'B2g', 'B3g', 'Au']);
    expect([label('D2', X), label('D2', Y), label('D2', Z)]).toEqual(['B3', 'B2', 'B1']);
    expect([label('C2v', X), label('C2v', Y), label('C2v', Z), label('C2v', X | Y)]).toEqual(['B1', 'B2', 'A1', 'A2']);
    expect([label('C2h', X), label('C2h', Y), label('C2h', Z), label('C2h', X | Y), label('C2h', X | Z)]).toEqual(['Bu', 'Bu', 'Au', 'Ag', 'Bg']);
    expect([label('C2', X), label('C2', Z)]).toEqual(['B', 'A']);
    expect([label('Cs', X), label('Cs', Y), label('Cs', Z)]).toEqual(["A'", "A'", "A''"]);
    expect([label('Ci', X), label('Ci', X | Y)]).toEqual(['Au', 'Ag']);
  });

  it('multiplies operations by XOR of their reversed axes', () => {
    // common practice, no source: C2(z)C2(y) = C2(x), i·C2(z) = σ(xy), σ(xz)σ(yz) = C2(z)
    expect(composeOperations(operationByName('C2z'), operationByName('C2y')).name).toBe('C2x');
    expect(composeOperations(operationByName('i'), operationByName('C2z')).name).toBe('sxy');
    expect(composeOperations(operationByName('sxz'), operationByName('syz')).name).toBe('C2z');
  });

  it('looks labels up both ways and rejects unknown ones', () => {
    expect(irrepIndex('D2h', 'B1u')).toBe(5);
    expect(irrepIndex('D2h', 'b1u')).toBe(5);
    expect(irrepIndex('Cs', 'A"')).toBe(1);
    expect(irrepLabel('C2v', irrepProduct(irrepIndex('C2v', 'B1'), irrepIndex('C2v', 'B2')))).toBe('A2');
    // z·y = yz in D2h: B1u ⊗ B2u = B3g (Cotton (1990), appendix)
    expect(irrepLabel('D2h', irrepProduct(5, 6))).toBe('B3g');
    try {
      irrepIndex('C2v', 'B3u');
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(SolverError);
      expect((e as SolverError).code).toBe('bad-input');
      expect((e as SolverError).field).toBe('ci.irrep');
    }
    expect(() => irrepLabel('D3h', 0)).toThrow(SolverError);
    expect(() => irrepLabel('C2', 2)).toThrow(SolverError);
  });
});
