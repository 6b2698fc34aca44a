import { describe, expect, it } from 'vitest';
import katex from 'katex';
import { colourOf, logRange, rampColour, ZERO_COLOUR, levelLabel } from '../../components/results/mapPalette';
import { expansionTex, ruleTex, termTex, FORMULA_TERMS_SHOWN } from '../../components/results/breakdownTex';
import { parseRunFile } from '../../solver/runFile/parse';
import { hamiltonianMap, elementBreakdown } from '../../solver/run/hamiltonianMap';

const h2 = parseRunFile({
  format: 'ketbook-run/1',
  system: { type: 'molecule', units: 'bohr', atoms: [['H', 0, 0, 0], ['H', 0, 0, 1.4]], charge: 0, multiplicity: 1, basis: 'STO-3G' },
  ci: { space: 'FCI' },
});
const { view, context } = hamiltonianMap(h2);

describe('the map palette', () => {
  it('gives exact zeros their own colour, never reached by the ramp', () => {
    // design rule of the map (common practice, no source): a tiny value must not look like a Slater–Condon zero
    const range = logRange(view.matrix);
    expect(colourOf(0, range)).toEqual(ZERO_COLOUR);
    expect(colourOf(1e-300, range)).toEqual(rampColour(0));
    expect(rampColour(0)).not.toEqual(ZERO_COLOUR);
    for (let k = 0; k <= 100; k++) expect(rampColour(k / 100)).not.toEqual(ZERO_COLOUR);
    // the largest |H| of H2 is the reference diagonal, the RHF energy ≈ −1.117 hartree (from memory of Szabo & Ostlund (1996) §3.5.2), so the ramp tops at 10^1
    expect(range.top).toBe(1);
    expect(levelLabel(0)).toBe('ref');
    expect(levelLabel(2)).toBe('2×');
  });
});

describe('the breakdown formulas', () => {
  it('typeset in KaTeX without errors, for every element of the H2 map and every rule', () => {
    // katex (npm) is the typesetter the page uses; throwOnError makes bad TeX fail here
    for (let i = 0; i < view.size; i++) {
      for (let j = 0; j < view.size; j++) {
        const b = elementBreakdown(context, i, j);
        expect(() => katex.renderToString(expansionTex(b), { throwOnError: true })).not.toThrow();
        expect(() => katex.renderToString(ruleTex(b.differingSpinOrbitals), { throwOnError: true })).not.toThrow();
        b.terms.forEach((t) => expect(() => katex.renderToString(termTex(t), { throwOnError: true })).not.toThrow());
      }
    }
    expect(() => katex.renderToString(ruleTex(3), { throwOnError: true })).not.toThrow();
  });

  it('writes the reference–double element of H2 as the one integral (01|01)', () => {
    // Szabo & Ostlund (1996) §2.3.3: ⟨Ψ0|H|Ψ_{11̄}^{22̄}⟩ = (12|12) in their 1-based labels, K12 ≈ 0.1813 (§3.5.2)
    const b = elementBreakdown(context, 0, 3);
    expect(termTex(b.terms[0])).toBe('(0\\,1|0\\,1)');
    expect(expansionTex(b)).toContain(b.value.toFixed(10));
    expect(b.value).toBeCloseTo(0.1813, 4);
  });

  it('shortens a long diagonal expansion', () => {
    // design rule (common practice, no source): many terms end in ⋯ and the table lists them all
    const many = { ...elementBreakdown(context, 0, 0) };
    many.terms = Array.from({ length: FORMULA_TERMS_SHOWN + 3 }, () => many.terms[1]);
    expect(expansionTex(many)).toContain('\\cdots');
  });
});
