import { describe, expect, it } from 'vitest';
import type { Vec3 } from '../../../solver/types';
import { buildMolecule } from '../../../solver/system/molecule';
import { buildBasis } from '../../../solver/basis';
import { cartesianExponents } from '../../../solver/basis/cartesian';
import { overlapMatrix, kineticMatrix, nuclearAttractionMatrix, electronRepulsionIntegrals, eriIndex, dipoleMatrices } from '../../../solver/integrals';
import {
  coulombPointReference,
  integrate,
  kineticReference,
  normalised,
  overlapReference,
  repulsionReference,
  type TestFunction,
} from './gaussianQuadrature';

// A made-up three-centre system with s, p and d shells, one of them contracted; the expected
// values all come from quadrature (flo-gauss-quadrature), see ./gaussianQuadrature.ts.
const shellsByElement = {
  O: [
    { shell: 'd' as const, exponents: [1.3, 0.45], coefficients: [0.6, 0.5] },
    { shell: 'p' as const, exponents: [0.8], coefficients: [1] },
  ],
  N: [{ shell: 'sp' as const, exponents: [0.9], coefficients: [1], coefficientsP: [1] }],
  H: [{ shell: 'd' as const, exponents: [0.7], coefficients: [1] }],
};
const molecule = buildMolecule({
  atoms: [
    { symbol: 'O', position: [0.1, -0.2, 0.3] },
    { symbol: 'N', position: [1.2, 0.4, -0.5] },
    { symbol: 'H', position: [-0.6, 1.1, 0.7] },
  ],
  units: 'bohr',
  charge: 0,
  multiplicity: 1,
});
const basis = buildBasis(molecule, { type: 'custom', name: 'quadrature check', elements: shellsByElement });

/** The basis as independent test functions, each normalised by quadrature. */
function referenceFunctions(): TestFunction[] {
  const out: TestFunction[] = [];
  molecule.atoms.forEach((atom) => {
    const centre = atom.positionBohr as Vec3;
    for (const spec of shellsByElement[atom.symbol as keyof typeof shellsByElement]) {
      const parts = spec.shell === 'sp' ? [0, 1] : [{ s: 0, p: 1, d: 2 }[spec.shell]];
      for (const l of parts) {
        const coefficients = l === 1 && spec.shell === 'sp' ? spec.coefficientsP! : spec.coefficients;
        const powers = cartesianExponents(l);
        for (let c = 0; c < powers.length; c += 3) {
          const p: [number, number, number] = [powers[c], powers[c + 1], powers[c + 2]];
          // contraction coefficients multiply normalised primitives, so normalise each primitive first
          const raw = spec.exponents.map((alpha, k) => {
            const one = { centre, powers: p, exponents: [alpha], coefficients: [1] };
            return coefficients[k] / Math.sqrt(overlapReference(one, one));
          });
          out.push(normalised({ centre, powers: p, exponents: spec.exponents, coefficients: raw }));
        }
      }
    }
  });
  return out;
}

const reference = referenceFunctions();
const n = basis.nFunctions;

describe('one-electron integrals over s, p, d against quadrature', () => {
  it('has the functions in the documented order', () => {
    expect(reference.length).toBe(n);
    expect(basis.functionLabels.slice(0, 7)).toEqual(['O1 3dxx', 'O1 3dxy', 'O1 3dxz', 'O1 3dyy', 'O1 3dyz', 'O1 3dzz', 'O1 2px']); // cartesian.ts order
    expect([basis.functionLabels[9], basis.functionLabels[10], basis.functionLabels[14]]).toEqual(['N2 1s', 'N2 2px', 'H3 3dxy']); // label scheme of buildBasis
  });

  it('overlap', () => {
    const s = overlapMatrix(basis);
    let worst = 0;
    for (let i = 0; i < n; i++) for (let j = 0; j <= i; j++) worst = Math.max(worst, Math.abs(s[i * n + j] - overlapReference(reference[i], reference[j])));
    expect(worst).toBeLessThan(1e-11); // quadrature reference
    for (let i = 0; i < n; i++) expect(Math.abs(s[i * n + i] - 1)).toBeLessThan(1e-12); // every component normalised
  });

  it('kinetic energy', () => {
    const t = kineticMatrix(basis);
    let worst = 0;
    for (let i = 0; i < n; i++) for (let j = 0; j <= i; j++) worst = Math.max(worst, Math.abs(t[i * n + j] - kineticReference(reference[i], reference[j])));
    expect(worst).toBeLessThan(1e-10); // quadrature reference
  });

  it('dipole about an arbitrary origin', () => {
    const origin: Vec3 = [0.3, -0.1, 0.2];
    const [x] = dipoleMatrices(basis, origin);
    // ⟨f|(x−O_x)|g⟩ = ⟨f|x_A|g⟩ + (A_x − O_x)⟨f|g⟩, x_A raising f's x power (analytic identity)
    for (const [i, j] of [[0, 7], [1, 3], [6, 12], [9, 14]]) {
      const f = reference[i];
      const raised = { ...f, powers: [f.powers[0] + 1, f.powers[1], f.powers[2]] as [number, number, number] };
      const ref = overlapReference(raised, reference[j]) + (f.centre[0] - origin[0]) * overlapReference(f, reference[j]);
      expect(Math.abs(x[i * n + j] - ref)).toBeLessThan(1e-11); // quadrature reference
    }
  });

  it('nuclear attraction (selected elements)', () => {
    const v = nuclearAttractionMatrix(basis, molecule);
    const pairs = [[0, 0], [1, 0], [4, 2], [6, 0], [7, 3], [8, 9], [11, 15], [13, 13], [15, 0], [12, 17]];
    for (const [i, j] of pairs) {
      let ref = 0;
      for (const atom of molecule.atoms) ref -= atom.atomicNumber * coulombPointReference(reference[i], reference[j], atom.positionBohr);
      expect(Math.abs(v[i * n + j] - ref)).toBeLessThan(1e-9); // quadrature reference
    }
  });
});

describe('two-electron integrals with p and d against quadrature', () => {
  // Uncontracted functions only: the reference is a 2D quadrature per direction per t point.
  const eri = electronRepulsionIntegrals(basis);
  // Function indices: O 3d 0–5, O 2p 6–8, N 1s 9, N 2p 10–12, H 3d 13–18.
  const cases: [number, number, number, number, string][] = [
    [9, 9, 9, 9, '(ss|ss) on N'],
    [6, 9, 9, 9, '(ps|ss)'],
    [6, 6, 10, 9, '(pp|ps)'],
    [14, 9, 6, 9, '(ds|ps)'],
    [15, 15, 7, 6, '(dd|pp)'],
  ];
  for (const [i, j, k, l, what] of cases) {
    it(what, () => {
      const ref = repulsionReference(reference[i], reference[j], reference[k], reference[l]); // quadrature reference
      expect(Math.abs(eri[eriIndex(i, j, k, l)] - ref)).toBeLessThan(1e-9);
    });
  }

  it('quadrature helper integrates a known Gaussian', () => {
    expect(integrate((x) => Math.exp(-x * x), -10, 10)).toBeCloseTo(Math.sqrt(Math.PI), 14); // analytic: ∫e^{−x²} = √π
  });
});
