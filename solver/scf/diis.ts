import { solveLinear, traceProduct } from './denseAlgebra';

/**
 * Pulay's direct inversion in the iterative subspace (Pulay, Chem. Phys. Lett. 73, 393 (1980)):
 * the next Fock matrix is the combination Σ c_k F_k, Σ c_k = 1, that minimises the norm of
 * Σ c_k e_k. Each entry holds one Fock matrix per spin and one error matrix per spin, so a
 * UHF pair is extrapolated with shared coefficients.
 */
export class DiisExtrapolator {
  private focks: Float64Array[][] = [];
  private errors: Float64Array[][] = [];

  constructor(private readonly maxVectors = 8) {}

  get size(): number {
    return this.focks.length;
  }

  reset(): void {
    this.focks = [];
    this.errors = [];
  }

  push(focks: Float64Array[], errors: Float64Array[]): void {
    this.focks.push(focks.map((f) => Float64Array.from(f)));
    this.errors.push(errors.map((e) => Float64Array.from(e)));
    if (this.focks.length > this.maxVectors) {
      this.focks.shift();
      this.errors.shift();
    }
  }

  /** Extrapolated Fock matrices, or null when fewer than two vectors are stored. */
  extrapolate(): Float64Array[] | null {
    while (this.focks.length >= 2) {
      const m = this.focks.length;
      const dim = m + 1;
      const b = new Float64Array(dim * dim);
      for (let i = 0; i < m; i++) {
        for (let j = 0; j <= i; j++) {
          let v = 0;
          for (let s = 0; s < this.errors[i].length; s++) v += traceProduct(this.errors[i][s], this.errors[j][s]);
          b[i * dim + j] = v;
          b[j * dim + i] = v;
        }
        b[i * dim + m] = -1;
        b[m * dim + i] = -1;
      }
      // Scale the error block so its largest element is 1: the B matrix becomes badly
      // conditioned as the errors shrink, and scaling keeps the pivots meaningful.
      let scale = 0;
      for (let i = 0; i < m; i++) scale = Math.max(scale, b[i * dim + i]);
      if (scale > 0) for (let i = 0; i < m; i++) for (let j = 0; j < m; j++) b[i * dim + j] /= scale;
      const rhs = new Float64Array(dim);
      rhs[m] = -1;
      const c = solveLinear(b, rhs, dim);
      if (c && c.slice(0, m).every((x) => Math.abs(x) < 1e6)) {
        const nSpin = this.focks[0].length;
        const out: Float64Array[] = [];
        for (let s = 0; s < nSpin; s++) {
          const f = new Float64Array(this.focks[0][s].length);
          for (let k = 0; k < m; k++) {
            const fk = this.focks[k][s];
            const ck = c[k];
            for (let x = 0; x < f.length; x++) f[x] += ck * fk[x];
          }
          out.push(f);
        }
        return out;
      }
      // Near-linear dependence among stored errors: drop the oldest and try again.
      this.focks.shift();
      this.errors.shift();
    }
    return null;
  }
}
