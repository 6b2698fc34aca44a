/**
 * A test-only oracle: closed-form integrals over contracted s-type Gaussians, enough for H,
 * He and HeH+ in minimal bases and for s-only model atoms. Formulas for normalised s
 * primitives from Szabo & Ostlund (1996) Appendix A (overlap, kinetic, nuclear attraction,
 * two-electron), with F0 the zeroth Boys function (analytic results).
 */
import { eriLength, eriIndex } from '../../../solver/integrals/eriIndex';
import type { ScfProblem } from '../../../solver/scf';
import type { Vec3 } from '../../../solver/types';

export interface SFunction {
  centre: Vec3;
  exponents: number[];
  coefficients: number[];
}

export interface PointCharge {
  charge: number;
  position: Vec3;
}

/** STO-3G 1s fit to a ζ = 1 Slater function (from memory of Hehre, Stewart & Pople, J. Chem. Phys. 51, 2657 (1969)). */
export const STO3G_1S = { exponents: [2.227660584, 0.4057711562, 0.1098175104], coefficients: [0.1543289673, 0.5353281423, 0.4446345422] };
/** STO-3G 2s fit to a ζ = 1 Slater function (same source, from memory). */
export const STO3G_2S = { exponents: [0.994202729, 0.2310313333, 0.0751385870], coefficients: [-0.09996722919, 0.3995128261, 0.7001154689] };

export function slaterFit(fit: { exponents: number[]; coefficients: number[] }, zeta: number, centre: Vec3): SFunction {
  return { centre, exponents: fit.exponents.map((a) => a * zeta * zeta), coefficients: fit.coefficients };
}

/** F0(t) = ∫₀¹ exp(−t u²) du = e^{−t} Σ_k (2t)^k / (2k+1)!!, a series of positive terms. */
export function boysF0(t: number): number {
  if (t > 40) return 0.5 * Math.sqrt(Math.PI / t);
  let term = 1;
  let sum = 1;
  for (let k = 1; k < 500 && term > 1e-17 * sum; k++) {
    term *= (2 * t) / (2 * k + 1);
    sum += term;
  }
  return Math.exp(-t) * sum;
}

const dist2 = (a: Vec3, b: Vec3) => (a[0] - b[0]) ** 2 + (a[1] - b[1]) ** 2 + (a[2] - b[2]) ** 2;
const norm = (a: number) => (2 * a / Math.PI) ** 0.75;
const gaussianCentre = (a: number, A: Vec3, b: number, B: Vec3): Vec3 => [0, 1, 2].map((k) => (a * A[k] + b * B[k]) / (a + b)) as Vec3;

function primitivePairs(f: SFunction, g: SFunction, visit: (a: number, b: number, weight: number) => void) {
  f.exponents.forEach((a, i) => g.exponents.forEach((b, j) => visit(a, b, f.coefficients[i] * g.coefficients[j] * norm(a) * norm(b))));
}

export function overlap(f: SFunction, g: SFunction): number {
  let s = 0;
  primitivePairs(f, g, (a, b, w) => (s += w * (Math.PI / (a + b)) ** 1.5 * Math.exp((-a * b / (a + b)) * dist2(f.centre, g.centre))));
  return s;
}

export function kinetic(f: SFunction, g: SFunction): number {
  let t = 0;
  const r2 = dist2(f.centre, g.centre);
  primitivePairs(f, g, (a, b, w) => {
    const mu = (a * b) / (a + b);
    t += w * mu * (3 - 2 * mu * r2) * (Math.PI / (a + b)) ** 1.5 * Math.exp(-mu * r2);
  });
  return t;
}

export function attraction(f: SFunction, g: SFunction, c: PointCharge): number {
  let v = 0;
  primitivePairs(f, g, (a, b, w) => {
    const p = a + b;
    const P = gaussianCentre(a, f.centre, b, g.centre);
    v += w * (-c.charge * 2 * Math.PI / p) * Math.exp((-a * b / p) * dist2(f.centre, g.centre)) * boysF0(p * dist2(P, c.position));
  });
  return v;
}

export function repulsion(f: SFunction, g: SFunction, h: SFunction, k: SFunction): number {
  let v = 0;
  primitivePairs(f, g, (a, b, w1) => {
    const p = a + b;
    const P = gaussianCentre(a, f.centre, b, g.centre);
    const kab = Math.exp((-a * b / p) * dist2(f.centre, g.centre));
    primitivePairs(h, k, (c, d, w2) => {
      const q = c + d;
      const Q = gaussianCentre(c, h.centre, d, k.centre);
      const kcd = Math.exp((-c * d / q) * dist2(h.centre, k.centre));
      v += w1 * w2 * (2 * Math.PI ** 2.5 / (p * q * Math.sqrt(p + q))) * kab * kcd * boysF0(((p * q) / (p + q)) * dist2(P, Q));
    });
  });
  return v;
}

/** An SCF problem over s functions and point nuclei. */
export function sBasisProblem(functions: SFunction[], nuclei: PointCharge[], nAlpha: number, nBeta: number): ScfProblem {
  const n = functions.length;
  const S = new Float64Array(n * n);
  const H = new Float64Array(n * n);
  for (let i = 0; i < n; i++)
    for (let j = 0; j < n; j++) {
      S[i * n + j] = overlap(functions[i], functions[j]);
      H[i * n + j] = kinetic(functions[i], functions[j]) + nuclei.reduce((sum, c) => sum + attraction(functions[i], functions[j], c), 0);
    }
  const eri = new Float64Array(eriLength(n));
  for (let i = 0; i < n; i++)
    for (let j = 0; j <= i; j++)
      for (let k = 0; k < n; k++)
        for (let l = 0; l <= k; l++) eri[eriIndex(i, j, k, l)] = repulsion(functions[i], functions[j], functions[k], functions[l]);
  let enuc = 0;
  for (let a = 0; a < nuclei.length; a++)
    for (let b = 0; b < a; b++) enuc += (nuclei[a].charge * nuclei[b].charge) / Math.sqrt(dist2(nuclei[a].position, nuclei[b].position));
  return { nBasis: n, overlap: S, coreHamiltonian: H, eri, nuclearRepulsionHartree: enuc, nAlpha, nBeta };
}

/** H2 in STO-3G (ζ = 1.24, the standard hydrogen scaling) along z at separation R bohr. */
export function h2Sto3g(distanceBohr: number): ScfProblem {
  const a: Vec3 = [0, 0, 0];
  const b: Vec3 = [0, 0, distanceBohr];
  return sBasisProblem([slaterFit(STO3G_1S, 1.24, a), slaterFit(STO3G_1S, 1.24, b)], [{ charge: 1, position: a }, { charge: 1, position: b }], 1, 1);
}
