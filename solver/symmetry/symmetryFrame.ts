/**
 * The molecule's symmetry frame: the largest abelian subgroup of D2h it has, and the origin and
 * axes in which that group's operations are sign patterns on (x, y, z).
 *
 * How the group is found. The origin is the centre of nuclear charge (ghost atoms carry no
 * charge, and the centre of the real nuclei is fixed by every symmetry operation because
 * operations only exchange atoms of one kind). Every C2 axis and mirror normal of a finite set
 * of points is one of: the direction of an atom on the axis, the sum r_a + r_b or difference
 * r_a − r_b of two atoms of one kind that the operation swaps, or — when every atom lies in one
 * plane or on one line — a principal axis of the second-moment tensor Σ w r rᵀ. Those directions
 * are the candidates; each is tried as a C2 axis and as a mirror normal. Orthogonal pairs of the
 * elements found make candidate frames, each frame is scored by how many of the eight D2h sign
 * patterns map the molecule onto itself, and the frame with the most operations wins. The
 * principal axes alone are not enough when principal moments are degenerate (linear molecules,
 * symmetric and spherical tops), which is why atom vectors and pair sums/differences are used.
 *
 * Ties between groups of the same order: D2 before C2h before C2v (a tetrahedral molecule gets
 * D2, a D2d one D2), then C2 before Cs before Ci; then the frame with more atoms on its axes
 * (a square gets its axes through the atoms, not through the edge midpoints).
 *
 * Orientation convention (Ketbook's own choice, stated so that labels are reproducible):
 *  - D2h, D2: z is the axis of largest spread Σ w (r·u)², x the smallest. A linear molecule lies
 *    on z (D∞h → D2h); a planar one lies in the yz plane (x is its normal).
 *  - C2v: z is the C2 axis; x is the normal of the mirror that contains more atoms, so a planar
 *    C2v molecule lies in the yz plane (water: O on z, H atoms in yz → its out-of-plane lone pair
 *    is b1, its antisymmetric O–H combination b2). A linear C∞v molecule lies on z (C∞v → C2v).
 *  - C2h and C2: z is the C2 axis; y is the perpendicular axis of larger spread.
 *  - Cs: the mirror is the xy plane (z is its normal); y is the in-plane axis of larger spread.
 *  - Ci and C1: no axes to align, so the input axes are kept (rotation = identity).
 * The axes always form a right-handed set.
 *
 * The returned molecule is symmetrised: each position is replaced by its average over the
 * group's images, so the operations map atoms onto each other exactly (moves are below
 * `toleranceBohr`) and atoms on an axis or plane get exact zeros.
 */
import type { Molecule, Vec3 } from '../types';
import { badInput } from '../errors';
import { D2H_OPERATIONS, type SymmetryOperation } from './operations';
import { characterTable, type PointGroupName } from './characterTables';
import { atomKinds } from './atomKinds';
import { permutationUnderMap } from './atomPermutation';
import { symmetricEigen3 } from './symmetricEigen3';

export interface MolecularSymmetry {
  pointGroup: PointGroupName;
  /** The molecule translated to `originBohr` and rotated into the frame (then symmetrised). */
  molecule: Molecule;
  /**
   * Rows are the frame's x, y and z axes written in the input coordinates:
   * r_frame = rotation · (r_input − originBohr).
   */
  rotation: number[][];
  /** The centre of nuclear charge, in the input coordinates. */
  originBohr: Vec3;
  /** The group's operations, in the column order of its character table. */
  operations: SymmetryOperation[];
  /** atomPermutations[k][a] = the atom that operations[k] sends atom a to. */
  atomPermutations: Int32Array[];
}

type Axis = [number, number, number];

const dot = (a: Axis, b: Axis) => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
const cross = (a: Axis, b: Axis): Axis => [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
const scale = (a: Axis, s: number): Axis => [a[0] * s, a[1] * s, a[2] * s];
const norm = (a: Axis) => Math.sqrt(dot(a, a));

/** Directions closer than this (as 1 − |cos|) count as one. */
const SAME_DIRECTION = 1e-10;
/** Elements closer to perpendicular than this (|cos|) may form a frame; the frame is then re-checked. */
const NEAR_PERPENDICULAR = 1e-3;

/** Preference among frames: larger groups first, then the stated tie order. */
const GROUP_RANK: Record<PointGroupName, number> = { D2h: 8, D2: 7, C2h: 6, C2v: 5, C2: 4, Cs: 3, Ci: 2, C1: 1 };

/** Which group a set of valid D2h sign patterns forms, from its order and content. */
function groupOfMasks(masks: number[]): PointGroupName {
  const has = (m: number) => masks.includes(m);
  const c2 = masks.filter((m) => m === 0b011 || m === 0b101 || m === 0b110);
  const mirrors = masks.filter((m) => m === 0b001 || m === 0b010 || m === 0b100);
  switch (masks.length) {
    case 8:
      return 'D2h';
    case 4:
      if (c2.length === 3) return 'D2';
      if (has(0b111)) return 'C2h';
      return 'C2v';
    case 2:
      if (c2.length === 1) return 'C2';
      if (mirrors.length === 1) return 'Cs';
      return 'Ci';
    default:
      return 'C1';
  }
}

function mapOf(frame: Axis[], signs: readonly number[]): number[][] {
  // M = Uᵀ diag(s) U with the frame axes as the rows of U.
  const m = [
    [0, 0, 0],
    [0, 0, 0],
    [0, 0, 0],
  ];
  for (let k = 0; k < 3; k++) {
    const u = frame[k];
    for (let i = 0; i < 3; i++) for (let j = 0; j < 3; j++) m[i][j] += signs[k] * u[i] * u[j];
  }
  return m;
}

function axisMap(d: Axis, kind: 'rotation' | 'mirror'): number[][] {
  // C2 about d: 2ddᵀ − I; mirror with normal d: I − 2ddᵀ.
  const s = kind === 'rotation' ? 1 : -1;
  const m: number[][] = [];
  for (let i = 0; i < 3; i++) {
    m.push([]);
    for (let j = 0; j < 3; j++) m[i].push(s * (2 * d[i] * d[j] - (i === j ? 1 : 0)));
  }
  return m;
}

function orthonormalFrame(first: Axis, second: Axis): Axis[] | null {
  const u = scale(first, 1 / norm(first));
  const w: Axis = [second[0] - dot(second, u) * u[0], second[1] - dot(second, u) * u[1], second[2] - dot(second, u) * u[2]];
  const length = norm(w);
  if (length < 1e-8) return null;
  const v = scale(w, 1 / length);
  return [u, v, cross(u, v)];
}

/** A unit vector perpendicular to d, taken from the given axes (the one least parallel to d). */
function perpendicularTo(d: Axis, axes: Axis[]): Axis {
  let best = axes[0];
  for (const a of axes) if (Math.abs(dot(a, d)) < Math.abs(dot(best, d))) best = a;
  return best;
}

interface ScoredFrame {
  frame: Axis[];
  masks: number[];
  group: PointGroupName;
  atomsOnAxes: number;
}

export function symmetryFrame(molecule: Molecule, toleranceBohr = 1e-6): MolecularSymmetry {
  const atoms = molecule.atoms;
  const n = atoms.length;
  if (n === 0) throw badInput('a molecule needs at least one atom', 'system.atoms');
  if (!(toleranceBohr > 0)) throw badInput('the symmetry tolerance must be positive');

  // Origin: centre of nuclear charge of the real atoms (centroid if there are none).
  let charge = 0;
  const originBohr: Vec3 = [0, 0, 0];
  for (const atom of atoms) {
    if (atom.ghost) continue;
    charge += atom.atomicNumber;
    for (let k = 0; k < 3; k++) originBohr[k] += atom.atomicNumber * atom.positionBohr[k];
  }
  if (charge > 0) {
    for (let k = 0; k < 3; k++) originBohr[k] /= charge;
  } else {
    for (const atom of atoms) for (let k = 0; k < 3; k++) originBohr[k] += atom.positionBohr[k] / n;
  }

  const kinds = atomKinds(molecule);
  const positions = new Float64Array(3 * n);
  // A weight per kind for the second-moment tensor: any positive kind-invariant weight works.
  const weights = new Float64Array(n);
  atoms.forEach((atom, a) => {
    for (let k = 0; k < 3; k++) positions[3 * a + k] = atom.positionBohr[k] - originBohr[k];
    weights[a] = 1 + atom.atomicNumber;
  });
  const position = (a: number): Axis => [positions[3 * a], positions[3 * a + 1], positions[3 * a + 2]];

  const tensor = [
    [0, 0, 0],
    [0, 0, 0],
    [0, 0, 0],
  ];
  for (let a = 0; a < n; a++) {
    const r = position(a);
    for (let i = 0; i < 3; i++) for (let j = 0; j < 3; j++) tensor[i][j] += weights[a] * r[i] * r[j];
  }
  const principalAxes = symmetricEigen3(tensor).vectors as Axis[];

  // Candidate element directions, without repeats (a direction and its negative are one).
  const directions: Axis[] = [];
  const addDirection = (d: Axis) => {
    const length = norm(d);
    if (length <= toleranceBohr) return;
    const u = scale(d, 1 / length);
    for (const e of directions) if (1 - Math.abs(dot(e, u)) < SAME_DIRECTION) return;
    directions.push(u);
  };
  principalAxes.forEach(addDirection);
  for (let a = 0; a < n; a++) addDirection(position(a));
  for (let a = 0; a < n; a++) {
    for (let b = a + 1; b < n; b++) {
      if (kinds[a] !== kinds[b]) continue;
      const ra = position(a);
      const rb = position(b);
      addDirection([ra[0] + rb[0], ra[1] + rb[1], ra[2] + rb[2]]);
      addDirection([ra[0] - rb[0], ra[1] - rb[1], ra[2] - rb[2]]);
    }
  }

  const isSymmetry = (m: number[][]) => permutationUnderMap(positions, kinds, m, toleranceBohr) !== null;
  const rotationAxes = directions.filter((d) => isSymmetry(axisMap(d, 'rotation')));
  const mirrorNormals = directions.filter((d) => isSymmetry(axisMap(d, 'mirror')));

  const frames: Axis[][] = [principalAxes];
  const addFrame = (f: Axis[] | null) => {
    if (f) frames.push(f);
  };
  for (let i = 0; i < rotationAxes.length; i++) {
    for (let j = i + 1; j < rotationAxes.length; j++) {
      if (Math.abs(dot(rotationAxes[i], rotationAxes[j])) < NEAR_PERPENDICULAR) addFrame(orthonormalFrame(rotationAxes[i], rotationAxes[j]));
    }
    for (const m of mirrorNormals) {
      if (Math.abs(dot(rotationAxes[i], m)) < NEAR_PERPENDICULAR) addFrame(orthonormalFrame(rotationAxes[i], m));
    }
    addFrame(orthonormalFrame(rotationAxes[i], perpendicularTo(rotationAxes[i], principalAxes)));
  }
  for (const m of mirrorNormals) addFrame(orthonormalFrame(m, perpendicularTo(m, principalAxes)));

  let best: ScoredFrame | null = null;
  for (const frame of frames) {
    const masks = D2H_OPERATIONS.filter((op) => isSymmetry(mapOf(frame, op.signs))).map((op) => op.flipMask);
    const group = groupOfMasks(masks);
    const atomsOnAxes = countAtomsOnAxes(frame, positions, n, toleranceBohr);
    if (
      !best ||
      GROUP_RANK[group] > GROUP_RANK[best.group] ||
      (GROUP_RANK[group] === GROUP_RANK[best.group] && atomsOnAxes > best.atomsOnAxes)
    ) {
      best = { frame, masks, group, atomsOnAxes };
    }
  }
  const chosen = best!;
  const group = chosen.group;
  const frame = orientFrame(chosen, positions, weights, n, toleranceBohr);

  // Positions in the frame, then averaged over the group's images.
  const table = characterTable(group);
  const framePositions = new Float64Array(3 * n);
  for (let a = 0; a < n; a++) {
    const r = position(a);
    for (let k = 0; k < 3; k++) framePositions[3 * a + k] = dot(frame[k], r);
  }
  const diagonal = (op: SymmetryOperation) => [
    [op.signs[0], 0, 0],
    [0, op.signs[1], 0],
    [0, 0, op.signs[2]],
  ];
  const loosePermutations = table.operations.map((op) => permutationUnderMap(framePositions, kinds, diagonal(op), 10 * toleranceBohr));
  if (loosePermutations.some((p) => p === null)) {
    throw badInput(`the geometry is too close to the edge of the symmetry tolerance (${toleranceBohr} bohr) to settle its point group`);
  }
  // Average each orbit's first atom over the group, zero the components its stabiliser
  // reverses, then place the other atoms of the orbit as exact sign images of it.
  const symmetrised = new Float64Array(3 * n);
  const placed = new Uint8Array(n);
  const order = table.operations.length;
  for (let a = 0; a < n; a++) {
    if (placed[a]) continue;
    const mean = [0, 0, 0];
    let reversedByStabiliser = 0;
    table.operations.forEach((op, o) => {
      const image = loosePermutations[o]![a];
      for (let k = 0; k < 3; k++) mean[k] += op.signs[k] * framePositions[3 * image + k];
      if (image === a) reversedByStabiliser |= op.flipMask;
    });
    for (let k = 0; k < 3; k++) mean[k] = reversedByStabiliser & (1 << k) ? 0 : mean[k] / order;
    table.operations.forEach((op, o) => {
      const image = loosePermutations[o]![a];
      if (placed[image]) return;
      // (+ 0 turns −0 into 0)
      for (let k = 0; k < 3; k++) symmetrised[3 * image + k] = op.signs[k] * mean[k] + 0;
      placed[image] = 1;
    });
  }
  const atomPermutations = table.operations.map((op) => permutationUnderMap(symmetrised, kinds, diagonal(op), toleranceBohr)!);

  const framed: Molecule = {
    ...molecule,
    atoms: atoms.map((atom, a) => ({
      ...atom,
      positionBohr: [symmetrised[3 * a], symmetrised[3 * a + 1], symmetrised[3 * a + 2]] as Vec3,
    })),
  };
  return {
    pointGroup: group,
    molecule: framed,
    rotation: frame.map((u) => [u[0], u[1], u[2]]),
    originBohr,
    operations: [...table.operations],
    atomPermutations,
  };
}

function countAtomsOnAxes(frame: Axis[], positions: Float64Array, n: number, toleranceBohr: number): number {
  let count = 0;
  for (let a = 0; a < n; a++) {
    const r: Axis = [positions[3 * a], positions[3 * a + 1], positions[3 * a + 2]];
    const c = frame.map((u) => Math.abs(dot(u, r)));
    const off = [c[1] + c[2], c[0] + c[2], c[0] + c[1]];
    if (norm(r) > toleranceBohr && off.some((o) => o <= 2 * toleranceBohr)) count++;
  }
  return count;
}

/** Applies the orientation convention: which frame axis becomes x, y and z, right-handed. */
function orientFrame(chosen: ScoredFrame, positions: Float64Array, weights: Float64Array, n: number, toleranceBohr: number): Axis[] {
  const { frame, masks, group } = chosen;
  if (group === 'Ci' || group === 'C1') {
    return [
      [1, 0, 0],
      [0, 1, 0],
      [0, 0, 1],
    ];
  }
  const spread = frame.map((u) => {
    let s = 0;
    for (let a = 0; a < n; a++) {
      const c = u[0] * positions[3 * a] + u[1] * positions[3 * a + 1] + u[2] * positions[3 * a + 2];
      s += weights[a] * c * c;
    }
    return s;
  });
  const spreadTolerance = 1e-9 * (1 + Math.max(...spread));
  const bySpread = (i: number, j: number) => (Math.abs(spread[i] - spread[j]) <= spreadTolerance ? i - j : spread[i] - spread[j]);
  const atomsInPlane = (k: number) => {
    let count = 0;
    for (let a = 0; a < n; a++) {
      const u = frame[k];
      if (Math.abs(u[0] * positions[3 * a] + u[1] * positions[3 * a + 1] + u[2] * positions[3 * a + 2]) <= toleranceBohr) count++;
    }
    return count;
  };
  // The frame axis left unreversed by the operation with mask m (a C2) or reversed by it (a mirror).
  const c2Axis = () => {
    const m = masks.find((x) => x === 0b011 || x === 0b101 || x === 0b110)!;
    return [0, 1, 2].find((k) => !(m & (1 << k)))!;
  };
  let order: number[];
  switch (group) {
    case 'D2h':
    case 'D2':
      order = [0, 1, 2].sort(bySpread);
      break;
    case 'C2v': {
      const z = c2Axis();
      const [p, q] = [0, 1, 2].filter((k) => k !== z);
      // x is the normal of the mirror holding more atoms: the mirror with normal p holds the atoms in plane ⟂ p.
      const inP = atomsInPlane(p);
      const inQ = atomsInPlane(q);
      const x = inP !== inQ ? (inP > inQ ? p : q) : bySpread(p, q) <= 0 ? p : q;
      order = [x, x === p ? q : p, z];
      break;
    }
    case 'C2h':
    case 'C2': {
      const z = c2Axis();
      const rest = [0, 1, 2].filter((k) => k !== z).sort(bySpread);
      order = [rest[0], rest[1], z];
      break;
    }
    case 'Cs': {
      const m = masks.find((x) => x === 0b001 || x === 0b010 || x === 0b100)!;
      const z = [0, 1, 2].find((k) => m & (1 << k))!;
      const rest = [0, 1, 2].filter((k) => k !== z).sort(bySpread);
      order = [rest[0], rest[1], z];
      break;
    }
    default:
      order = [0, 1, 2];
  }
  const axes = order.map((k) => frame[k].slice() as Axis);
  if (dot(cross(axes[0], axes[1]), axes[2]) < 0) axes[0] = scale(axes[0], -1);
  return axes;
}
