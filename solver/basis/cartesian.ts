/**
 * Cartesian Gaussian components and their order, the convention every matrix index follows.
 *
 *   l = 0: s
 *   l = 1: x, y, z
 *   l = 2: xx, xy, xz, yy, yz, zz   (six Cartesian d functions, no spherical combination)
 *
 * i.e. exponents (lx, ly, lz) with lx descending, then ly descending (common practice, no source).
 *
 * Normalisation: a shell's coefficients (Shell.coefficients) multiply primitives normalised as
 * the axis-aligned component x^l·exp(−αr²), and the contraction is scaled so that the contracted
 * x^l function has unit norm. The other components of the same shell differ in norm by a factor
 * that does not depend on α: ⟨x^lx y^ly z^lz e^{−αr²}|same⟩ ∝ (2lx−1)!!(2ly−1)!!(2lz−1)!!/(4α)^l.
 * So each component is multiplied by componentNormFactor = √[(2l−1)!! / ((2lx−1)!!(2ly−1)!!(2lz−1)!!)]
 * (√3 for dxy, dxz, dyz; 1 for dxx, dyy, dzz, and for s and p), which makes every Cartesian
 * component, d included, normalised on its own: ⟨χ|χ⟩ = 1. The d functions are then not
 * orthogonal to each other (⟨dxx|dyy⟩ = 1/3 for a single primitive) — the overlap matrix carries that.
 * Also, under a rotation the six normalised components mix through a matrix that is not
 * orthogonal, so the eigenvalues of S alone change when a molecule with d functions is turned;
 * everything physical (generalised eigenvalues of H and S, energies) does not.
 */

export const MAX_ANGULAR_MOMENTUM = 2;

const LETTERS = ['s', 'p', 'd', 'f', 'g'];

export function angularLetter(l: number): string {
  return LETTERS[l];
}

/** Number of Cartesian components of angular momentum l: (l+1)(l+2)/2. */
export function cartesianCount(l: number): number {
  return ((l + 1) * (l + 2)) / 2;
}

/** Exponent triples (lx, ly, lz) in Ketbook's component order, as a flat Int32Array of 3·count. */
export function cartesianExponents(l: number): Int32Array {
  const out = new Int32Array(3 * cartesianCount(l));
  let k = 0;
  for (let lx = l; lx >= 0; lx--) {
    for (let ly = l - lx; ly >= 0; ly--) {
      out[k++] = lx;
      out[k++] = ly;
      out[k++] = l - lx - ly;
    }
  }
  return out;
}

/** Component suffixes for labels: "" for s, "x" … for p, "xx", "xy" … for d. */
export function cartesianSuffixes(l: number): string[] {
  const e = cartesianExponents(l);
  const out: string[] = [];
  for (let k = 0; k < e.length; k += 3) out.push('x'.repeat(e[k]) + 'y'.repeat(e[k + 1]) + 'z'.repeat(e[k + 2]));
  return out;
}

/** (2n−1)!! with (−1)!! = 1. */
export function doubleFactorialOdd(n: number): number {
  let r = 1;
  for (let k = 2 * n - 1; k > 1; k -= 2) r *= k;
  return r;
}

/** Factor turning the x^l-normalised shell into a normalised component (see the comment above). */
export function componentNormFactor(lx: number, ly: number, lz: number): number {
  const l = lx + ly + lz;
  return Math.sqrt(doubleFactorialOdd(l) / (doubleFactorialOdd(lx) * doubleFactorialOdd(ly) * doubleFactorialOdd(lz)));
}
