/**
 * McMurchie–Davidson Hermite expansion coefficients (McMurchie & Davidson, J. Comput. Phys.
 * 26, 218 (1978)): the product of two 1D Cartesian Gaussians x_A^i e^{−a x_A²} · x_B^j e^{−b x_B²}
 * equals e^{−μX_AB²} Σ_t E^{ij}_t Λ_t(x_P; p), with Λ_t Hermite Gaussians of exponent p = a + b.
 * The exponential prefactor is left out here (callers multiply it in once per primitive pair):
 *   E^{00}_0 = 1,
 *   E^{i+1,j}_t = E^{ij}_{t−1}/(2p) + X_PA E^{ij}_t + (t+1) E^{ij}_{t+1},
 *   E^{i,j+1}_t = E^{ij}_{t−1}/(2p) + X_PB E^{ij}_t + (t+1) E^{ij}_{t+1}.
 */

/** Stride of t in a table for angular momenta la, lb (one spare slot for the t+1 reads). */
export function hermiteTStride(la: number, lb: number): number {
  return la + lb + 2;
}

/** Length of the table: (la+1)(lb+1) rows of hermiteTStride entries. */
export function hermiteTableLength(la: number, lb: number): number {
  return (la + 1) * (lb + 1) * hermiteTStride(la, lb);
}

/** Fills out[(i·(lb+1) + j)·stride + t] with E^{ij}_t for 0 ≤ i ≤ la, 0 ≤ j ≤ lb. */
export function hermiteCoefficients(la: number, lb: number, p: number, xPA: number, xPB: number, out: Float64Array): void {
  const stride = hermiteTStride(la, lb);
  const rowLength = lb + 1;
  const length = (la + 1) * rowLength * stride;
  out.fill(0, 0, length);
  const half = 0.5 / p;
  out[0] = 1;
  // Build up i along j = 0, then j for each i; each row only reaches t ≤ i + j.
  for (let i = 0; i < la; i++) {
    const src = i * rowLength * stride;
    const dst = (i + 1) * rowLength * stride;
    for (let t = 0; t <= i + 1; t++) {
      const down = t > 0 ? out[src + t - 1] * half : 0;
      out[dst + t] = down + xPA * out[src + t] + (t + 1) * out[src + t + 1];
    }
  }
  for (let i = 0; i <= la; i++) {
    for (let j = 0; j < lb; j++) {
      const src = (i * rowLength + j) * stride;
      const dst = src + stride;
      for (let t = 0; t <= i + j + 1; t++) {
        const down = t > 0 ? out[src + t - 1] * half : 0;
        out[dst + t] = down + xPB * out[src + t] + (t + 1) * out[src + t + 1];
      }
    }
  }
}
