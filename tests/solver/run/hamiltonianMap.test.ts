import { describe, expect, it } from 'vitest';
import { EigenvalueDecomposition, Matrix } from 'ml-matrix';
import { parseRunFile } from '../../../solver/runFile/parse';
import { runCalculation } from '../../../solver/run/runCalculation';
import {
  HAMILTONIAN_MAP_LIMIT,
  breakdownOfDeterminants,
  elementBreakdown,
  hamiltonianMap,
  pairBreakdown,
  runCiHamiltonian,
} from '../../../solver/run/hamiltonianMap';

// Geometries: LiH at 3.015 bohr and water at R(OH) = 1.809 bohr, ∠HOH = 104.52°
// (from memory of the usual experimental equilibrium structures; any geometry serves these checks).
const angle = (104.52 * Math.PI) / 180;
const systems = {
  lih: {
    format: 'ketbook-run/1',
    system: { type: 'molecule', units: 'bohr', atoms: [['Li', 0, 0, 0], ['H', 0, 0, 3.015]], charge: 0, multiplicity: 1, basis: 'STO-3G' },
    reference: 'RHF',
    scf: { commutatorTolerance: 1e-12, energyTolerance: 1e-13 },
    ci: { space: 'FCI', roots: 6, method: 'dense' },
  },
  water: {
    format: 'ketbook-run/1',
    system: {
      type: 'molecule',
      units: 'bohr',
      atoms: [
        ['O', 0, 0, 0],
        ['H', 1.809 * Math.sin(angle / 2), 0, 1.809 * Math.cos(angle / 2)],
        ['H', -1.809 * Math.sin(angle / 2), 0, 1.809 * Math.cos(angle / 2)],
      ],
      charge: 0,
      multiplicity: 1,
      basis: 'STO-3G',
    },
    reference: 'RHF',
    scf: { commutatorTolerance: 1e-12, energyTolerance: 1e-13 },
    ci: { space: 'FCI', frozenCore: 1, roots: 5, method: 'dense' },
  },
} as const;

describe.each(Object.entries(systems))('Hamiltonian map of %s STO-3G full CI', (_name, raw) => {
  const runFile = parseRunFile(raw);
  const { view, context } = hamiltonianMap(runFile);
  const n = view.size;

  it('is ordered by excitation level, reference first, with labelled level blocks', () => {
    // common practice, no source: the aufbau determinant is level 0 and leads the map
    expect(view.referencePosition).toBe(0);
    expect(view.excitationLevels[0]).toBe(0);
    for (let i = 1; i < n; i++) expect(view.excitationLevels[i]).toBeGreaterThanOrEqual(view.excitationLevels[i - 1]);
    expect(view.blocks.reduce((s, b) => s + b.count, 0)).toBe(n);
    expect(view.blocks.map((b) => b.level)).toEqual([...new Set(view.excitationLevels)]);
  });

  it('gives phase × Σ terms = the dense element for every pair, and is symmetric', () => {
    // definition of the Slater–Condon breakdown (Szabo & Ostlund (1996) §2.3.3, Tables 2.3 and 2.4)
    let maxError = 0;
    let asymmetric = 0;
    for (let i = 0; i < n; i++) {
      for (let j = 0; j < n; j++) {
        const b = elementBreakdown(context, i, j);
        maxError = Math.max(maxError, Math.abs(b.phase * b.termSum - view.matrix[i * n + j]), Math.abs(b.value - view.matrix[i * n + j]));
        if (view.matrix[i * n + j] !== view.matrix[j * n + i]) asymmetric++;
      }
    }
    expect(maxError).toBeLessThan(1e-12);
    expect(asymmetric).toBe(0);
  });

  it('has a zero reference–single block for RHF orbitals (Brillouin)', () => {
    // Brillouin's theorem, Szabo & Ostlund (1996) §3.3: ⟨Ψ0|H|Ψ_a^r⟩ = f_ar = 0 at SCF convergence
    const singles = view.blocks.find((b) => b.level === 1)!;
    expect(singles.count).toBeGreaterThan(0);
    let largest = 0;
    for (let j = singles.start; j < singles.start + singles.count; j++) largest = Math.max(largest, Math.abs(view.matrix[j]));
    expect(largest).toBeLessThan(1e-10);
    // and the same block is not trivially empty of structure: some single–single elements are non-zero
    expect(view.matrix[singles.start * n + singles.start]).not.toBe(0);
  });

  it('is exactly zero between determinants differing in three or more spin orbitals', () => {
    // Slater–Condon rules, Szabo & Ostlund (1996) §2.3.3: a two-body operator couples at most double differences
    let far = 0;
    let nonZeroFar = 0;
    for (let i = 0; i < n; i++) {
      for (let j = 0; j < n; j++) {
        const b = elementBreakdown(context, i, j);
        if (b.differingSpinOrbitals >= 3) {
          far++;
          if (view.matrix[i * n + j] !== 0 || b.terms.length > 0) nonZeroFar++;
        }
      }
    }
    expect(far).toBeGreaterThan(0);
    expect(nonZeroFar).toBe(0);
  });

  it("has the run's full-CI root energies as its lowest eigenvalues", async () => {
    // ml-matrix EigenvalueDecomposition (an npm reference library) against the run's own dense solve
    const rows = Array.from({ length: n }, (_, i) => Array.from(view.matrix.subarray(i * n, (i + 1) * n)));
    const eigenvalues = [...new EigenvalueDecomposition(new Matrix(rows), { assumeSymmetric: true }).realEigenvalues].sort((a, b) => a - b);
    const result = await runCalculation(runFile);
    const roots = result.ci!.roots.map((r) => r.energy);
    expect(roots.length).toBe(runFile.ci!.roots);
    roots.forEach((e, k) => expect(Math.abs(eigenvalues[k] - e)).toBeLessThan(1e-10));
  });

  it('finds the same element from two determinants picked by their bit strings', () => {
    const last = n - 1;
    const picked = breakdownOfDeterminants(context, { alpha: view.alpha[0], beta: view.beta[0] }, { alpha: view.alpha[last], beta: view.beta[last] });
    expect(picked.row).toBe(0);
    expect(picked.column).toBe(last);
    expect(picked.value).toBe(view.matrix[last]);
  });
});

describe('Hamiltonian map refusals', () => {
  it(`refuses a space above ${HAMILTONIAN_MAP_LIMIT} determinants and says how to shrink it`, () => {
    // Ten-site Hubbard chain at half filling: C(10,5)² = 63,504 determinants (analytic count)
    const runFile = parseRunFile({
      format: 'ketbook-run/1',
      system: { type: 'hubbard', sites: 10, periodic: false, t: 1, U: 4, electrons: 10, multiplicity: 1 },
      ci: { space: 'FCI', roots: 1 },
    });
    expect(() => hamiltonianMap(runFile)).toThrow(/63,504.*To shrink it/);
  });

  it('refuses a run without CI and a bit string of the wrong length', () => {
    const scfOnly = parseRunFile({
      format: 'ketbook-run/1',
      system: { type: 'molecule', units: 'bohr', atoms: [['H', 0, 0, 0], ['H', 0, 0, 1.4]], charge: 0, multiplicity: 1, basis: 'STO-3G' },
    });
    expect(() => hamiltonianMap(scfOnly)).toThrow(/no CI/);
    const { context } = hamiltonianMap(parseRunFile({ ...scfOnly, ci: { space: 'FCI' } }));
    expect(() => breakdownOfDeterminants(context, { alpha: '1', beta: '10' }, { alpha: '10', beta: '10' })).toThrow(/2 characters of 0 and 1/);
    expect(() => elementBreakdown(context, 0, 4)).toThrow(/outside the map/);
  });
});

describe('a pair picked from the determinants table', () => {
  it('gives the same breakdown as the map, without drawing it', async () => {
    const runFile = parseRunFile(systems.lih);
    const { view, context } = hamiltonianMap(runFile);
    const run = runCiHamiltonian(runFile);
    const result = await runCalculation(runFile);
    const [a, b] = result.ci!.roots[0].leadingDeterminants;
    const pair = pairBreakdown(run, a, b);
    const fromMap = breakdownOfDeterminants(context, a, b);
    // the same Slater–Condon element whichever way it is reached (common practice, no source)
    expect(pair.value).toBe(fromMap.value);
    expect(pair.value).toBe(view.matrix[fromMap.row * view.size + fromMap.column]);
    expect(pair.alphaI).toBe(a.alpha);
    expect(() => pairBreakdown(run, a, { alpha: a.alpha, beta: '111000' })).toThrow(/same numbers of alpha and beta/);
  });
});
