/**
 * What a CI space is made of, and the rules that decide which (alpha class, beta class)
 * blocks belong to it. Both the counting estimate (estimateCiSpace) and the builder
 * (buildCiSpace) use these rules, so their counts agree by construction.
 *
 * A string's class is the tuple (excitation, holes, particles, irrep):
 *   excitation – electrons of this spin outside the aufbau reference's occupied orbitals
 *                (orbitals ≥ nAlpha for alpha strings, ≥ nBeta for beta strings);
 *   holes      – empty RAS1 orbitals of this spin (|ras1| − electrons of this spin in RAS1);
 *   particles  – electrons of this spin in RAS3;
 *   irrep      – XOR of the occupied orbitals' irreps (0 without symmetry information).
 * A block (alpha class, beta class) is allowed when excitation_α + excitation_β ≤ maxExcitation,
 * holes_α + holes_β ≤ maxHoles, particles_α + particles_β ≤ maxParticles and
 * irrep_α XOR irrep_β = targetIrrep, each test only when that restriction is given.
 */
import { badInput } from '../errors';
import { MAX_STRING_ORBITALS } from './bits';

export interface RasSpec {
  /** Correlated-orbital indices of RAS1 (at most maxHoles holes in total, both spins). */
  ras1: number[];
  /** Correlated-orbital indices of RAS3 (at most maxParticles electrons in total, both spins). */
  ras3: number[];
  maxHoles: number;
  maxParticles: number;
}

export interface CiSpaceSpec {
  nOrbitals: number;
  nAlpha: number;
  nBeta: number;
  /** null = full CI; 1 = CIS, 2 = CISD, … counted in spin orbitals from the aufbau reference, both spins together. */
  maxExcitation: number | null;
  ras?: RasSpec;
  /** Requires orbital irreps: keep determinants whose irrep (XOR over both spins) equals this. */
  targetIrrep?: number;
}

export interface StringClassKey {
  excitation: number;
  holes: number;
  particles: number;
  irrep: number;
}

/** Per-orbital flags used while classifying strings of one spin. */
export interface SpinOrbitalRoles {
  nOrbitals: number;
  nElectrons: number;
  /** 1 where the orbital is empty in this spin's reference string (counts toward excitation). */
  isVirtual: Uint8Array;
  inRas1: Uint8Array;
  inRas3: Uint8Array;
  irrep: Int32Array;
  ras1Size: number;
  /** Largest excitation, holes and particles one string of this spin may carry. */
  maxExcitation: number;
  maxHoles: number;
  maxParticles: number;
}

export function validateSpec(spec: CiSpaceSpec, orbitalIrreps?: Int32Array): void {
  const { nOrbitals, nAlpha, nBeta, maxExcitation } = spec;
  if (!Number.isInteger(nOrbitals) || nOrbitals < 1) throw badInput(`nOrbitals must be a positive integer, got ${nOrbitals}`, 'ci.nOrbitals');
  if (nOrbitals > MAX_STRING_ORBITALS) {
    throw badInput(`the CI engine handles at most ${MAX_STRING_ORBITALS} correlated orbitals, got ${nOrbitals}`, 'ci.nOrbitals');
  }
  for (const [name, n] of [['nAlpha', nAlpha], ['nBeta', nBeta]] as const) {
    if (!Number.isInteger(n) || n < 0 || n > nOrbitals) throw badInput(`${name} must be an integer in 0…${nOrbitals}, got ${n}`, `ci.${name}`);
  }
  if (maxExcitation !== null && (!Number.isInteger(maxExcitation) || maxExcitation < 0)) {
    throw badInput(`maxExcitation must be null (full CI) or a non-negative integer, got ${maxExcitation}`, 'ci.maxExcitation');
  }
  if (spec.ras) {
    const seen = new Set<number>();
    for (const list of [spec.ras.ras1, spec.ras.ras3]) {
      for (const p of list) {
        if (!Number.isInteger(p) || p < 0 || p >= nOrbitals) throw badInput(`RAS orbital index ${p} is outside 0…${nOrbitals - 1}`, 'ci.ras');
        if (seen.has(p)) throw badInput(`orbital ${p} appears twice in the RAS lists`, 'ci.ras');
        seen.add(p);
      }
    }
    if (!(spec.ras.maxHoles >= 0) || !(spec.ras.maxParticles >= 0)) throw badInput('RAS maxHoles and maxParticles must be ≥ 0', 'ci.ras');
  }
  if (spec.targetIrrep !== undefined) {
    if (!orbitalIrreps) throw badInput('targetIrrep needs orbital irreps on the Hamiltonian', 'ci.targetIrrep');
    if (orbitalIrreps.length !== nOrbitals) throw badInput('orbitalIrreps length differs from nOrbitals', 'ci.targetIrrep');
  }
}

export function spinOrbitalRoles(spec: CiSpaceSpec, spin: 'alpha' | 'beta', orbitalIrreps?: Int32Array): SpinOrbitalRoles {
  const n = spec.nOrbitals;
  const nElectrons = spin === 'alpha' ? spec.nAlpha : spec.nBeta;
  const isVirtual = new Uint8Array(n);
  for (let p = nElectrons; p < n; p++) isVirtual[p] = 1;
  const inRas1 = new Uint8Array(n);
  const inRas3 = new Uint8Array(n);
  for (const p of spec.ras?.ras1 ?? []) inRas1[p] = 1;
  for (const p of spec.ras?.ras3 ?? []) inRas3[p] = 1;
  const irrep = new Int32Array(n);
  if (spec.targetIrrep !== undefined && orbitalIrreps) irrep.set(orbitalIrreps);
  const ras1Size = spec.ras?.ras1.length ?? 0;
  return {
    nOrbitals: n,
    nElectrons,
    isVirtual,
    inRas1,
    inRas3,
    irrep,
    ras1Size,
    maxExcitation: spec.maxExcitation ?? Number.POSITIVE_INFINITY,
    maxHoles: spec.ras ? spec.ras.maxHoles : Number.POSITIVE_INFINITY,
    maxParticles: spec.ras ? spec.ras.maxParticles : Number.POSITIVE_INFINITY,
  };
}

export function blockAllowed(spec: CiSpaceSpec, a: StringClassKey, b: StringClassKey): boolean {
  if (spec.maxExcitation !== null && a.excitation + b.excitation > spec.maxExcitation) return false;
  if (spec.ras) {
    if (a.holes + b.holes > spec.ras.maxHoles) return false;
    if (a.particles + b.particles > spec.ras.maxParticles) return false;
  }
  if (spec.targetIrrep !== undefined && (a.irrep ^ b.irrep) !== spec.targetIrrep) return false;
  return true;
}

/** Classes sort by excitation, then holes, then particles, then irrep. */
export function compareClassKeys(a: StringClassKey, b: StringClassKey): number {
  return a.excitation - b.excitation || a.holes - b.holes || a.particles - b.particles || a.irrep - b.irrep;
}

export function classKeyCode(k: StringClassKey): number {
  return ((k.excitation * 64 + k.holes) * 64 + k.particles) * 1024 + k.irrep;
}
