import type { PreparedShell } from './preparedShells';
import { hermiteCoefficients, hermiteTableLength, hermiteTStride } from './hermite';

/**
 * Everything the two-electron loops need about one shell pair (A, B), computed once:
 * per primitive pair the exponent p, centre P, weight c_a c_b N_a N_b e^{−μ|AB|²}, and the
 * Hermite expansion of every component pair, E^{ab}_{tuv} = E^x_t E^y_u E^z_v, with the
 * component normalisation factors folded in (McMurchie & Davidson, J. Comput. Phys. 26, 218 (1978)).
 */
export interface ShellPair {
  a: number;
  b: number;
  L: number;
  nComponentsA: number;
  nComponentsB: number;
  /** Number of Hermite functions t+u+v ≤ L. */
  nHermite: number;
  nPrimitivePairs: number;
  p: Float64Array;
  px: Float64Array;
  py: Float64Array;
  pz: Float64Array;
  weight: Float64Array;
  /** [primitive pair][component pair ca·nB + cb][hermite index], flat. */
  hermite: Float64Array;
}

/** Primitive pairs whose Gaussian-product prefactor is below this contribute nothing in double precision. */
const NEGLIGIBLE_PREFACTOR = 1e-30;

/** Hermite (t, u, v) triples with t + u + v ≤ L, flat, in a fixed order shared by all pairs of that L. */
export function hermiteTriples(L: number): Int32Array {
  const out: number[] = [];
  for (let t = 0; t <= L; t++) for (let u = 0; u <= L - t; u++) for (let v = 0; v <= L - t - u; v++) out.push(t, u, v);
  return Int32Array.from(out);
}

export function buildShellPair(shells: PreparedShell[], ia: number, ib: number): ShellPair {
  const a = shells[ia];
  const b = shells[ib];
  const L = a.l + b.l;
  const triples = hermiteTriples(L);
  const nHermite = triples.length / 3;
  const nComp = a.nComponents * b.nComponents;
  const ab2 = (a.x - b.x) ** 2 + (a.y - b.y) ** 2 + (a.z - b.z) ** 2;
  const ex = new Float64Array(hermiteTableLength(a.l, b.l));
  const ey = new Float64Array(ex.length);
  const ez = new Float64Array(ex.length);
  const stride = hermiteTStride(a.l, b.l);
  const row = b.l + 1;

  const kept: number[] = [];
  for (let i = 0; i < a.nPrimitives; i++) {
    for (let j = 0; j < b.nPrimitives; j++) {
      const alpha = a.exponents[i];
      const beta = b.exponents[j];
      if (Math.exp((-alpha * beta * ab2) / (alpha + beta)) > NEGLIGIBLE_PREFACTOR) kept.push(i, j);
    }
  }
  const nPrim = kept.length / 2;
  const pair: ShellPair = {
    a: ia,
    b: ib,
    L,
    nComponentsA: a.nComponents,
    nComponentsB: b.nComponents,
    nHermite,
    nPrimitivePairs: nPrim,
    p: new Float64Array(nPrim),
    px: new Float64Array(nPrim),
    py: new Float64Array(nPrim),
    pz: new Float64Array(nPrim),
    weight: new Float64Array(nPrim),
    hermite: new Float64Array(nPrim * nComp * nHermite),
  };
  for (let k = 0; k < nPrim; k++) {
    const i = kept[2 * k];
    const j = kept[2 * k + 1];
    const alpha = a.exponents[i];
    const beta = b.exponents[j];
    const p = alpha + beta;
    const px = (alpha * a.x + beta * b.x) / p;
    const py = (alpha * a.y + beta * b.y) / p;
    const pz = (alpha * a.z + beta * b.z) / p;
    pair.p[k] = p;
    pair.px[k] = px;
    pair.py[k] = py;
    pair.pz[k] = pz;
    pair.weight[k] = a.weights[i] * b.weights[j] * Math.exp((-alpha * beta * ab2) / p);
    hermiteCoefficients(a.l, b.l, p, px - a.x, px - b.x, ex);
    hermiteCoefficients(a.l, b.l, p, py - a.y, py - b.y, ey);
    hermiteCoefficients(a.l, b.l, p, pz - a.z, pz - b.z, ez);
    for (let ca = 0; ca < a.nComponents; ca++) {
      const ax = a.components[3 * ca], ay = a.components[3 * ca + 1], az = a.components[3 * ca + 2];
      for (let cb = 0; cb < b.nComponents; cb++) {
        const bx = b.components[3 * cb], by = b.components[3 * cb + 1], bz = b.components[3 * cb + 2];
        const norm = a.componentNorms[ca] * b.componentNorms[cb];
        const base = (k * nComp + ca * b.nComponents + cb) * nHermite;
        for (let h = 0; h < nHermite; h++) {
          const t = triples[3 * h], u = triples[3 * h + 1], v = triples[3 * h + 2];
          // E^{ij}_t vanishes for t > i + j; the table holds those zeros, but skip the reads.
          if (t > ax + bx || u > ay + by || v > az + bz) continue;
          pair.hermite[base + h] = norm * ex[(ax * row + bx) * stride + t] * ey[(ay * row + by) * stride + u] * ez[(az * row + bz) * stride + v];
        }
      }
    }
  }
  return pair;
}
