import { Matrix, solve } from 'ml-matrix';

/**
 * Locating the minimum of a scanned curve. A fit (natural cubic spline through every point,
 * or a least-squares quartic over the seven points nearest the lowest one) gives a first
 * position and curvature; `refineMinimum` then minimises the solver's own energy directly,
 * by Newton steps on five-point central differences, so the result no longer depends on the
 * grid (the fit only has to land near the minimum).
 */

export interface MinimumEstimate {
  x: number;
  energy: number;
  /** d²E/dx² at the minimum. */
  curvature: number;
}

export type FitOutcome = ({ ok: true } & MinimumEstimate) | { ok: false; reason: string };

/** Second derivatives of the natural cubic spline through (x, y), x strictly increasing (tridiagonal solve). */
export function splineSecondDerivatives(x: number[], y: number[]): Float64Array {
  const n = x.length;
  const m = new Float64Array(n);
  if (n < 3) return m;
  const c = new Float64Array(n);
  const d = new Float64Array(n);
  // Thomas algorithm on h_{i-1} M_{i-1} + 2(h_{i-1}+h_i) M_i + h_i M_{i+1} = 6(Δ_i − Δ_{i-1}), M_0 = M_{n-1} = 0.
  for (let i = 1; i < n - 1; i++) {
    const hl = x[i] - x[i - 1];
    const hr = x[i + 1] - x[i];
    const rhs = 6 * ((y[i + 1] - y[i]) / hr - (y[i] - y[i - 1]) / hl);
    const diag = 2 * (hl + hr) - (i > 1 ? hl * c[i - 1] : 0);
    c[i] = hr / diag;
    d[i] = (rhs - (i > 1 ? hl * d[i - 1] : 0)) / diag;
  }
  for (let i = n - 2; i >= 1; i--) m[i] = d[i] - (i < n - 2 ? c[i] * m[i + 1] : 0);
  return m;
}

/** Value, first and second derivative of the natural spline at t. */
export function splineAt(x: number[], y: number[], m: Float64Array, t: number): [number, number, number] {
  let i = 0;
  while (i < x.length - 2 && t > x[i + 1]) i++;
  const h = x[i + 1] - x[i];
  const a = (x[i + 1] - t) / h;
  const b = (t - x[i]) / h;
  const value = a * y[i] + b * y[i + 1] + ((a ** 3 - a) * m[i] + (b ** 3 - b) * m[i + 1]) * (h * h) / 6;
  const first = (y[i + 1] - y[i]) / h - ((3 * a * a - 1) * m[i] - (3 * b * b - 1) * m[i + 1]) * h / 6;
  const second = a * m[i] + b * m[i + 1];
  return [value, first, second];
}

/** A root of a function whose sign changes on [lo, hi], by bisection (robust; 200 halvings reach machine precision). */
function bisect(f: (t: number) => number, lo: number, hi: number): number {
  let flo = f(lo);
  for (let k = 0; k < 200 && hi - lo > 1e-14 * Math.max(1, Math.abs(lo)); k++) {
    const mid = 0.5 * (lo + hi);
    const fm = f(mid);
    if (fm === 0) return mid;
    if (Math.sign(fm) === Math.sign(flo)) {
      lo = mid;
      flo = fm;
    } else hi = mid;
  }
  return 0.5 * (lo + hi);
}

/** Least-squares polynomial coefficients (ascending powers of (x − centre)/scale). */
function polynomialFit(x: number[], y: number[], degree: number, centre: number, scale: number): number[] {
  const a = new Matrix(x.length, degree + 1);
  x.forEach((xi, r) => {
    const t = (xi - centre) / scale;
    for (let p = 0; p <= degree; p++) a.set(r, p, t ** p);
  });
  const at = a.transpose();
  const coefficients = solve(at.mmul(a), at.mmul(Matrix.columnVector(y)));
  return coefficients.getColumn(0);
}

function polynomialAt(c: number[], centre: number, scale: number, x: number): [number, number, number] {
  const t = (x - centre) / scale;
  let v = 0;
  let d1 = 0;
  let d2 = 0;
  for (let p = 0; p < c.length; p++) {
    v += c[p] * t ** p;
    if (p >= 1) d1 += p * c[p] * t ** (p - 1);
    if (p >= 2) d2 += p * (p - 1) * c[p] * t ** (p - 2);
  }
  return [v, d1 / scale, d2 / (scale * scale)];
}

/**
 * The minimum of a sampled curve. Needs at least five points and a lowest point with a
 * neighbour on each side; otherwise says why not.
 */
export function fitMinimum(xIn: number[], yIn: number[], kind: 'spline' | 'polynomial'): FitOutcome {
  const pairs = xIn.map((x, k) => [x, yIn[k]] as [number, number]).sort((p, q) => p[0] - q[0]);
  const x = pairs.map((p) => p[0]);
  const y = pairs.map((p) => p[1]);
  if (x.length < 5) return { ok: false, reason: `${x.length} points: a minimum needs at least five` };
  let low = 0;
  for (let k = 1; k < y.length; k++) if (y[k] < y[low]) low = k;
  if (low === 0 || low === y.length - 1) {
    return { ok: false, reason: `the lowest point is at the ${low === 0 ? 'start' : 'end'} of the scan: no minimum inside it` };
  }
  let at: (t: number) => [number, number, number];
  if (kind === 'spline') {
    const m = splineSecondDerivatives(x, y);
    at = (t) => splineAt(x, y, m, t);
  } else {
    // The seven points nearest the lowest one (five at least), fitted by a quartic.
    const window = Math.min(7, x.length);
    const start = Math.max(0, Math.min(low - Math.floor(window / 2), x.length - window));
    const xs = x.slice(start, start + window);
    const ys = y.slice(start, start + window);
    const scale = Math.max(...xs.map((v) => Math.abs(v - x[low])));
    const c = polynomialFit(xs, ys.map((v) => v - y[low]), 4, x[low], scale);
    at = (t) => {
      const [v, d1, d2] = polynomialAt(c, x[low], scale, t);
      return [v + y[low], d1, d2];
    };
  }
  const lo = x[low - 1];
  const hi = x[low + 1];
  if (!(at(lo)[1] < 0 && at(hi)[1] > 0)) return { ok: false, reason: 'the fitted curve has no minimum between the neighbours of the lowest point' };
  const xMin = bisect((t) => at(t)[1], lo, hi);
  const [energy, , curvature] = at(xMin);
  if (!(curvature > 0)) return { ok: false, reason: 'the fitted curvature at the minimum is not positive' };
  return { ok: true, x: xMin, energy, curvature };
}

export interface RefineOptions {
  /** Stencil spacing in the coordinate's unit. */
  step: number;
  /** The search stays within [lo, hi] (the grid neighbours of the fitted minimum). */
  lo: number;
  hi: number;
  maxIterations?: number;
  /** Stop when a Newton step is below this. */
  tolerance?: number;
}

/**
 * Direct minimisation of E(x) by Newton's method with five-point central differences
 * E' ≈ (E₋₂ − 8E₋₁ + 8E₊₁ − E₊₂)/12h, E'' ≈ (−E₋₂ + 16E₋₁ − 30E₀ + 16E₊₁ − E₊₂)/12h²
 * (errors O(h⁴); Abramowitz & Stegun (1964) 25.3.6 and 25.3.24). Each call of `energy` is a
 * solver run, so evaluations are cached and few (about five per step, three or four steps).
 */
export async function refineMinimum(
  energy: (x: number) => Promise<number>,
  start: number,
  options: RefineOptions,
): Promise<(MinimumEstimate & { evaluations: number }) | { failure: string }> {
  const cache = new Map<number, number>();
  const e = async (x: number) => {
    const key = Number(x.toPrecision(15));
    if (!cache.has(key)) cache.set(key, await energy(key));
    return cache.get(key)!;
  };
  const h = options.step;
  const stencil = async (x: number) => {
    const [m2, m1, c, p1, p2] = await Promise.all([e(x - 2 * h), e(x - h), e(x), e(x + h), e(x + 2 * h)]);
    return { value: c, first: (m2 - 8 * m1 + 8 * p1 - p2) / (12 * h), second: (-m2 + 16 * m1 - 30 * c + 16 * p1 - p2) / (12 * h * h) };
  };
  let x = start;
  const tolerance = options.tolerance ?? 1e-6;
  for (let iteration = 0; iteration < (options.maxIterations ?? 8); iteration++) {
    const s = await stencil(x);
    if (!(s.second > 0)) return { failure: `the solver's curvature at ${x.toPrecision(8)} is not positive` };
    const stepLength = -s.first / s.second;
    const next = Math.min(options.hi, Math.max(options.lo, x + stepLength));
    if (Math.abs(next - x) < tolerance) {
      // The last step is below the tolerance: the quadratic model gives the energy at its end,
      // E − E′²/2E″, without another stencil (the change is of order E″·tolerance²).
      return { x: next, energy: s.value - (s.first * s.first) / (2 * s.second), curvature: s.second, evaluations: cache.size };
    }
    if (next === options.lo || next === options.hi) return { failure: 'the direct minimisation left the bracket around the fitted minimum' };
    x = next;
  }
  return { failure: 'the direct minimisation did not settle' };
}
