import type { CiSettings } from '../runFile/schema';
import { badInput } from '../errors';

/**
 * Which SCF orbitals the CI treats how. In prose the roles are core (kept doubly occupied
 * and folded into the core energy), active (correlated) and outside (left empty). Orbital
 * indices are 0-based in ascending SCF orbital energy.
 */
export interface OrbitalSelection {
  /** Doubly occupied in every determinant, folded into the core energy (frozen core plus CAS inactive). */
  core: number[];
  /** The orbitals the CI distributes electrons over, ascending. */
  active: number[];
  /** Left empty: deleted virtuals and CAS external orbitals. */
  outside: number[];
  /** α and β electrons among the active orbitals. */
  nAlpha: number;
  nBeta: number;
  /** ras1/ras3 translated to positions inside `active`. */
  ras?: { ras1: number[]; ras3: number[]; maxHoles: number; maxParticles: number };
  warnings: string[];
}

export interface SelectionInput {
  nOrbitals: number;
  nElectrons: number;
  /** 2S of the reference (multiplicity − 1). */
  twoS: number;
  ci: CiSettings;
  /** Orbital energies, to warn when a boundary splits a degenerate set. */
  orbitalEnergies?: ArrayLike<number>;
}

const DEGENERACY_TOLERANCE = 1e-6;

export function selectOrbitals({ nOrbitals, nElectrons, twoS, ci, orbitalEnergies }: SelectionInput): OrbitalSelection {
  const twoMs = ci.twoMs ?? twoS;
  if ((nElectrons + twoMs) % 2 !== 0) {
    throw badInput(`${nElectrons} electrons cannot have 2Ms = ${twoMs} (parity)`, 'ci.twoMs');
  }
  if (Math.abs(twoMs) > nElectrons) throw badInput(`2Ms = ${twoMs} needs more than ${nElectrons} electrons`, 'ci.twoMs');
  const nAlphaTotal = (nElectrons + twoMs) / 2;
  const nBetaTotal = (nElectrons - twoMs) / 2;
  if (Math.max(nAlphaTotal, nBetaTotal) > nOrbitals) {
    throw badInput(`${nOrbitals} orbitals cannot hold ${nAlphaTotal} α and ${nBetaTotal} β electrons`, 'ci.twoMs');
  }
  const doublyOccupied = Math.min(nAlphaTotal, nBetaTotal);
  const highestOccupied = Math.max(nAlphaTotal, nBetaTotal) - 1;

  if (ci.frozenCore > doublyOccupied) {
    throw badInput(`frozenCore = ${ci.frozenCore}, but only ${doublyOccupied} orbitals are doubly occupied`, 'ci.frozenCore');
  }
  if (ci.deletedVirtuals > nOrbitals - 1 - highestOccupied) {
    throw badInput(
      `deletedVirtuals = ${ci.deletedVirtuals}, but only ${nOrbitals - 1 - highestOccupied} orbitals are empty in the reference`,
      'ci.deletedVirtuals',
    );
  }

  const all = Array.from({ length: nOrbitals }, (_, i) => i);
  let core: number[];
  let active: number[];
  let outside: number[];

  if (ci.space === 'CAS') {
    const window = ci.active!;
    const inactiveCount = (nElectrons - window.electrons) / 2;
    if (!Number.isInteger(inactiveCount) || inactiveCount < 0) {
      throw badInput(
        `a window with ${window.electrons} of ${nElectrons} electrons leaves an odd or negative number outside it`,
        'ci.active.electrons',
      );
    }
    if (ci.frozenCore > inactiveCount) {
      throw badInput(`frozenCore = ${ci.frozenCore} reaches into the active window (${inactiveCount} core orbitals)`, 'ci.frozenCore');
    }
    if (inactiveCount + window.orbitals > nOrbitals) {
      throw badInput(`the window needs ${inactiveCount + window.orbitals} orbitals, the basis has ${nOrbitals}`, 'ci.active.orbitals');
    }
    if (ci.activeOrbitals) {
      for (const p of ci.activeOrbitals) {
        if (p >= nOrbitals) throw badInput(`activeOrbitals names orbital ${p}; there are ${nOrbitals} (0…${nOrbitals - 1})`, 'ci.activeOrbitals');
      }
      active = [...ci.activeOrbitals].sort((a, b) => a - b);
      const rest = all.filter((p) => !active.includes(p));
      core = rest.slice(0, inactiveCount);
      outside = rest.slice(inactiveCount);
    } else {
      core = all.slice(0, inactiveCount);
      active = all.slice(inactiveCount, inactiveCount + window.orbitals);
      outside = all.slice(inactiveCount + window.orbitals);
    }
    if (ci.deletedVirtuals > 0 && outside.length < ci.deletedVirtuals) {
      throw badInput('deletedVirtuals reaches into the active window', 'ci.deletedVirtuals');
    }
  } else {
    core = all.slice(0, ci.frozenCore);
    active = all.slice(ci.frozenCore, nOrbitals - ci.deletedVirtuals);
    outside = all.slice(nOrbitals - ci.deletedVirtuals);
  }

  const nAlpha = nAlphaTotal - core.length;
  const nBeta = nBetaTotal - core.length;
  if (nAlpha < 0 || nBeta < 0 || nAlpha > active.length || nBeta > active.length) {
    throw badInput(
      `${active.length} active orbitals cannot hold ${nAlpha} α and ${nBeta} β electrons`,
      ci.space === 'CAS' ? 'ci.active' : 'ci.frozenCore',
    );
  }

  let ras: OrbitalSelection['ras'];
  if (ci.ras) {
    const toPosition = (p: number, list: string) => {
      const at = active.indexOf(p);
      if (at < 0) throw badInput(`ras.${list} names orbital ${p}, which is not among the correlated orbitals`, `ci.ras.${list}`);
      return at;
    };
    ras = {
      ras1: ci.ras.ras1.map((p) => toPosition(p, 'ras1')),
      ras3: ci.ras.ras3.map((p) => toPosition(p, 'ras3')),
      maxHoles: ci.ras.maxHoles,
      maxParticles: ci.ras.maxParticles,
    };
  }

  const warnings: string[] = [];
  if (orbitalEnergies) {
    const role = new Map<number, string>();
    core.forEach((p) => role.set(p, 'core'));
    active.forEach((p) => role.set(p, 'active'));
    outside.forEach((p) => role.set(p, 'outside'));
    for (let p = 0; p + 1 < nOrbitals; p++) {
      for (let q = p + 1; q < nOrbitals && Math.abs(orbitalEnergies[q] - orbitalEnergies[p]) < DEGENERACY_TOLERANCE; q++) {
        if (role.get(p) !== role.get(q)) {
          warnings.push(
            `orbitals ${p} and ${q} are degenerate (ε = ${orbitalEnergies[p].toFixed(6)}) but one is ${role.get(p)} and the other ${role.get(q)}: the result depends on an arbitrary choice within the set`,
          );
        }
      }
    }
  }
  return { core, active, outside, nAlpha, nBeta, ras, warnings };
}

/** Highest excitation level of each named space; null means no limit (full CI in the active orbitals). */
export function maxExcitationOf(ci: CiSettings): number | null {
  switch (ci.space) {
    case 'CIS': return 1;
    case 'CISD': return 2;
    case 'CISDT': return 3;
    case 'CISDTQ': return 4;
    case 'CI': return ci.excitationLevel!;
    case 'FCI':
    case 'CAS': return null;
  }
}
