import type { SlaterCondonTerm } from '../../solver/ci/slaterCondon';
import type { ElementBreakdown } from '../../solver/run/hamiltonianMap';

/**
 * TeX for a Slater–Condon breakdown. Orbital indices are the active orbitals, 0 first, as in
 * the occupation bit strings; two-electron integrals in chemists' notation (pq|rs).
 */
export function termTex(term: SlaterCondonTerm): string {
  const o = term.orbitals;
  switch (term.kind) {
    case 'core':
      return String.raw`E_\mathrm{core}`;
    case 'one-electron':
      return `h_{${o[0]}\\,${o[1]}}`;
    default:
      return `(${o[0]}\\,${o[1]}|${o[2]}\\,${o[3]})`;
  }
}

/** The general rule for the number of differing spin orbitals (Szabo & Ostlund (1996) Table 2.4, chemists' notation). */
export function ruleTex(differing: number): string {
  if (differing === 0) {
    return String.raw`\langle D|\hat H|D\rangle = E_\mathrm{core} + \sum_{i} h_{ii} + \sum_{i<j}\left[(ii|jj) - \delta_{\sigma_i\sigma_j}(ij|ji)\right]`;
  }
  if (differing === 1) {
    return String.raw`\langle D_i^a|\hat H|D\rangle = \pm\left[h_{ai} + \sum_{k\neq i}\left((ai|kk) - \delta_{\sigma_k\sigma_i}(ak|ki)\right)\right]`;
  }
  if (differing === 2) {
    return String.raw`\langle D_{ij}^{ab}|\hat H|D\rangle = \pm\left[(ai|bj) - \delta_{\sigma_a\sigma_b}(aj|bi)\right]`;
  }
  return String.raw`\langle D_I|\hat H|D_J\rangle = 0 \quad\text{(more than two spin orbitals differ)}`;
}

/** Terms written out in the formula before it is shortened to "⋯". */
export const FORMULA_TERMS_SHOWN = 14;

/** phase × [Σ terms] = element, with the element's own terms. */
export function expansionTex(b: ElementBreakdown): string {
  const lhs = String.raw`\langle D_I|\hat H|D_J\rangle`;
  if (b.terms.length === 0) return `${lhs} = 0`;
  const shown = b.terms.slice(0, FORMULA_TERMS_SHOWN).map((t, k) => {
    const body = termTex(t);
    if (t.factor < 0) return `- ${body}`;
    return k === 0 ? body : `+ ${body}`;
  });
  if (b.terms.length > FORMULA_TERMS_SHOWN) shown.push(String.raw`+ \cdots`);
  const phase = b.phase > 0 ? '(+1)' : '(-1)';
  return String.raw`${lhs} = ${phase}\left[${shown.join(' ')}\right] = ${b.value.toFixed(10)}`;
}
