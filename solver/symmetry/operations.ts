/**
 * The eight operations of D2h in a frame whose axes are the group's axes. Each is a
 * diagonal matrix diag(sx, sy, sz) with entries ±1, so it is stored as a bit mask of the
 * axes it reverses (bit 0 = x, bit 1 = y, bit 2 = z). Composition of two operations is the
 * XOR of their masks, and every operation is its own inverse (common practice, no source).
 */

export type OperationName = 'E' | 'C2z' | 'C2y' | 'C2x' | 'i' | 'sxy' | 'sxz' | 'syz';

export interface SymmetryOperation {
  name: OperationName;
  /** Printable symbol, e.g. "C2(z)" or "σ(xy)". */
  symbol: string;
  /** Axes reversed: bit 0 x, bit 1 y, bit 2 z. */
  flipMask: number;
  /** The diagonal of the operation's matrix: (sx, sy, sz). */
  signs: [number, number, number];
}

function operation(name: OperationName, symbol: string, flipMask: number): SymmetryOperation {
  const signs: [number, number, number] = [flipMask & 1 ? -1 : 1, flipMask & 2 ? -1 : 1, flipMask & 4 ? -1 : 1];
  return Object.freeze({ name, symbol, flipMask, signs }) as SymmetryOperation;
}

/** In the column order of the D2h character table (Cotton, 3rd ed. (1990), appendix). */
export const D2H_OPERATIONS: readonly SymmetryOperation[] = Object.freeze([
  operation('E', 'E', 0b000),
  operation('C2z', 'C2(z)', 0b011),
  operation('C2y', 'C2(y)', 0b101),
  operation('C2x', 'C2(x)', 0b110),
  operation('i', 'i', 0b111),
  operation('sxy', 'σ(xy)', 0b100),
  operation('sxz', 'σ(xz)', 0b010),
  operation('syz', 'σ(yz)', 0b001),
]);

const BY_NAME = new Map(D2H_OPERATIONS.map((op) => [op.name, op]));
const BY_MASK = new Map(D2H_OPERATIONS.map((op) => [op.flipMask, op]));

export function operationByName(name: OperationName): SymmetryOperation {
  return BY_NAME.get(name)!;
}

export function operationByMask(flipMask: number): SymmetryOperation {
  const op = BY_MASK.get(flipMask & 7);
  return op!;
}

/** The product R·S of two D2h operations (they commute). */
export function composeOperations(a: SymmetryOperation, b: SymmetryOperation): SymmetryOperation {
  return operationByMask(a.flipMask ^ b.flipMask);
}

/**
 * The sign an operation gives to the Cartesian monomial x^lx y^ly z^lz about an invariant
 * point: the product of the operation's sign on each power.
 */
export function monomialSign(op: SymmetryOperation, lx: number, ly: number, lz: number): number {
  let parity = 0;
  if (op.flipMask & 1) parity ^= lx & 1;
  if (op.flipMask & 2) parity ^= ly & 1;
  if (op.flipMask & 4) parity ^= lz & 1;
  return parity ? -1 : 1;
}
