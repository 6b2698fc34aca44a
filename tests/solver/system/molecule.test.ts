import { describe, expect, it } from 'vitest';
import {
  alphaBetaCounts,
  buildMolecule,
  centreOfMassBohr,
  electronCount,
  nuclearRepulsionHartree,
  rotateMolecule,
  translateMolecule,
  type MoleculeInput,
} from '../../../solver/system/molecule';
import { elementBySymbol } from '../../../solver/system/elements';
import { SolverError } from '../../../solver/errors';
import { ANGSTROM_TO_BOHR } from '../../../solver/constants';

function failure(run: () => unknown): SolverError {
  try {
    run();
  } catch (error) {
    expect(error).toBeInstanceOf(SolverError);
    expect((error as SolverError).code).toBe('bad-input');
    return error as SolverError;
  }
  throw new Error('expected a bad-input error');
}

const h2o = (extra: Partial<MoleculeInput> = {}): MoleculeInput => ({
  atoms: [
    { symbol: 'O', position: [0, 0, 0] },
    { symbol: 'H', position: [0, 0.757, 0.587] },
    { symbol: 'h', position: [0, -0.757, 0.587] },
  ],
  units: 'angstrom',
  charge: 0,
  multiplicity: 1,
  ...extra,
});

describe('elements', () => {
  it('looks up symbols in any case', () => {
    expect(elementBySymbol('ne').atomicNumber).toBe(10); // periodic table
    expect(elementBySymbol('HE').symbol).toBe('He');
    expect(elementBySymbol('C').isotopeMassU).toBe(12); // ¹²C defines the unit (exact)
    expect(Math.abs(elementBySymbol('O').isotopeMassU - 15.9949146)).toBeLessThan(1e-6); // from memory of AME2020 (¹⁶O 15.994914620)
  });
  it('names an unknown symbol and the supported range', () => {
    expect(failure(() => elementBySymbol('Na')).message).toMatch(/unknown element "Na".*H to Ne/);
  });
});

describe('buildMolecule', () => {
  it('converts ångström to bohr and normalises symbols', () => {
    const m = buildMolecule(h2o());
    expect(m.atoms[2].symbol).toBe('H');
    expect(m.atoms[1].positionBohr[1]).toBeCloseTo(0.757 * ANGSTROM_TO_BOHR, 14); // CODATA 2018 conversion
    expect(electronCount(m)).toBe(10); // Z(O) + 2 Z(H)
  });

  it('computes the nuclear repulsion without ghosts', () => {
    const h2 = buildMolecule({ atoms: [{ symbol: 'H', position: [0, 0, 0] }, { symbol: 'H', position: [0, 0, 1.4] }], units: 'bohr', charge: 0, multiplicity: 1 });
    expect(nuclearRepulsionHartree(h2)).toBeCloseTo(1 / 1.4, 14); // Z²/R (analytic); Szabo & Ostlund (1996) §3.5.2 print 0.7143
    const ghosted = buildMolecule({
      atoms: [{ symbol: 'He', position: [0, 0, 0] }, { symbol: 'H', position: [0, 0, 1.4632] }, { symbol: 'O', position: [3, 0, 0], ghost: true }],
      units: 'bohr',
      charge: 1,
      multiplicity: 1,
    });
    expect(nuclearRepulsionHartree(ghosted)).toBeCloseTo(2 / 1.4632, 14); // Z_He Z_H / R (analytic); ghost carries no charge
    expect(electronCount(ghosted)).toBe(2);
  });

  it('gives α/β counts with nAlpha ≥ nBeta', () => {
    expect(alphaBetaCounts(buildMolecule(h2o({ multiplicity: 3 })))).toEqual({ nAlpha: 6, nBeta: 4 }); // (N ± 2S)/2
    expect(alphaBetaCounts(buildMolecule(h2o({ charge: 1, multiplicity: 2 })))).toEqual({ nAlpha: 5, nBeta: 4 });
  });

  it('refuses bad input with messages naming atoms and counts', () => {
    expect(failure(() => buildMolecule(h2o({ atoms: [] }))).message).toMatch(/at least one atom/);
    const close = failure(() =>
      buildMolecule(h2o({ atoms: [{ symbol: 'O', position: [0, 0, 0] }, { symbol: 'H', position: [1, 0, 0] }, { symbol: 'H', position: [0, 0, 0.03], ghost: true }] })),
    );
    expect(close.message).toMatch(/atoms 1 \(O\) and 3 \(H\) are only 0\.0567 bohr apart/); // 0.03 Å in bohr
    expect(close.field).toBe('system.atoms[2]');
    expect(failure(() => buildMolecule(h2o({ atoms: [{ symbol: 'H', position: [0, NaN, 0] }] }))).message).toMatch(/atom 1 \(H\).*finite/);
    expect(failure(() => buildMolecule(h2o({ multiplicity: 2 }))).message).toBe('10 electrons cannot have multiplicity 2');
    expect(failure(() => buildMolecule(h2o({ multiplicity: 13 }))).message).toBe('10 electrons cannot have multiplicity 13');
    expect(failure(() => buildMolecule(h2o({ charge: 10 }))).message).toMatch(/leaves 0 electrons/);
    expect(failure(() => buildMolecule(h2o({ atoms: [{ symbol: 'Xx', position: [0, 0, 0] }] }))).field).toBe('system.atoms[0]');
  });
});

describe('geometry helpers', () => {
  it('centre of mass uses isotope masses and skips ghosts', () => {
    const m = buildMolecule({
      atoms: [{ symbol: 'C', position: [0, 0, 0] }, { symbol: 'O', position: [0, 0, 2] }, { symbol: 'Ne', position: [5, 5, 5], ghost: true }],
      units: 'bohr',
      charge: 0,
      multiplicity: 1,
    });
    const c = centreOfMassBohr(m);
    expect(c[2]).toBeCloseTo((2 * 15.99491461957) / (12 + 15.99491461957), 12); // from memory of AME2020 masses (¹²C, ¹⁶O)
    expect(c[0]).toBe(0);
  });

  it('translation and rotation keep the nuclear repulsion', () => {
    const m = buildMolecule(h2o());
    const r = Math.SQRT1_2;
    const turned = rotateMolecule(translateMolecule(m, [1, 2, 3]), [[r, -r, 0], [r, r, 0], [0, 0, 1]]);
    expect(nuclearRepulsionHartree(turned)).toBeCloseTo(nuclearRepulsionHartree(m), 12); // fact of the trade
    expect(turned.atoms[0].positionBohr[0]).toBeCloseTo(r * 1 - r * 2, 14); // R·(1, 2, 3), x row
  });
});
