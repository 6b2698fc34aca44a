import { describe, expect, it } from 'vitest';
import { buildMolecule } from '../../../solver/system/molecule';
import { buildBasis, basisSpecSchema, zetaSchema } from '../../../solver/basis';
import { overlapMatrix } from '../../../solver/integrals';
import { SolverError } from '../../../solver/errors';
import { ELEMENTS } from '../../../solver/system/elements';

const water = buildMolecule({
  atoms: [
    { symbol: 'O', position: [0, 0, 0.22] },
    { symbol: 'H', position: [0, 1.43, -0.89] },
    { symbol: 'H', position: [0, -1.43, -0.89], ghost: true },
  ],
  units: 'bohr',
  charge: 0,
  multiplicity: 2,
});

function badInputMessage(run: () => unknown): string {
  try {
    run();
  } catch (error) {
    expect(error).toBeInstanceOf(SolverError);
    expect((error as SolverError).code).toBe('bad-input');
    return (error as SolverError).message;
  }
  throw new Error('expected a bad-input error');
}

describe('normalisation ⟨χ|χ⟩ = 1', () => {
  it('holds for every function of STO-2G … STO-6G on H–Ne', () => {
    for (const name of ['STO-2G', 'STO-3G', 'STO-4G', 'STO-5G', 'STO-6G']) {
      for (const { symbol, atomicNumber } of ELEMENTS) {
        const atom = buildMolecule({ atoms: [{ symbol, position: [0.3, -0.2, 0.1] }], units: 'bohr', charge: 0, multiplicity: atomicNumber % 2 === 1 ? 2 : 1 });
        const basis = buildBasis(atom, name);
        const s = overlapMatrix(basis);
        for (let i = 0; i < basis.nFunctions; i++) expect(Math.abs(s[i * basis.nFunctions + i] - 1)).toBeLessThan(1e-12); // common practice, no source
      }
    }
  });

  it('holds for every Cartesian component of a contracted custom d set', () => {
    const basis = buildBasis(water, {
      type: 'custom',
      name: 'd test',
      elements: { O: [{ shell: 'd', exponents: [2.1, 0.6, 0.17], coefficients: [0.2, 0.5, 0.45] }], H: [{ shell: 'd', exponents: [0.9], coefficients: [1] }] },
    });
    const s = overlapMatrix(basis);
    const n = basis.nFunctions;
    for (let i = 0; i < n; i++) expect(Math.abs(s[i * n + i] - 1)).toBeLessThan(1e-12); // common practice, no source
    // One-centre Cartesian d: ⟨dxx|dyy⟩ = 1/3 for normalised components (analytic: ∫x²y² / ∫x⁴ = 1/3)
    expect(s[0 * n + 3]).toBeCloseTo(1 / 3, 12);
    expect(s[1 * n + 2]).toBeCloseTo(0, 14); // ⟨dxy|dxz⟩ vanishes by parity (analytic)
  });
});

describe('buildBasis layout and labels', () => {
  it('orders STO-3G water atom by atom with labels; the ghost keeps its functions', () => {
    const basis = buildBasis(water, 'sto-3g');
    expect(basis.name).toBe('STO-3G');
    expect(basis.nFunctions).toBe(7); // minimal basis: 5 on O, 1 per H (common practice, no source)
    expect(basis.functionLabels).toEqual(['O1 1s', 'O1 2s', 'O1 2px', 'O1 2py', 'O1 2pz', 'H2 1s', 'H3 1s']);
    expect(Array.from(basis.functionAtom)).toEqual([0, 0, 0, 0, 0, 1, 2]);
    expect(Array.from(basis.shellOffsets)).toEqual([0, 1, 2, 5, 6]);
    // O 1s exponents are the ζ = 1 ones times 7.66² (HSP (1969) scaling): 2.22766·7.66² ≈ 130.709
    expect(basis.shells[0].exponents[0]).toBeCloseTo(2.22766 * 7.66 ** 2, 9);
    expect(basis.shells[0].exponents[0]).toBeCloseTo(130.7093, 3); // from memory of the published STO-3G O 1s exponent 130.70932
  });

  it('applies custom ζ and refuses misplaced ones', () => {
    const plain = buildBasis(water, 'STO-3G');
    const scaled = buildBasis(water, 'STO-3G', { O: { '2sp': 2.0 }, h: 1.0 });
    expect(scaled.shells[1].exponents[0] / plain.shells[1].exponents[0]).toBeCloseTo((2.0 / 2.25) ** 2, 12); // ζ² scaling (analytic)
    expect(scaled.shells[0].exponents[0]).toBe(plain.shells[0].exponents[0]);
    expect(scaled.shells[3].exponents[0] / plain.shells[3].exponents[0]).toBeCloseTo((1.0 / 1.24) ** 2, 12); // ζ² scaling (analytic)
    expect(badInputMessage(() => buildBasis(water, 'STO-3G', { O: 2.2 }))).toMatch(/O has two shells/);
    expect(badInputMessage(() => buildBasis(water, 'STO-3G', { H: { '2sp': 1.2 } }))).toMatch(/H has no 2sp shell/);
    expect(badInputMessage(() => buildBasis(water, 'STO-3G', { Xe: 1 }))).toMatch(/unknown element "Xe"/);
    expect(badInputMessage(() => buildBasis(water, { type: 'even-tempered', elements: { O: { s: { count: 2, alpha: 1, beta: 2 } }, H: { s: { count: 1, alpha: 1, beta: 2 } } } }, { H: 1 }))).toMatch(/STO-nG sets only/);
  });

  it('builds an even-tempered set α·β^k with labels', () => {
    const basis = buildBasis(water, {
      type: 'even-tempered',
      elements: { O: { s: { count: 3, alpha: 0.2, beta: 3 }, p: { count: 2, alpha: 0.3, beta: 2.5 }, d: { count: 1, alpha: 1.1, beta: 2 } }, H: { s: { count: 2, alpha: 0.1, beta: 4 } } },
    });
    expect(basis.nFunctions).toBe(3 + 6 + 6 + 2 + 2);
    expect(Array.from(basis.shells.slice(0, 3).map((s) => s.exponents[0]))).toEqual([0.2, 0.2 * 3, 0.2 * 9]); // Raffenetti & Ruedenberg (1973) α_k = α·β^k
    expect(basis.functionLabels.slice(0, 4)).toEqual(['O1 1s', 'O1 2s', 'O1 3s', 'O1 2px']);
    expect(basis.functionLabels[9]).toBe('O1 3dxx');
    expect(basis.functionLabels[10]).toBe('O1 3dxy');
    expect(basis.functionLabels[16]).toBe('H2 2s');
  });

  it('names an element missing from the set', () => {
    const message = badInputMessage(() => buildBasis(water, { type: 'custom', name: 'only O', elements: { O: [{ shell: 's', exponents: [1], coefficients: [1] }] } }));
    expect(message).toMatch(/"only O" has no functions for H \(atom 2\)/);
  });

  it('splits an sp shell into s and p sharing exponents', () => {
    const basis = buildBasis(water, {
      type: 'custom',
      name: 'sp',
      elements: { O: [{ shell: 'sp', exponents: [3, 0.5], coefficients: [0.3, 0.8], coefficientsP: [0.4, 0.7] }], H: [{ shell: 's', exponents: [1], coefficients: [1] }] },
    });
    expect(basis.shells.map((s) => s.l)).toEqual([0, 1, 0, 0]);
    expect(Array.from(basis.shells[1].exponents)).toEqual([3, 0.5]);
    expect(basis.functionLabels.slice(0, 4)).toEqual(['O1 1s', 'O1 2px', 'O1 2py', 'O1 2pz']);
  });
});

describe('basis and zeta schemas', () => {
  const issues = (value: unknown) => {
    const r = basisSpecSchema.safeParse(value);
    return r.success ? [] : r.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
  };
  it('accepts names in any case and the two set objects', () => {
    expect(basisSpecSchema.parse('sto-6g')).toBe('STO-6G');
    expect(issues({ type: 'even-tempered', elements: { H: { s: { count: 4, alpha: 0.1, beta: 3 } } } })).toEqual([]);
  });
  it('refuses bad input with clear messages', () => {
    expect(issues('STO-7G')[0]).toMatch(/one of STO-2G/);
    expect(issues({ type: 'even-tempered', elements: { H: { s: { count: 21, alpha: 0.1, beta: 3 } } } })[0]).toMatch(/at most 20/);
    expect(issues({ type: 'even-tempered', elements: { H: { s: { count: 2, alpha: 0.1, beta: 1 } } } })[0]).toMatch(/beta must be greater than 1/);
    const custom = issues({ type: 'custom', name: 'x', elements: { H: [{ shell: 'sp', exponents: [1, -2], coefficients: [1] }] } });
    expect(custom).toContain('elements.H.0.exponents.1: exponents must be greater than 0');
    expect(custom).toContain('elements.H.0.coefficients: 2 exponents but 1 coefficients');
    expect(custom).toContain('elements.H.0.coefficientsP: an sp shell needs coefficientsP for its p part');
    expect(issues({ type: 'custom', name: 'x', elements: { H: [{ shell: 's', exponents: Array(31).fill(1), coefficients: Array(31).fill(1) }] } })[0]).toMatch(/at most 30 primitives/);
    expect(issues({ type: 'custom', name: 'x', elements: { H: [{ shell: 'f', exponents: [1], coefficients: [1] }] } })[0]).toMatch(/"s", "p", "d" or "sp"/);
    expect(issues({ type: 'other' })[0]).toMatch(/"even-tempered" or "custom"/);
    expect(zetaSchema.safeParse({ He: -1 }).success).toBe(false);
    expect(zetaSchema.safeParse({ He: 2.0925, C: { '1s': 5.67, '2sp': 1.72 } }).success).toBe(true);
  });
});
