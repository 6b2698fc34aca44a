import type { ScanCoordinate } from '../runFile/schema';
import { badInput, SolverError } from '../errors';

export type Position = [number, number, number];

/** Closest two atoms may come in a scan point, bohr (common practice, no source: nuclei this close mean a typing error). */
export const MIN_ATOM_SEPARATION_BOHR = 0.05;

const sub = (a: Position, b: Position): Position => [a[0] - b[0], a[1] - b[1], a[2] - b[2]];
const add = (a: Position, b: Position): Position => [a[0] + b[0], a[1] + b[1], a[2] + b[2]];
const scale = (a: Position, s: number): Position => [a[0] * s, a[1] * s, a[2] * s];
const dot = (a: Position, b: Position) => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
const cross = (a: Position, b: Position): Position => [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
const norm = (a: Position) => Math.sqrt(dot(a, a));

export function distance(positions: Position[], i: number, j: number): number {
  return norm(sub(positions[j], positions[i]));
}

/** The angle i–j–k at j, degrees. atan2 of |a×b| and a·b keeps full precision near 0° and 180°. */
export function angleDegrees(positions: Position[], i: number, j: number, k: number): number {
  const a = sub(positions[i], positions[j]);
  const b = sub(positions[k], positions[j]);
  return (Math.atan2(norm(cross(a, b)), dot(a, b)) * 180) / Math.PI;
}

/** The coordinate's value in a geometry: a distance (the positions' length unit; the first bond of a stretch) or an angle in degrees. */
export function coordinateValue(coordinate: ScanCoordinate, positions: Position[]): number {
  if (coordinate.type === 'distance') return distance(positions, coordinate.atoms[0], coordinate.atoms[1]);
  if (coordinate.type === 'stretch') return distance(positions, coordinate.bonds[0][0], coordinate.bonds[0][1]);
  return angleDegrees(positions, coordinate.atoms[0], coordinate.atoms[1], coordinate.atoms[2]);
}

/** Rotation of v by `angle` radians about the unit axis n (Rodrigues' formula). */
function rotate(v: Position, n: Position, angle: number): Position {
  const c = Math.cos(angle);
  const s = Math.sin(angle);
  return add(add(scale(v, c), scale(cross(n, v), s)), scale(n, dot(n, v) * (1 - c)));
}

/**
 * The geometry with the coordinate set to `target` (a length in the positions' unit, or
 * degrees). A distance moves its group rigidly along the atoms[0]→atoms[1] axis; a stretch
 * moves the second atom of each bond along that bond; an angle turns its group about the axis
 * through atoms[1] normal to the plane of the three atoms. Nothing else moves, so fragments
 * keep their own geometry.
 */
export function setCoordinate(coordinate: ScanCoordinate, positions: Position[], target: number): Position[] {
  const out = positions.map((p) => [...p] as Position);
  if (coordinate.type === 'distance') {
    const [i, j] = coordinate.atoms;
    const axis = sub(positions[j], positions[i]);
    const length = norm(axis);
    if (length < 1e-8) throw badInput(`atoms ${i} and ${j} sit on one spot: the distance has no direction to move along`, 'scan.coordinate');
    const shift = scale(axis, (target - length) / length);
    for (const a of coordinate.move ?? [j]) out[a] = add(positions[a], shift);
  } else if (coordinate.type === 'stretch') {
    for (const [i, j] of coordinate.bonds) {
      const axis = sub(positions[j], positions[i]);
      const length = norm(axis);
      if (length < 1e-8) throw badInput(`atoms ${i} and ${j} sit on one spot: the bond has no direction to stretch along`, 'scan.coordinate');
      out[j] = add(positions[i], scale(axis, target / length));
    }
  } else {
    const [i, j, k] = coordinate.atoms;
    const a = sub(positions[i], positions[j]);
    const b = sub(positions[k], positions[j]);
    if (norm(a) < 1e-8 || norm(b) < 1e-8) throw badInput('the angle needs three separate atoms', 'scan.coordinate');
    let axis = cross(a, b);
    if (norm(axis) < 1e-10 * norm(a) * norm(b)) {
      // Collinear atoms: any normal of the line will do; take the one from the Cartesian axis least along it.
      const abs = a.map(Math.abs);
      const e: Position = abs[0] <= abs[1] && abs[0] <= abs[2] ? [1, 0, 0] : abs[1] <= abs[2] ? [0, 1, 0] : [0, 0, 1];
      axis = cross(a, e);
    }
    const n = scale(axis, 1 / norm(axis));
    // Turning b about n = a×b by a positive angle takes it away from a, so the angle grows.
    const turn = ((target - angleDegrees(positions, i, j, k)) * Math.PI) / 180;
    for (const m of coordinate.move ?? [k]) out[m] = add(positions[j], rotate(sub(positions[m], positions[j]), n, turn));
  }
  const reached = coordinateValue(coordinate, out);
  if (Math.abs(reached - target) > 1e-7 * Math.max(1, Math.abs(target))) {
    throw new SolverError('internal', `setting the scan coordinate to ${target} gave ${reached}`);
  }
  return out;
}

/** The closest pair of atoms, for the collision check. */
export function closestPair(positions: Position[]): { i: number; j: number; distance: number } | null {
  let best: { i: number; j: number; distance: number } | null = null;
  for (let i = 0; i < positions.length; i++) {
    for (let j = i + 1; j < positions.length; j++) {
      const d = distance(positions, i, j);
      if (!best || d < best.distance) best = { i, j, distance: d };
    }
  }
  return best;
}
