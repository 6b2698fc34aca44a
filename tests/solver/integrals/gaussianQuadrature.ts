/**
 * Reference integrals of Cartesian Gaussians by numerical quadrature (flo-gauss-quadrature,
 * 64-point Gauss–Legendre on each piece of a split interval). Nothing here uses the solver's
 * formulas: functions are evaluated point by point, normalised by quadrature, and 1/r is
 * written as (2/√π)∫₀^∞ exp(−t²r²) dt so 3D integrals become t-integrals of products of 1D
 * (or, for two electrons, 2D) integrals — an analytic identity.
 */
import { gaussQuadrature } from 'flo-gauss-quadrature';
import type { Vec3 } from '../../../solver/types';

export interface TestFunction {
  centre: Vec3;
  powers: [number, number, number];
  exponents: number[];
  /** Coefficients of the raw primitives x_A^lx y_A^ly z_A^lz exp(−α r_A²). */
  coefficients: number[];
}

const PIECES = 6;

export function integrate(f: (x: number) => number, from: number, to: number, pieces = PIECES): number {
  let sum = 0;
  const h = (to - from) / pieces;
  for (let k = 0; k < pieces; k++) sum += gaussQuadrature(f, [from + k * h, from + (k + 1) * h], 64);
  return sum;
}

/** Window where a Gaussian of exponent `width` around `centre` is above ≈ e^{−100}. */
function windowOf(centre: number, exponent: number): [number, number] {
  const half = 10 / Math.sqrt(exponent);
  return [centre - half, centre + half];
}

const primitive1d = (power: number, exponent: number, centre: number) => (x: number) =>
  Math.pow(x - centre, power) * Math.exp(-exponent * (x - centre) * (x - centre));

const derivative1d = (power: number, exponent: number, centre: number) => (x: number) => {
  const d = x - centre;
  // d/dx [d^i e^{−αd²}] = (i d^{i−1} − 2α d^{i+1}) e^{−αd²} (elementary calculus)
  return ((power > 0 ? power * Math.pow(d, power - 1) : 0) - 2 * exponent * Math.pow(d, power + 1)) * Math.exp(-exponent * d * d);
};

/** Centre and exponent of the window in which the product of two Gaussians lives. */
function pairWindow(a: number, ca: number, b: number, cb: number): [number, number] {
  return windowOf((a * ca + b * cb) / (a + b), a + b);
}

function overlap1d(ia: number, a: number, ca: number, ib: number, b: number, cb: number): number {
  const fa = primitive1d(ia, a, ca);
  const fb = primitive1d(ib, b, cb);
  const [lo, hi] = pairWindow(a, ca, b, cb);
  return integrate((x) => fa(x) * fb(x), lo, hi);
}

function gradient1d(ia: number, a: number, ca: number, ib: number, b: number, cb: number): number {
  const fa = derivative1d(ia, a, ca);
  const fb = derivative1d(ib, b, cb);
  const [lo, hi] = pairWindow(a, ca, b, cb);
  return integrate((x) => fa(x) * fb(x), lo, hi);
}

/** Scales the function's coefficients so that ⟨f|f⟩ = 1 by quadrature. */
export function normalised(f: TestFunction): TestFunction {
  const self = overlapReference(f, f);
  return { ...f, coefficients: f.coefficients.map((c) => c / Math.sqrt(self)) };
}

export function overlapReference(f: TestFunction, g: TestFunction): number {
  let sum = 0;
  f.exponents.forEach((a, i) =>
    g.exponents.forEach((b, j) => {
      let product = f.coefficients[i] * g.coefficients[j];
      for (let k = 0; k < 3; k++) product *= overlap1d(f.powers[k], a, f.centre[k], g.powers[k], b, g.centre[k]);
      sum += product;
    }),
  );
  return sum;
}

/** T = ½∫∇f·∇g (the first-derivative form, unlike the solver's second-derivative one). */
export function kineticReference(f: TestFunction, g: TestFunction): number {
  let sum = 0;
  f.exponents.forEach((a, i) =>
    g.exponents.forEach((b, j) => {
      const s = [0, 1, 2].map((k) => overlap1d(f.powers[k], a, f.centre[k], g.powers[k], b, g.centre[k]));
      const d = [0, 1, 2].map((k) => gradient1d(f.powers[k], a, f.centre[k], g.powers[k], b, g.centre[k]));
      sum += 0.5 * f.coefficients[i] * g.coefficients[j] * (d[0] * s[1] * s[2] + s[0] * d[1] * s[2] + s[0] * s[1] * d[2]);
    }),
  );
  return sum;
}

/**
 * ∫ f g / |r − C| via t = √p·w/√(1−w²) (w in [0, 1)), which makes the t-integrand smooth and
 * finite at both ends; p is the smallest pair exponent, only used to scale the variable.
 */
export function coulombPointReference(f: TestFunction, g: TestFunction, c: Vec3): number {
  let sum = 0;
  f.exponents.forEach((a, i) =>
    g.exponents.forEach((b, j) => {
      const p = a + b;
      const integrand = (w: number) => {
        const t = (Math.sqrt(p) * w) / Math.sqrt(1 - w * w);
        const dtdw = Math.sqrt(p) / Math.pow(1 - w * w, 1.5);
        let product = dtdw;
        for (let k = 0; k < 3; k++) {
          const fa = primitive1d(f.powers[k], a, f.centre[k]);
          const fb = primitive1d(g.powers[k], b, g.centre[k]);
          const t2 = t * t;
          const centre = (a * f.centre[k] + b * g.centre[k] + t2 * c[k]) / (p + t2);
          const [lo, hi] = windowOf(centre, p + t2);
          product *= integrate((x) => fa(x) * fb(x) * Math.exp(-t2 * (x - c[k]) * (x - c[k])), lo, hi, 4);
        }
        return product;
      };
      sum += f.coefficients[i] * g.coefficients[j] * (2 / Math.sqrt(Math.PI)) * integrate(integrand, 0, 1, 8);
    }),
  );
  return sum;
}

/**
 * (fg|hk) for single-primitive functions: (2/√π)∫dt Π_k ∫∫ f g(x₁) h k(x₂) e^{−t²(x₁−x₂)²} dx₁dx₂.
 * Expensive (a 2D quadrature per direction per t point), so kept to one or two elements.
 */
export function repulsionReference(f: TestFunction, g: TestFunction, h: TestFunction, k: TestFunction): number {
  const a = f.exponents[0], b = g.exponents[0], c = h.exponents[0], d = k.exponents[0];
  const p = a + b;
  const q = c + d;
  const scale = (p * q) / (p + q);
  const integrand = (w: number) => {
    const t = (Math.sqrt(scale) * w) / Math.sqrt(1 - w * w);
    const dtdw = Math.sqrt(scale) / Math.pow(1 - w * w, 1.5);
    const t2 = t * t;
    let product = dtdw;
    for (let dir = 0; dir < 3; dir++) {
      const fa = primitive1d(f.powers[dir], a, f.centre[dir]);
      const fb = primitive1d(g.powers[dir], b, g.centre[dir]);
      const fc = primitive1d(h.powers[dir], c, h.centre[dir]);
      const fd = primitive1d(k.powers[dir], d, k.centre[dir]);
      const qCentre = (c * h.centre[dir] + d * k.centre[dir]) / q;
      const [lo, hi] = pairWindow(a, f.centre[dir], b, g.centre[dir]);
      product *= integrate(
        (x1) => {
          const inner = windowOf((q * qCentre + t2 * x1) / (q + t2), q + t2);
          return fa(x1) * fb(x1) * integrate((x2) => fc(x2) * fd(x2) * Math.exp(-t2 * (x1 - x2) * (x1 - x2)), inner[0], inner[1], 2);
        },
        lo,
        hi,
        3,
      );
    }
    return product;
  };
  return (
    f.coefficients[0] * g.coefficients[0] * h.coefficients[0] * k.coefficients[0] * (2 / Math.sqrt(Math.PI)) * integrate(integrand, 0, 1, 4)
  );
}
