import type { BasisSet, Molecule, Vec3 } from '../types';
import { prepareShells, type PreparedShell } from './preparedShells';
import { hermiteCoefficients, hermiteTStride, hermiteTableLength } from './hermite';
import { HermiteCoulomb } from './hermiteCoulomb';

/**
 * One-electron integrals over contracted Cartesian Gaussians by the McMurchie–Davidson scheme
 * (McMurchie & Davidson, J. Comput. Phys. 26, 218 (1978)): overlap and multipoles from the
 * t = 0, 1 Hermite coefficients, kinetic energy from overlaps with l_b − 2, l_b, l_b + 2, and
 * nuclear attraction from Hermite Coulomb integrals R_tuv. All matrices are n·n row-major and
 * symmetric; each shell pair is computed once and mirrored.
 */

type PairKernel = (
  a: PreparedShell,
  b: PreparedShell,
  alpha: number,
  beta: number,
  weight: number,
  block: Float64Array,
) => void;

const MAX_L = 2;
const E_LENGTH = hermiteTableLength(MAX_L, MAX_L + 2);

/** Per-direction Hermite tables for one primitive pair, with l_b raised by `extraB`. */
class PairTables {
  readonly ex = new Float64Array(E_LENGTH);
  readonly ey = new Float64Array(E_LENGTH);
  readonly ez = new Float64Array(E_LENGTH);
  stride = 0;
  rowLength = 0;
  p = 0;
  px = 0;
  py = 0;
  pz = 0;

  fill(a: PreparedShell, b: PreparedShell, alpha: number, beta: number, extraB: number): void {
    const p = alpha + beta;
    this.p = p;
    this.px = (alpha * a.x + beta * b.x) / p;
    this.py = (alpha * a.y + beta * b.y) / p;
    this.pz = (alpha * a.z + beta * b.z) / p;
    const lb = b.l + extraB;
    this.stride = hermiteTStride(a.l, lb);
    this.rowLength = lb + 1;
    hermiteCoefficients(a.l, lb, p, this.px - a.x, this.px - b.x, this.ex);
    hermiteCoefficients(a.l, lb, p, this.py - a.y, this.py - b.y, this.ey);
    hermiteCoefficients(a.l, lb, p, this.pz - a.z, this.pz - b.z, this.ez);
  }

  /** Index of E^{ij}_t. */
  at(i: number, j: number, t: number): number {
    return (i * this.rowLength + j) * this.stride + t;
  }
}

function buildMatrix(basis: BasisSet, kernel: PairKernel): Float64Array {
  const n = basis.nFunctions;
  const shells = prepareShells(basis);
  const out = new Float64Array(n * n);
  const block = new Float64Array(36);
  for (let s1 = 0; s1 < shells.length; s1++) {
    const a = shells[s1];
    for (let s2 = 0; s2 <= s1; s2++) {
      const b = shells[s2];
      block.fill(0);
      const abx = a.x - b.x;
      const aby = a.y - b.y;
      const abz = a.z - b.z;
      const ab2 = abx * abx + aby * aby + abz * abz;
      for (let i = 0; i < a.nPrimitives; i++) {
        const alpha = a.exponents[i];
        for (let j = 0; j < b.nPrimitives; j++) {
          const beta = b.exponents[j];
          const mu = (alpha * beta) / (alpha + beta);
          kernel(a, b, alpha, beta, a.weights[i] * b.weights[j] * Math.exp(-mu * ab2), block);
        }
      }
      for (let ca = 0; ca < a.nComponents; ca++) {
        for (let cb = 0; cb < b.nComponents; cb++) {
          const value = block[ca * b.nComponents + cb] * a.componentNorms[ca] * b.componentNorms[cb];
          const row = a.offset + ca;
          const col = b.offset + cb;
          out[row * n + col] = value;
          out[col * n + row] = value;
        }
      }
    }
  }
  return out;
}

/** S_μν = ⟨μ|ν⟩. */
export function overlapMatrix(basis: BasisSet): Float64Array {
  const e = new PairTables();
  return buildMatrix(basis, (a, b, alpha, beta, weight, block) => {
    e.fill(a, b, alpha, beta, 0);
    const scale = weight * Math.pow(Math.PI / e.p, 1.5);
    for (let ca = 0; ca < a.nComponents; ca++) {
      const ax = a.components[3 * ca], ay = a.components[3 * ca + 1], az = a.components[3 * ca + 2];
      for (let cb = 0; cb < b.nComponents; cb++) {
        const bx = b.components[3 * cb], by = b.components[3 * cb + 1], bz = b.components[3 * cb + 2];
        block[ca * b.nComponents + cb] += scale * e.ex[e.at(ax, bx, 0)] * e.ey[e.at(ay, by, 0)] * e.ez[e.at(az, bz, 0)];
      }
    }
  });
}

/**
 * T_μν = −½⟨μ|∇²|ν⟩. Per direction, d²/dx² of x_B^j e^{−βx_B²} is
 * j(j−1)x_B^{j−2} − 2β(2j+1)x_B^j + 4β²x_B^{j+2} (analytic result), so the 1D kinetic term
 * is a combination of 1D overlaps with j − 2, j, j + 2.
 */
export function kineticMatrix(basis: BasisSet): Float64Array {
  const e = new PairTables();
  const overlap1d = (table: Float64Array, i: number, j: number) => (j < 0 ? 0 : table[e.at(i, j, 0)]);
  const kinetic1d = (table: Float64Array, i: number, j: number, beta: number) =>
    -0.5 * (j * (j - 1) * overlap1d(table, i, j - 2) - 2 * beta * (2 * j + 1) * overlap1d(table, i, j) + 4 * beta * beta * overlap1d(table, i, j + 2));
  return buildMatrix(basis, (a, b, alpha, beta, weight, block) => {
    e.fill(a, b, alpha, beta, 2);
    const scale = weight * Math.pow(Math.PI / e.p, 1.5);
    for (let ca = 0; ca < a.nComponents; ca++) {
      const ax = a.components[3 * ca], ay = a.components[3 * ca + 1], az = a.components[3 * ca + 2];
      for (let cb = 0; cb < b.nComponents; cb++) {
        const bx = b.components[3 * cb], by = b.components[3 * cb + 1], bz = b.components[3 * cb + 2];
        const sx = overlap1d(e.ex, ax, bx), sy = overlap1d(e.ey, ay, by), sz = overlap1d(e.ez, az, bz);
        const tx = kinetic1d(e.ex, ax, bx, beta), ty = kinetic1d(e.ey, ay, by, beta), tz = kinetic1d(e.ez, az, bz, beta);
        block[ca * b.nComponents + cb] += scale * (tx * sy * sz + sx * ty * sz + sx * sy * tz);
      }
    }
  });
}

/** V_μν = −Σ_C Z_C ⟨μ|1/r_C|ν⟩ over the real (non-ghost) nuclei. */
export function nuclearAttractionMatrix(basis: BasisSet, molecule: Molecule): Float64Array {
  const e = new PairTables();
  const coulomb = new HermiteCoulomb(2 * MAX_L);
  const d = 2 * MAX_L + 1;
  const r = new Float64Array(d * d * d);
  const nuclei = molecule.atoms.filter((atom) => !atom.ghost);
  return buildMatrix(basis, (a, b, alpha, beta, weight, block) => {
    e.fill(a, b, alpha, beta, 0);
    const L = a.l + b.l;
    const dL = L + 1;
    const scale = (weight * 2 * Math.PI) / e.p;
    for (const nucleus of nuclei) {
      const [cx, cy, cz] = nucleus.positionBohr;
      coulomb.compute(L, e.p, e.px - cx, e.py - cy, e.pz - cz, r);
      const charge = -nucleus.atomicNumber * scale;
      for (let ca = 0; ca < a.nComponents; ca++) {
        const ax = a.components[3 * ca], ay = a.components[3 * ca + 1], az = a.components[3 * ca + 2];
        for (let cb = 0; cb < b.nComponents; cb++) {
          const bx = b.components[3 * cb], by = b.components[3 * cb + 1], bz = b.components[3 * cb + 2];
          let sum = 0;
          for (let t = 0; t <= ax + bx; t++) {
            const et = e.ex[e.at(ax, bx, t)];
            for (let u = 0; u <= ay + by; u++) {
              const etu = et * e.ey[e.at(ay, by, u)];
              for (let v = 0; v <= az + bz; v++) sum += etu * e.ez[e.at(az, bz, v)] * r[(t * dL + u) * dL + v];
            }
          }
          block[ca * b.nComponents + cb] += charge * sum;
        }
      }
    }
  });
}

/**
 * Dipole integrals ⟨μ|(r − O)_k|ν⟩ for k = x, y, z. In 1D, (x − O) = x_P + X_PO and
 * ∫x_P Λ_t dx is √(π/p) for t = 1 and 0 otherwise, so the moment is √(π/p)(E_1 + X_PO E_0).
 * The electronic dipole is −Σ P_μν X_μν.
 */
export function dipoleMatrices(basis: BasisSet, originBohr: Vec3): [Float64Array, Float64Array, Float64Array] {
  const e = new PairTables();
  const make = (axis: 0 | 1 | 2) =>
    buildMatrix(basis, (a, b, alpha, beta, weight, block) => {
      e.fill(a, b, alpha, beta, 0);
      const scale = weight * Math.pow(Math.PI / e.p, 1.5);
      const shift = axis === 0 ? e.px - originBohr[0] : axis === 1 ? e.py - originBohr[1] : e.pz - originBohr[2];
      for (let ca = 0; ca < a.nComponents; ca++) {
        for (let cb = 0; cb < b.nComponents; cb++) {
          let product = scale;
          for (let k = 0; k < 3; k++) {
            const i = a.components[3 * ca + k];
            const j = b.components[3 * cb + k];
            const table = k === 0 ? e.ex : k === 1 ? e.ey : e.ez;
            product *= k === axis ? table[e.at(i, j, 1)] + shift * table[e.at(i, j, 0)] : table[e.at(i, j, 0)];
          }
          block[ca * b.nComponents + cb] += product;
        }
      }
    });
  return [make(0), make(1), make(2)];
}
