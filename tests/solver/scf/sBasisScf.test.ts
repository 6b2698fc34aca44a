import { describe, expect, it } from 'vitest';
import { runScf, stabilityAnalysis, followInstability } from '../../../solver/scf';
import type { Vec3 } from '../../../solver/types';
import { h2Sto3g, sBasisProblem, slaterFit, STO3G_1S, STO3G_2S } from './sGaussianIntegrals';

const origin: Vec3 = [0, 0, 0];
/** Helium Hartree–Fock limit, −2.86168 Eh (fact of the trade; Clementi & Roetti tables, from memory). */
const HE_HF_LIMIT = -2.86168;

function hydrogenAtom() {
  return sBasisProblem([slaterFit(STO3G_1S, 1.24, origin)], [{ charge: 1, position: origin }], 1, 0);
}

describe('integral oracle sanity (s Gaussians)', () => {
  it('reproduces the printed H2 STO-3G integrals at 1.4 bohr', () => {
    const p = h2Sto3g(1.4);
    expect(p.overlap[1]).toBeCloseTo(0.6593, 4); // Szabo & Ostlund (1996) §3.5.2
    expect(p.coreHamiltonian[0]).toBeCloseTo(-1.1204, 4); // Szabo & Ostlund (1996) §3.5.2
    expect(p.coreHamiltonian[1]).toBeCloseTo(-0.9584, 4); // Szabo & Ostlund (1996) §3.5.2
  });
});

describe('atoms and HeH+ in STO-3G', () => {
  it('H atom UHF and ROHF: −0.4666 Eh', () => {
    for (const reference of ['UHF', 'ROHF'] as const) {
      const r = runScf(hydrogenAtom(), { reference });
      expect(r.energyHartree).toBeCloseTo(-0.4666, 4); // from memory of common STO-3G tables
      expect(r.s2).toBeCloseTo(0.75, 12);
    }
  });

  it('He RHF: −2.8078 Eh, above the HF limit', () => {
    const r = runScf(sBasisProblem([slaterFit(STO3G_1S, 1.69, origin)], [{ charge: 2, position: origin }], 1, 1), { reference: 'RHF' });
    expect(r.energyHartree).toBeCloseTo(-2.8078, 4); // from memory of common STO-3G tables
    expect(r.energyHartree).toBeGreaterThan(HE_HF_LIMIT);
  });

  it('He in a four-function s basis stays above the HF limit and below the minimal basis', () => {
    const functions = [1.2, 1.69, 2.5, 4.0].map((zeta) => slaterFit(STO3G_1S, zeta, origin));
    const r = runScf(sBasisProblem(functions, [{ charge: 2, position: origin }], 1, 1), { reference: 'RHF' });
    expect(r.energyHartree).toBeGreaterThan(HE_HF_LIMIT); // variational (fact of the trade)
    expect(r.energyHartree).toBeLessThan(-2.8078);
  });

  it('HeH+ (ζHe 2.0925, ζH 1.24, R 1.4632 bohr): −2.8606 Eh, DIIS and plain agree', () => {
    const z: Vec3 = [0, 0, 1.4632];
    const p = sBasisProblem([slaterFit(STO3G_1S, 2.0925, origin), slaterFit(STO3G_1S, 1.24, z)], [
      { charge: 2, position: origin },
      { charge: 1, position: z },
    ], 1, 1);
    const diis = runScf(p, { reference: 'RHF' });
    expect(Math.abs(diis.energyHartree - -2.8606)).toBeLessThan(1e-4); // Szabo & Ostlund (1996) §3.5.3 (printed digits)
    const plain = runScf(p, { reference: 'RHF', diis: false, guess: 'core' });
    expect(Math.abs(plain.energyHartree - diis.energyHartree)).toBeLessThan(1e-9);
    const last = diis.iterations[diis.iterations.length - 1];
    expect(Math.abs(last.deltaEnergy)).toBeLessThan(1e-10);
    expect(last.commutatorNorm).toBeLessThan(1e-8);
  });
});

describe('Li atom doublet (1s² 2s): open-shell references', () => {
  it('STO-3G s part: UHF −7.3155 Eh (p functions cannot mix into 1s²2s)', () => {
    const p = sBasisProblem([slaterFit(STO3G_1S, 2.69, origin), slaterFit(STO3G_2S, 0.8, origin)], [{ charge: 3, position: origin }], 2, 1);
    expect(runScf(p, { reference: 'UHF' }).energyHartree).toBeCloseTo(-7.3155, 3); // from memory of common STO-3G tables
  });

  it('in a four-function s basis: UHF ≤ ROHF, ROHF ⟨S²⟩ = 3/4 exactly, UHF ⟨S²⟩ ≥ 3/4', () => {
    const p = sBasisProblem(
      [slaterFit(STO3G_1S, 2.69, origin), slaterFit(STO3G_1S, 4.0, origin), slaterFit(STO3G_2S, 0.8, origin), slaterFit(STO3G_2S, 0.5, origin)],
      [{ charge: 3, position: origin }],
      2,
      1,
    );
    const uhf = runScf(p, { reference: 'UHF' });
    const rohf = runScf(p, { reference: 'ROHF' });
    expect(uhf.energyHartree).toBeLessThan(rohf.energyHartree); // fact of the trade: UHF relaxes the ROHF constraint
    expect(rohf.s2).toBeCloseTo(0.75, 12);
    expect(uhf.s2).toBeGreaterThan(0.75);
    expect(uhf.s2).toBeLessThan(0.751); // a doublet alkali atom is barely contaminated (fact of the trade)
    for (const reference of ['UHF', 'ROHF'] as const) {
      const plain = runScf(p, { reference, diis: false });
      expect(Math.abs(plain.energyHartree - (reference === 'UHF' ? uhf : rohf).energyHartree)).toBeLessThan(1e-9);
    }
  });
});

describe('H2 STO-3G dissociation: RHF → UHF instability', () => {
  it('RHF is stable at 1.4 and 2.0 bohr and RHF→UHF-unstable at 2.6 and 4.0 bohr', () => {
    // Coulson–Fischer point of minimal-basis H2 near 2.3 bohr (from memory; fact of the trade).
    for (const [R, stable] of [
      [1.4, true],
      [2.0, true],
      [2.6, false],
      [4.0, false],
    ] as const) {
      const p = h2Sto3g(R);
      const a = stabilityAnalysis(p, runScf(p, { reference: 'RHF' }));
      expect(a.stable).toBe(stable);
      expect(a.rhfToUhf!.lowestEigenvalue > 0).toBe(stable);
      expect(a.rhfToRhf!.lowestEigenvalue).toBeGreaterThan(0);
      if (!stable) expect(a.instability!.kind).toBe('rhf-to-uhf');
    }
  });

  it('following the instability gives a lower UHF energy that tends to two H atoms', () => {
    const hAtom = runScf(hydrogenAtom(), { reference: 'UHF' }).energyHartree;
    let previousS2 = 0;
    let previousEnergy = -Infinity;
    for (const R of [4.0, 6.0, 10.0]) {
      const p = h2Sto3g(R);
      const rhf = runScf(p, { reference: 'RHF' });
      const uhf = followInstability(p, rhf, { reference: 'RHF' });
      expect(uhf.reference).toBe('UHF');
      expect(uhf.energyHartree).toBeLessThan(rhf.energyHartree - 0.1);
      // Still weakly bound, rising towards two atoms as R grows (fact of the trade).
      expect(uhf.energyHartree).toBeLessThanOrEqual(2 * hAtom + 1e-9);
      expect(uhf.energyHartree).toBeGreaterThan(previousEnergy);
      previousEnergy = uhf.energyHartree;
      expect(uhf.s2).toBeGreaterThan(previousS2);
      expect(uhf.s2).toBeLessThanOrEqual(1 + 1e-9);
      previousS2 = uhf.s2;
      expect(stabilityAnalysis(p, uhf).stable).toBe(true);
    }
    const far = followInstability(h2Sto3g(10), runScf(h2Sto3g(10), { reference: 'RHF' }), { reference: 'RHF' });
    expect(far.energyHartree).toBeCloseTo(2 * -0.4666, 3); // from memory of common STO-3G tables (H atom −0.4666)
    expect(Math.abs(far.energyHartree - 2 * hAtom)).toBeLessThan(1e-5);
  });

  it('breakSymmetry reaches the same UHF solution at 4.0 bohr directly', () => {
    const p = h2Sto3g(4.0);
    const followed = followInstability(p, runScf(p, { reference: 'RHF' }), { reference: 'RHF' });
    const broken = runScf(p, { reference: 'UHF', breakSymmetry: true });
    expect(broken.energyHartree).toBeCloseTo(followed.energyHartree, 9);
    expect(broken.s2).toBeCloseTo(followed.s2, 6);
  });
});
