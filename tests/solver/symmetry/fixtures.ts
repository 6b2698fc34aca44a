/**
 * Test-only molecules, a tiny Cartesian Gaussian basis builder and an overlap matrix, so the
 * symmetry code can be checked without the project's basis and integral modules.
 */
import type { Atom, BasisSet, Molecule, Shell, Vec3 } from '../../../solver/types';
import { cartesianComponents } from '../../../solver/symmetry';

export function atom(symbol: string, atomicNumber: number, positionBohr: Vec3, ghost = false): Atom {
  return { symbol, atomicNumber, positionBohr, ghost };
}

export function molecule(atoms: Atom[], charge = 0, multiplicity = 1): Molecule {
  return { atoms, charge, multiplicity };
}

/** A proper rotation from Euler angles z–y–z (radians). */
export function rotationMatrix(alpha: number, beta: number, gamma: number): number[][] {
  const rz = (t: number) => [
    [Math.cos(t), -Math.sin(t), 0],
    [Math.sin(t), Math.cos(t), 0],
    [0, 0, 1],
  ];
  const ry = (t: number) => [
    [Math.cos(t), 0, Math.sin(t)],
    [0, 1, 0],
    [-Math.sin(t), 0, Math.cos(t)],
  ];
  return multiply(rz(alpha), multiply(ry(beta), rz(gamma)));
}

function multiply(a: number[][], b: number[][]): number[][] {
  return a.map((row) => b[0].map((_, j) => row.reduce((s, v, k) => s + v * b[k][j], 0)));
}

/** The molecule rotated by `rotation` and then shifted by `shiftBohr`. */
export function moved(m: Molecule, rotation: number[][], shiftBohr: Vec3): Molecule {
  return {
    ...m,
    atoms: m.atoms.map((a) => {
      const p = a.positionBohr;
      const q = rotation.map((row, i) => row[0] * p[0] + row[1] * p[1] + row[2] * p[2] + shiftBohr[i]) as Vec3;
      return { ...a, positionBohr: q };
    }),
  };
}

export function distance(a: Vec3, b: Vec3): number {
  return Math.hypot(a[0] - b[0], a[1] - b[1], a[2] - b[2]);
}

export interface ShellSpec {
  l: number;
  label: string;
  exponents: number[];
  coefficients: number[];
}

/**
 * STO-3G shells for H and O (from memory of Hehre, Stewart & Pople, J. Chem. Phys. 51, 2657
 * (1969)); the values only shape the functions, no expected number depends on them.
 */
export const STO3G_LIKE: Record<string, ShellSpec[]> = {
  H: [{ l: 0, label: '1s', exponents: [3.42525091, 0.62391373, 0.1688554], coefficients: [0.15432897, 0.53532814, 0.44463454] }],
  He: [{ l: 0, label: '1s', exponents: [6.36242139, 1.158923, 0.31364979], coefficients: [0.15432897, 0.53532814, 0.44463454] }],
  O: [
    { l: 0, label: '1s', exponents: [130.70932, 23.808861, 6.4436083], coefficients: [0.15432897, 0.53532814, 0.44463454] },
    { l: 0, label: '2s', exponents: [5.0331513, 1.1695961, 0.380389], coefficients: [-0.09996723, 0.39951283, 0.70011547] },
    { l: 1, label: '2p', exponents: [5.0331513, 1.1695961, 0.380389], coefficients: [0.15591627, 0.60768372, 0.39195739] },
  ],
  /** A made-up s, p and d set to exercise d functions (shape only). */
  X: [
    { l: 0, label: 's', exponents: [1.0], coefficients: [1] },
    { l: 1, label: 'p', exponents: [0.8], coefficients: [1] },
    { l: 2, label: 'd', exponents: [0.6], coefficients: [1] },
  ],
};

export function testBasis(m: Molecule, shellsBySymbol: Record<string, ShellSpec[]> = STO3G_LIKE): BasisSet {
  const shells: Shell[] = [];
  const offsets: number[] = [];
  const labels: string[] = [];
  const functionAtom: number[] = [];
  let nFunctions = 0;
  m.atoms.forEach((a, index) => {
    for (const spec of shellsBySymbol[a.symbol]) {
      shells.push({
        l: spec.l,
        centerBohr: a.positionBohr,
        atomIndex: index,
        exponents: Float64Array.from(spec.exponents),
        coefficients: Float64Array.from(spec.coefficients),
        label: spec.label,
      });
      offsets.push(nFunctions);
      const count = ((spec.l + 1) * (spec.l + 2)) / 2;
      for (let c = 0; c < count; c++) {
        labels.push(`${a.symbol}${index + 1} ${spec.label}${c}`);
        functionAtom.push(index);
      }
      nFunctions += count;
    }
  });
  return {
    name: 'test',
    shells,
    shellOffsets: Int32Array.from(offsets),
    nFunctions,
    functionLabels: labels,
    functionAtom: Int32Array.from(functionAtom),
  };
}

function doubleFactorial(k: number): number {
  let r = 1;
  for (let i = k; i > 1; i -= 2) r *= i;
  return r;
}

function binomial(n: number, k: number): number {
  let r = 1;
  for (let i = 1; i <= k; i++) r = (r * (n - k + i)) / i;
  return r;
}

/**
 * ∫ (x−A)^a (x−B)^b exp(−α(x−A)² − β(x−B)²) dx by the Gaussian product theorem and the
 * binomial expansion about the product centre P (analytic; Gaussian moments
 * ∫ t^k e^(−p t²) dt = (k−1)!! / (2p)^(k/2) · √(π/p) for even k).
 */
function overlap1d(a: number, b: number, alpha: number, beta: number, A: number, B: number): number {
  const p = alpha + beta;
  const P = (alpha * A + beta * B) / p;
  const prefactor = Math.exp((-alpha * beta * (A - B) ** 2) / p) * Math.sqrt(Math.PI / p);
  let total = 0;
  for (let i = 0; i <= a; i++) {
    for (let j = 0; j <= b; j++) {
      const k = i + j;
      if (k % 2) continue;
      total += binomial(a, i) * binomial(b, j) * (P - A) ** (a - i) * (P - B) ** (b - j) * (doubleFactorial(k - 1) / (2 * p) ** (k / 2));
    }
  }
  return prefactor * total;
}

/** The overlap matrix of the basis, every function normalised (test-only, analytic). */
export function testOverlap(basis: BasisSet): Float64Array {
  const n = basis.nFunctions;
  interface Fn {
    shell: Shell;
    powers: [number, number, number];
  }
  const fns: Fn[] = [];
  for (const shell of basis.shells) {
    const c = cartesianComponents(shell.l);
    for (let k = 0; k < c.length; k += 3) fns.push({ shell, powers: [c[k], c[k + 1], c[k + 2]] });
  }
  const raw = (f: Fn, g: Fn) => {
    let s = 0;
    f.shell.exponents.forEach((alpha, i) => {
      g.shell.exponents.forEach((beta, j) => {
        let prim = f.shell.coefficients[i] * g.shell.coefficients[j];
        for (let d = 0; d < 3; d++) prim *= overlap1d(f.powers[d], g.powers[d], alpha, beta, f.shell.centerBohr[d], g.shell.centerBohr[d]);
        s += prim;
      });
    });
    return s;
  };
  const self = fns.map((f) => raw(f, f));
  const S = new Float64Array(n * n);
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) S[i * n + j] = raw(fns[i], fns[j]) / Math.sqrt(self[i] * self[j]);
  return S;
}
