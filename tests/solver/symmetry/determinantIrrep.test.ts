import { describe, expect, it } from 'vitest';
import { characterTable, determinantIrrep, irrepIndex, irrepLabel, rootIrrep } from '../../../solver/symmetry';

// Water's lowest seven orbitals in the yz-plane convention: 1a1 2a1 1b2 3a1 1b1 4a1 2b2
// (from memory of the well-known minimal-basis water ordering; only its irreps matter here).
const WATER = Int32Array.from(['A1', 'A1', 'B2', 'A1', 'B1', 'A1', 'B2'].map((l) => irrepIndex('C2v', l)));

describe('determinantIrrep', () => {
  it('gives a closed shell the totally symmetric irrep', () => {
    // common practice, no source: a doubly occupied orbital contributes χ² = 1
    expect(determinantIrrep(WATER, 0b11111, 0b11111)).toBe(0);
    expect(determinantIrrep(WATER, 0b1111111, 0b1111111)).toBe(0);
  });

  it('is the product of the occupied spin orbitals’ characters under every operation', () => {
    // common practice, no source: checked against the character table, not against XOR
    const table = characterTable('C2v');
    for (let alpha = 0; alpha < 1 << WATER.length; alpha += 7) {
      for (let beta = 0; beta < 1 << WATER.length; beta += 11) {
        const irrep = determinantIrrep(WATER, alpha, beta);
        table.operations.forEach((_, k) => {
          let chi = 1;
          for (let p = 0; p < WATER.length; p++) {
            if (alpha & (1 << p)) chi *= table.characters[WATER[p]][k];
            if (beta & (1 << p)) chi *= table.characters[WATER[p]][k];
          }
          expect(table.characters[irrep][k]).toBe(chi);
        });
      }
    }
  });

  it('labels the single excitations of water', () => {
    // 1b1 → 4a1 gives B1; 1b1 → 2b2 gives B1 ⊗ B2 = A2 (Cotton (1990), appendix: C2v products)
    const reference = 0b0011111;
    const toA1 = 0b0101111; // α 1b1 → 4a1
    const toB2 = 0b1001111; // α 1b1 → 2b2
    expect(irrepLabel('C2v', determinantIrrep(WATER, toA1, reference))).toBe('B1');
    expect(irrepLabel('C2v', determinantIrrep(WATER, toB2, reference))).toBe('A2');
    expect(irrepLabel('C2v', determinantIrrep(WATER, reference, 0b0110111))).toBe('A1'); // β 3a1 → 4a1
  });

  it('reads bigint patterns and Ketbook occupation strings the same way', () => {
    const alpha = 0b0101111;
    const beta = 0b1010111;
    const expected = determinantIrrep(WATER, alpha, beta);
    expect(determinantIrrep(WATER, BigInt(alpha), BigInt(beta))).toBe(expected);
    // Ketbook notation: orbital 0 first.
    expect(determinantIrrep(WATER, '1111010', '1110101')).toBe(expected);
    expect(rootIrrep(WATER, { alpha: '1111010', beta: '1110101' })).toBe(expected);
    expect(() => determinantIrrep(WATER, 1 << 9, 0)).toThrow(RangeError);
  });
});
