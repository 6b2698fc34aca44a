/**
 * Eigenvalues and orthonormal eigenvectors of a real symmetric 3×3 matrix by cyclic Jacobi
 * rotations (Jacobi's method; see Golub & Van Loan, Matrix Computations, 4th ed. (2013) §8.5).
 * Small and exact enough to find a molecule's principal axes without a matrix library.
 */
export interface Eigen3 {
  /** Ascending eigenvalues. */
  values: [number, number, number];
  /** vectors[k] is the unit eigenvector of values[k]. */
  vectors: [number, number, number][];
}

export function symmetricEigen3(matrix: readonly (readonly number[])[]): Eigen3 {
  const a = matrix.map((row) => row.slice());
  const v = [
    [1, 0, 0],
    [0, 1, 0],
    [0, 0, 1],
  ];
  for (let sweep = 0; sweep < 50; sweep++) {
    const off = a[0][1] ** 2 + a[0][2] ** 2 + a[1][2] ** 2;
    const diag = a[0][0] ** 2 + a[1][1] ** 2 + a[2][2] ** 2;
    if (off <= 1e-30 * diag || off === 0) break;
    for (let p = 0; p < 2; p++) {
      for (let q = p + 1; q < 3; q++) {
        if (a[p][q] === 0) continue;
        // Rotation angle that zeroes a[p][q] (the stable small-angle form).
        const theta = (a[q][q] - a[p][p]) / (2 * a[p][q]);
        const t = Math.sign(theta || 1) / (Math.abs(theta) + Math.sqrt(theta * theta + 1));
        const c = 1 / Math.sqrt(t * t + 1);
        const s = t * c;
        for (let k = 0; k < 3; k++) {
          const akp = a[k][p];
          const akq = a[k][q];
          a[k][p] = c * akp - s * akq;
          a[k][q] = s * akp + c * akq;
        }
        for (let k = 0; k < 3; k++) {
          const apk = a[p][k];
          const aqk = a[q][k];
          a[p][k] = c * apk - s * aqk;
          a[q][k] = s * apk + c * aqk;
        }
        for (let k = 0; k < 3; k++) {
          const vkp = v[k][p];
          const vkq = v[k][q];
          v[k][p] = c * vkp - s * vkq;
          v[k][q] = s * vkp + c * vkq;
        }
      }
    }
  }
  const order = [0, 1, 2].sort((i, j) => a[i][i] - a[j][j]);
  return {
    values: [a[order[0]][order[0]], a[order[1]][order[1]], a[order[2]][order[2]]],
    vectors: order.map((k) => [v[0][k], v[1][k], v[2][k]] as [number, number, number]),
  };
}
