import { describe, expect, it } from 'vitest';
import { buildMolecule } from '../../../solver/system/molecule';
import { buildBasis } from '../../../solver/basis';
import { overlapMatrix, kineticMatrix, nuclearAttractionMatrix, electronRepulsionIntegrals } from '../../../solver/integrals';
import { nuclearRepulsionHartree } from '../../../solver/system/molecule';
import { runScf } from '../../../solver/scf';
import { symmetryFrame, orbitalIrreps, numberedOrbitalLabels } from '../../../solver/symmetry';
import type { Molecule } from '../../../solver/types';

function unit(v: number[]): number[] {
  const length = Math.hypot(...v);
  return v.map((x) => x / length);
}

function rhfOrbitals(input: Molecule) {
  const frame = symmetryFrame(input);
  const molecule = frame.molecule;
  const basis = buildBasis(molecule, 'STO-3G');
  const n = basis.nFunctions;
  const overlap = overlapMatrix(basis);
  const t = kineticMatrix(basis);
  const v = nuclearAttractionMatrix(basis, molecule);
  const core = new Float64Array(n * n);
  for (let k = 0; k < n * n; k++) core[k] = t[k] + v[k];
  let electrons = -molecule.charge;
  for (const a of molecule.atoms) if (!a.ghost) electrons += a.atomicNumber;
  const scf = runScf(
    {
      nBasis: n,
      overlap,
      coreHamiltonian: core,
      eri: electronRepulsionIntegrals(basis),
      nuclearRepulsionHartree: nuclearRepulsionHartree(molecule),
      nAlpha: electrons / 2,
      nBeta: electrons / 2,
    },
    { reference: 'RHF' },
  );
  const labelled = orbitalIrreps(basis, frame, scf.coefficients.alpha, overlap, n, scf.orbitalEnergies.alpha);
  return { frame, basis, overlap, scf, labelled, n };
}

describe('irreps of STO-3G RHF orbitals in the symmetry frame', () => {
  it('water: 1a1 2a1 1b2 3a1 1b1 occupied, 4a1 2b2 virtual (molecule in the yz plane)', () => {
    // from memory of Szabo & Ostlund (1996) ch. 3, minimal-basis water orbital ordering;
    // b1/b2 as in Ketbook's yz-plane convention (b1 = out-of-plane O 2p)
    // R(OH) = 1.809 bohr, ∠HOH = 104.52°, in an arbitrary orientation: e1 along the bisector, e2 in plane.
    const half = (104.52 / 2) * (Math.PI / 180);
    const R = 1.809;
    const e1 = unit([0.3, -0.5, 0.81]);
    const w = [0.9, 0.2, -0.1];
    const along = w.reduce((s, x, k) => s + x * e1[k], 0);
    const e2 = unit(w.map((x, k) => x - along * e1[k]));
    const o = [0.7, -0.2, 1.3];
    const h = (side: number) => [0, 1, 2].map((k) => o[k] + R * (Math.cos(half) * e1[k] + side * Math.sin(half) * e2[k]));
    const water = buildMolecule({
      atoms: [
        { symbol: 'O', position: o },
        { symbol: 'H', position: h(1) },
        { symbol: 'H', position: h(-1) },
      ],
      units: 'bohr',
      charge: 0,
      multiplicity: 1,
    });
    const { frame, labelled } = rhfOrbitals(water);
    expect(frame.pointGroup).toBe('C2v');
    expect(labelled.impureOrbitals).toEqual([]);
    expect(labelled.maxDeviation).toBeLessThan(1e-6);
    expect(numberedOrbitalLabels('C2v', labelled.irreps)).toEqual(['1a1', '2a1', '1b2', '3a1', '1b1', '4a1', '2b2']);
  });

  it('H2: σg (Ag) below σu (B1u)', () => {
    // Szabo & Ostlund (1996) §3.5.2
    const h2 = buildMolecule({
      atoms: [
        { symbol: 'H', position: [0.1, 0.2, 0.3] },
        { symbol: 'H', position: [0.1 + 0.8, 0.2 + 0.8, 0.3 + 0.8] },
      ],
      units: 'bohr',
      charge: 0,
      multiplicity: 1,
    });
    const { frame, labelled } = rhfOrbitals(h2);
    expect(frame.pointGroup).toBe('D2h');
    expect(labelled.labels).toEqual(['Ag', 'B1u']);
  });

  it('N2: every orbital pure, π pairs degenerate and labelled as the πu and πg components', () => {
    // analytic: minimal basis of a homonuclear diatomic reduces to 3 Ag + 3 B1u + B3u + B2u + B2g + B3g
    const n2 = buildMolecule({
      atoms: [
        { symbol: 'N', position: [0, 0.3, -0.2] },
        { symbol: 'N', position: [1.2, 0.9, 1.0] },
      ],
      units: 'bohr',
      charge: 0,
      multiplicity: 1,
    });
    const { frame, labelled, scf, basis, n } = rhfOrbitals(n2);
    expect(frame.pointGroup).toBe('D2h');
    expect(labelled.impureOrbitals).toEqual([]);
    const counts: Record<string, number> = {};
    for (const l of labelled.labels) counts[l] = (counts[l] ?? 0) + 1;
    expect(counts).toEqual({ Ag: 3, B1u: 3, B3u: 1, B2u: 1, B2g: 1, B3g: 1 });
    const e = scf.orbitalEnergies.alpha;
    const at = (l: string) => labelled.labels.indexOf(l);
    expect(e[at('B3u')]).toBeCloseTo(e[at('B2u')], 8); // πu pair
    expect(e[at('B2g')]).toBeCloseTo(e[at('B3g')], 8); // πg pair
    // Re-labelling the returned orbitals finds nothing left to symmetrise.
    const again = orbitalIrreps(basis, frame, labelled.coefficients, overlapMatrix(basis), n);
    expect(again.maxDeviation).toBeLessThan(1e-8);
  });
});
