/**
 * The alpha or beta strings of a CI space, grouped into classes (see spaceSpec.ts).
 * Strings are numbered class by class (classes in compareClassKeys order); inside a class
 * they keep generation order, which is ascending lexicographic order of the occupied
 * orbital list ([0,1,2] < [0,1,3] < … < [0,2,3] …).
 */
import { ORBITAL_BIT } from './bits';
import { classKeyCode, compareClassKeys, SpinOrbitalRoles, StringClassKey } from './spaceSpec';

export interface StringClass extends StringClassKey {
  /** Index of the class's first string in the spin's string list. */
  start: number;
  count: number;
}

export interface SpinStrings {
  nElectrons: number;
  count: number;
  /** Occupation bit pattern of each string (see bits.ts). */
  patterns: Float64Array;
  /** Occupied orbitals of string i at [i·nElectrons, (i+1)·nElectrons), ascending. */
  occupations: Int32Array;
  classOf: Int32Array;
  /** Position of each string inside its class. */
  localIndex: Int32Array;
  classes: StringClass[];
  /** Bit pattern → string index. */
  lookup: Map<number, number>;
}

interface RawString {
  pattern: number;
  orbitals: number[];
  key: StringClassKey;
}

/** Every string of this spin that passes the per-spin limits, with its class key. */
export function enumerateCandidateStrings(roles: SpinOrbitalRoles): RawString[] {
  const { nOrbitals: n, nElectrons: ne } = roles;
  const out: RawString[] = [];
  const chosen: number[] = [];
  const visit = (start: number, pattern: number, excitation: number, inRas1: number, particles: number, irrep: number): void => {
    if (chosen.length === ne) {
      const holes = roles.ras1Size - inRas1;
      if (holes > roles.maxHoles) return;
      out.push({ pattern, orbitals: chosen.slice(), key: { excitation, holes, particles, irrep } });
      return;
    }
    const remaining = ne - chosen.length;
    for (let p = start; p <= n - remaining; p++) {
      const ex = excitation + roles.isVirtual[p];
      const pa = particles + roles.inRas3[p];
      if (ex > roles.maxExcitation || pa > roles.maxParticles) continue;
      chosen.push(p);
      visit(p + 1, pattern + ORBITAL_BIT[p], ex, inRas1 + roles.inRas1[p], pa, irrep ^ roles.irrep[p]);
      chosen.pop();
    }
  };
  visit(0, 0, 0, 0, 0, 0);
  return out;
}

/** Groups the strings whose class code is in `keep` into a SpinStrings table. */
export function assembleSpinStrings(nElectrons: number, raw: RawString[], keep: Set<number>): SpinStrings {
  const byClass = new Map<number, RawString[]>();
  for (const s of raw) {
    const code = classKeyCode(s.key);
    if (!keep.has(code)) continue;
    let list = byClass.get(code);
    if (!list) byClass.set(code, (list = []));
    list.push(s);
  }
  const groups = [...byClass.values()].sort((a, b) => compareClassKeys(a[0].key, b[0].key));
  const count = groups.reduce((sum, g) => sum + g.length, 0);
  const patterns = new Float64Array(count);
  const occupations = new Int32Array(count * nElectrons);
  const classOf = new Int32Array(count);
  const localIndex = new Int32Array(count);
  const classes: StringClass[] = [];
  const lookup = new Map<number, number>();
  let index = 0;
  groups.forEach((group, c) => {
    classes.push({ ...group[0].key, start: index, count: group.length });
    group.forEach((s, local) => {
      patterns[index] = s.pattern;
      occupations.set(s.orbitals, index * nElectrons);
      classOf[index] = c;
      localIndex[index] = local;
      lookup.set(s.pattern, index);
      index++;
    });
  });
  return { nElectrons, count, patterns, occupations, classOf, localIndex, classes, lookup };
}
