import { describe, expect, it } from 'vitest';
import { checkParity, moleculeElectronCount, systemParity } from '../../../components/run/electronParity';

// Electron counts are Σ Z − charge and the spin rule is N − 2S even with 2S ≤ N: common practice, no source.
describe('electron count and multiplicity parity', () => {
  it('counts electrons from nuclear charges minus the charge', () => {
    expect(moleculeElectronCount([['H', 0, 0, 0], ['H', 0, 0, 1.4]], 0)).toBe(2);
    expect(moleculeElectronCount([['He', 0, 0, 0], ['H', 0, 0, 1.4632]], 1)).toBe(2);
    expect(moleculeElectronCount([['O', 0, 0, 0], ['H', 1, 0, 0], ['H', -1, 0, 0]], 0)).toBe(10);
    expect(moleculeElectronCount([['Li', 0, 0, 0], ['H', 0, 0, 3.015]], -1)).toBe(5);
  });

  it('gives a ghost atom no electrons', () => {
    expect(moleculeElectronCount([['He', 0, 0, 0], ['He', 0, 0, 5.6, { ghost: true }]], 0)).toBe(2);
  });

  it('accepts singlet and triplet for an even count, refuses a doublet', () => {
    expect(checkParity(2, 1).ok).toBe(true);
    expect(checkParity(2, 3).ok).toBe(true);
    const doublet = checkParity(2, 2);
    expect(doublet.ok).toBe(false);
    expect(doublet.message).toContain('cannot have multiplicity 2');
    expect(doublet.message).toContain('odd');
  });

  it('accepts a doublet for an odd count, refuses a singlet', () => {
    expect(checkParity(3, 2).ok).toBe(true);
    expect(checkParity(3, 1).ok).toBe(false);
    expect(checkParity(3, 1).message).toContain('even');
  });

  it('refuses more unpaired electrons than electrons', () => {
    const r = checkParity(2, 5);
    expect(r.ok).toBe(false);
    expect(r.message).toContain('at most multiplicity 3');
  });

  it('refuses a charge that leaves no electrons', () => {
    const r = systemParity({ type: 'molecule', atoms: [['H', 0, 0, 0]], charge: 1, multiplicity: 1 });
    expect(r?.ok).toBe(false);
    expect(r?.electrons).toBe(0);
  });

  it('reports an unknown element instead of a count', () => {
    const r = systemParity({ type: 'molecule', atoms: [['Xx', 0, 0, 0]], charge: 0, multiplicity: 1 });
    expect(r?.ok).toBe(false);
    expect(r?.electrons).toBeNull();
    expect(r?.message).toContain('unknown element');
  });

  it('judges model systems from their electron field', () => {
    expect(systemParity({ type: 'hubbard', sites: 4, U: 4, electrons: 4, multiplicity: 1 })?.ok).toBe(true);
    expect(systemParity({ type: 'hubbard', sites: 4, U: 4, electrons: 4, multiplicity: 2 })?.ok).toBe(false);
    expect(systemParity({ type: 'integrals', electrons: 3, multiplicity: 2 })?.ok).toBe(true);
  });
});
