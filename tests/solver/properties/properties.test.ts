import { describe, expect, it } from 'vitest';
import { eriIndex, eriLength } from '../../../solver/integrals/eriIndex';
import { runScf, type ScfProblem } from '../../../solver/scf';
import { dipoleMomentDebye, mullikenCharges } from '../../../solver/properties';
import { AU_TO_DEBYE } from '../../../solver/constants';
import type { Molecule, Vec3 } from '../../../solver/types';
import { h2SzaboProblem } from '../scf/h2Szabo';

function totalDensity(problem: ScfProblem) {
  const r = runScf(problem, { reference: 'RHF' });
  return r.density.alpha.map((v, i) => v + r.density.beta[i]);
}

function h2Molecule(): Molecule {
  return {
    charge: 0,
    multiplicity: 1,
    atoms: [
      { symbol: 'H', atomicNumber: 1, positionBohr: [0, 0, -0.7], ghost: false },
      { symbol: 'H', atomicNumber: 1, positionBohr: [0, 0, 0.7], ghost: false },
    ],
  };
}

/**
 * HeH+ in STO-3G with ζHe = 2.0925, ζH = 1.24 at R = 1.4632 bohr, integrals from memory of
 * Szabo & Ostlund (1996) §3.5.3: S12 = 0.4508, H11 = −2.6527, H12 = −1.3472, H22 = −1.7318,
 * (11|11) = 1.3072, (22|11) = 0.6057, (21|11) = 0.4373, (22|22) = 0.7746, (22|21) = 0.3118,
 * (21|21) = 0.1773 (function 1 on He).
 */
function hehPlusProblem(): ScfProblem {
  const eri = new Float64Array(eriLength(2));
  eri[eriIndex(0, 0, 0, 0)] = 1.3072;
  eri[eriIndex(1, 1, 0, 0)] = 0.6057;
  eri[eriIndex(1, 0, 0, 0)] = 0.4373;
  eri[eriIndex(1, 1, 1, 1)] = 0.7746;
  eri[eriIndex(1, 1, 1, 0)] = 0.3118;
  eri[eriIndex(1, 0, 1, 0)] = 0.1773;
  return {
    nBasis: 2,
    overlap: Float64Array.from([1, 0.4508, 0.4508, 1]),
    coreHamiltonian: Float64Array.from([-2.6527, -1.3472, -1.3472, -1.7318]),
    eri,
    nuclearRepulsionHartree: 2 / 1.4632,
    nAlpha: 1,
    nBeta: 1,
  };
}

describe('Mulliken charges', () => {
  it('are zero on both atoms of H2', () => {
    const problem = h2SzaboProblem();
    const q = mullikenCharges(totalDensity(problem), problem.overlap, Int32Array.from([0, 1]), h2Molecule());
    expect(q[0]).toBeCloseTo(0, 12);
    expect(q[1]).toBeCloseTo(0, 12);
  });

  it('of HeH+ sum to +1, with the positive charge mostly on H', () => {
    const problem = hehPlusProblem();
    const rhf = runScf(problem, { reference: 'RHF' });
    expect(Math.abs(rhf.energyHartree - -2.8606)).toBeLessThan(2e-4); // Szabo & Ostlund (1996) §3.5.3
    const molecule: Molecule = {
      charge: 1,
      multiplicity: 1,
      atoms: [
        { symbol: 'He', atomicNumber: 2, positionBohr: [0, 0, 0], ghost: false },
        { symbol: 'H', atomicNumber: 1, positionBohr: [0, 0, 1.4632], ghost: false },
      ],
    };
    const q = mullikenCharges(totalDensity(problem), problem.overlap, Int32Array.from([0, 1]), molecule);
    expect(q[0] + q[1]).toBeCloseTo(1, 12);
    // He is far more electronegative; the ground state is close to He + H+ (fact of the trade).
    expect(q[1]).toBeGreaterThan(q[0]);
  });

  it('give a ghost atom no nuclear charge', () => {
    const problem = h2SzaboProblem();
    const molecule = h2Molecule();
    molecule.atoms[1].ghost = true;
    const q = mullikenCharges(totalDensity(problem), problem.overlap, Int32Array.from([0, 1]), molecule);
    // Same density as H2: each centre holds one electron, so the ghost carries −1 (common practice, no source).
    expect(q[1]).toBeCloseTo(-1, 12);
    expect(q[0]).toBeCloseTo(0, 12);
  });
});

/** Dipole matrices about origin O from those about 0: ⟨μ|r − O|ν⟩ = ⟨μ|r|ν⟩ − O S_μν (exact). */
function shiftedDipoleMatrices(about0: Float64Array[], overlap: Float64Array, origin: Vec3): Float64Array[] {
  return about0.map((m, k) => m.map((v, i) => v - origin[k] * overlap[i]));
}

describe('dipole moment', () => {
  // For s functions centred at ±0.7 bohr on z, ⟨i|z|i⟩ is the centre and ⟨1|z|2⟩ vanishes about
  // the midpoint by inversion symmetry (analytic); x and y matrices vanish.
  const problem = h2SzaboProblem();
  const density = totalDensity(problem);
  const about0 = [new Float64Array(4), new Float64Array(4), Float64Array.from([-0.7, 0, 0, 0.7])];

  it('of H2 is zero at the midpoint and elsewhere (neutral: independent of origin)', () => {
    for (const origin of [
      [0, 0, 0],
      [1.3, -0.4, 2.2],
    ] as Vec3[]) {
      const d = dipoleMomentDebye(density, shiftedDipoleMatrices(about0, problem.overlap, origin), h2Molecule(), origin);
      for (const c of d.vectorAu) expect(c).toBeCloseTo(0, 12);
      expect(d.magnitudeDebye).toBeCloseTo(0, 12);
    }
  });

  it('of a lone proton converts e·bohr to debye', () => {
    // One unit of nuclear charge at z = 1 and no electrons: μ = 1 e·bohr = AU_TO_DEBYE debye.
    const molecule: Molecule = { charge: 1, multiplicity: 1, atoms: [{ symbol: 'H', atomicNumber: 1, positionBohr: [0, 0, 1], ghost: false }] };
    const d = dipoleMomentDebye(new Float64Array(1), [new Float64Array(1), new Float64Array(1), new Float64Array(1)], molecule, [0, 0, 0]);
    expect(d.vectorAu[2]).toBeCloseTo(1, 14);
    expect(d.magnitudeDebye).toBeCloseTo(AU_TO_DEBYE, 12);
  });
});
