/**
 * Timing script for the CI engine (not a test): full-CI sigma builds and complete
 * Davidson solves for 10 and 12 orbitals at half filling (63,504 and 853,776 determinants),
 * on the Hubbard ring (sparse integrals), on a seeded random Hamiltonian (every integral
 * non-zero) and on the molecule-like Hamiltonian (diagonally dominant, canonical-HF-like
 * orbitals: the convergence of a molecule). Sigma builds are timed plain and with the
 * Ms = 0 transpose symmetry; solves without a target spin (whole space) and as singlets
 * (one transpose sector), and for 10 orbitals once more with the diagonal preconditioner
 * instead of the default P-space one. Solve times are wall times including setup (space, plan).
 *
 *   npx tsx tests/bench/ci-bench.ts            all cases
 *   npx tsx tests/bench/ci-bench.ts --quick    skips the 12-orbital Davidson solves
 *   npx tsx tests/bench/ci-bench.ts --molecule only the molecule-like Hamiltonian
 */
import { buildCiSpace } from '../../solver/ci/space';
import { sigma } from '../../solver/ci/sigma';
import { sigmaPlan } from '../../solver/ci/sigmaPlan';
import { solveCi } from '../../solver/ci/solveCi';
import { hubbardHamiltonian } from '../../solver/system/hubbard';
import type { OrbitalHamiltonian } from '../../solver/types';
import { projectOntoParity, transposePermutation } from '../../solver/ci/transposeSymmetry';
import { moleculeLikeHamiltonian, randomHamiltonian } from '../solver/ci/hamiltonians';

const quick = process.argv.includes('--quick');
const moleculeOnly = process.argv.includes('--molecule');
let peakRss = 0;
const samplePeak = (): void => {
  peakRss = Math.max(peakRss, process.memoryUsage().rss);
};
const seconds = (start: number): number => (performance.now() - start) / 1000;

/** Alpha–beta multiply-adds of one sigma build: Σ over block pairs of (alpha replacements) × (beta replacements). */
function alphaBetaMultiplyAdds(ham: OrbitalHamiltonian, space: ReturnType<typeof buildCiSpace>): number {
  const plan = sigmaPlan(ham, space);
  let count = 0;
  for (const A of plan.alpha.replacements.singles)
    for (const B of plan.beta.replacements.singles) {
      const bI = space.blockOf[A.targetClass * space.beta.classes.length + B.targetClass];
      const bJ = space.blockOf[A.sourceClass * space.beta.classes.length + B.sourceClass];
      if (bI >= 0 && bJ >= 0) count += A.pairSource.length * B.source.length;
    }
  return count;
}

function benchSigma(label: string, ham: OrbitalHamiltonian, sites: number): void {
  const spec = { nOrbitals: sites, nAlpha: sites / 2, nBeta: sites / 2, maxExcitation: null };
  let t = performance.now();
  const space = buildCiSpace(spec);
  sigmaPlan(ham, space);
  const setup = seconds(t);
  const N = space.determinantCount;
  const c = new Float64Array(N);
  for (let i = 0; i < N; i++) c[i] = Math.sin(i + 1);
  projectOntoParity(transposePermutation(space)!, c, 1); // a singlet-parity vector, valid for both builds
  const out = new Float64Array(N);
  const repeats = N > 200000 ? 2 : 10;
  const time = (parity?: 1): number => {
    sigma(ham, space, c, out, { transposeParity: parity }); // warm-up
    samplePeak();
    const start = performance.now();
    for (let r = 0; r < repeats; r++) sigma(ham, space, c, out, { transposeParity: parity });
    samplePeak();
    return seconds(start) / repeats;
  };
  const perSigma = time();
  const perSymmetricSigma = time(1);
  const madds = alphaBetaMultiplyAdds(ham, space);
  console.log(
    `${label}: ${N.toLocaleString('en-US')} determinants, setup ${setup.toFixed(3)} s, sigma ${perSigma.toFixed(4)} s ` +
      `(${(1 / perSigma).toFixed(2)} sigma builds/s), transpose-symmetric sigma ${perSymmetricSigma.toFixed(4)} s, ` +
      `alpha–beta multiply-adds ${madds.toExponential(3)}, ` +
      `${((perSigma * 1e9) / madds).toFixed(2)} ns per multiply-add (whole plain sigma time / alpha–beta count)`,
  );
}

function benchSolve(label: string, ham: OrbitalHamiltonian, sites: number, targetMultiplicity?: number, preconditioner?: 'p-space' | 'diagonal'): void {
  const spec = { nOrbitals: sites, nAlpha: sites / 2, nBeta: sites / 2, maxExcitation: null };
  const t = performance.now();
  const sol = solveCi(ham, spec, { method: 'davidson', targetMultiplicity, preconditioner, onProgress: samplePeak });
  label += targetMultiplicity === undefined ? ', any spin' : `, multiplicity ${targetMultiplicity}`;
  if (preconditioner) label += `, ${preconditioner} preconditioner`;
  const wall = seconds(t);
  samplePeak();
  const last = sol.iterations[sol.iterations.length - 1];
  console.log(
    `${label}: Davidson solve ${wall.toFixed(2)} s, ${sol.iterations.length} iterations, E0 = ${sol.energies[0].toFixed(12)}, ` +
      `final residual ${last.residualNorms[0].toExponential(2)}, ⟨S²⟩ = ${sol.s2[0].toExponential(2)}`,
  );
}

for (const sites of [10, 12]) {
  const cases: [string, OrbitalHamiltonian][] = [[`H${sites}-like molecule-like Hamiltonian`, moleculeLikeHamiltonian(sites, 2024)]];
  if (!moleculeOnly) {
    cases.push([`H${sites}-like Hubbard ring U=4`, hubbardHamiltonian({ sites, periodic: true, t: 1, U: 4 })]);
    cases.push([`H${sites}-like random Hamiltonian`, randomHamiltonian(sites, 2024)]);
  }
  for (const [label, ham] of cases) benchSigma(label, ham, sites);
  if (sites === 10 || !quick) {
    for (const [label, ham] of cases) {
      benchSolve(label, ham, sites, 1);
      benchSolve(label, ham, sites);
    }
    // the P-space preconditioner (default) against the diagonal alone, singlets
    if (sites === 10) for (const [label, ham] of cases) benchSolve(label, ham, sites, 1, 'diagonal');
  }
}
console.log(`peak resident memory ${(peakRss / 2 ** 20).toFixed(0)} MiB`);
