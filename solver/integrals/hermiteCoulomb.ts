import { boysValues, MAX_BOYS_ORDER } from './boys';

/**
 * Hermite Coulomb integrals R_tuv(α, R) of McMurchie & Davidson, J. Comput. Phys. 26, 218
 * (1978), for t + u + v ≤ L:
 *   R^{(n)}_{000} = (−2α)^n F_n(α|R|²),
 *   R^{(n)}_{t+1,u,v} = t R^{(n+1)}_{t−1,u,v} + X R^{(n+1)}_{t,u,v}  (likewise for u with Y, v with Z).
 * The result R^{(0)}_tuv is written to out[(t·(L+1) + u)·(L+1) + v].
 */
export class HermiteCoulomb {
  private readonly work: Float64Array;
  private readonly boys = new Float64Array(MAX_BOYS_ORDER + 1);
  readonly maxL: number;

  constructor(maxL: number) {
    this.maxL = maxL;
    const d = maxL + 1;
    this.work = new Float64Array(d * d * d * d);
  }

  compute(L: number, alpha: number, x: number, y: number, z: number, out: Float64Array): void {
    const d = L + 1;
    const d3 = d * d * d;
    const w = this.work;
    boysValues(L, alpha * (x * x + y * y + z * z), this.boys);
    let factor = 1;
    for (let n = 0; n <= L; n++) {
      w[n * d3] = factor * this.boys[n];
      factor *= -2 * alpha;
    }
    // Level n needs entries with t+u+v ≤ L−n from level n+1 (with total one less), so go down in n.
    for (let n = L - 1; n >= 0; n--) {
      const base = n * d3;
      const up = base + d3;
      const maxTotal = L - n;
      for (let t = 0; t <= maxTotal; t++) {
        for (let u = 0; u <= maxTotal - t; u++) {
          for (let v = 0; v <= maxTotal - t - u; v++) {
            if (t + u + v === 0) continue;
            let value: number;
            if (t > 0) {
              value = x * w[up + ((t - 1) * d + u) * d + v];
              if (t > 1) value += (t - 1) * w[up + ((t - 2) * d + u) * d + v];
            } else if (u > 0) {
              value = y * w[up + (t * d + u - 1) * d + v];
              if (u > 1) value += (u - 1) * w[up + (t * d + u - 2) * d + v];
            } else {
              value = z * w[up + (t * d + u) * d + v - 1];
              if (v > 1) value += (v - 1) * w[up + (t * d + u) * d + v - 2];
            }
            w[base + (t * d + u) * d + v] = value;
          }
        }
      }
    }
    for (let i = 0; i < d3; i++) out[i] = w[i];
  }
}
