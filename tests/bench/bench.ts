/**
 * `npm run bench`: the solver's speed and memory on the reference cases, printed as figures
 * (nothing here passes or fails). Single-threaded, through the same pipeline the worker and
 * the CLI use. Targets (from the solver's issue): H10 chain FCI (63,504 determinants) in at
 * most 2 s; H12 (853,776) in at most 60 s and 1 GiB.
 *
 *   npm run bench              every case
 *   npm run bench -- --quick   skips the H12 chain
 */
import { runCalculation } from '../../solver/run';
import { parseRunFile } from '../../solver/runFile/parse';
import type { RunFileInput } from '../../solver/runFile/schema';

const quick = process.argv.includes('--quick');
let peakRss = 0;
const sample = () => {
  peakRss = Math.max(peakRss, process.memoryUsage().rss);
};
const timer = setInterval(sample, 50);

type Atoms = [string, number, number, number][];
const chain = (n: number, spacingBohr: number): Atoms => Array.from({ length: n }, (_, i) => ['H', 0, 0, spacingBohr * i]);

function fci(atoms: Atoms, extra: Record<string, unknown> = {}): RunFileInput {
  return {
    format: 'ketbook-run/1',
    system: { type: 'molecule', units: 'bohr', atoms, charge: 0, multiplicity: 1, basis: 'STO-3G' },
    ci: { space: 'FCI', ...extra },
  } as RunFileInput;
}

async function timed(label: string, input: RunFileInput) {
  const start = performance.now();
  const before = peakRss;
  const result = await runCalculation(parseRunFile(input));
  const wall = (performance.now() - start) / 1000;
  sample();
  const iterations = result.ci?.iterations.length ?? 0;
  console.log(
    `${label.padEnd(34)} ${String(result.determinantCount).padStart(9)} determinants  ${wall.toFixed(3).padStart(8)} s  ` +
      `${result.ci?.method ?? 'scf'} ${iterations} iterations  E = ${result.energies.roots[0].toFixed(10)}  ` +
      `peak RSS ${(Math.max(before, peakRss) / 2 ** 20).toFixed(0)} MiB`,
  );
  return { wall, result };
}

async function main() {
  console.log(`Ketbook benchmark — Node ${process.version}, single-threaded\n`);

  // H2 dissociation curve: 100 points of FCI from 0.5 to 10.4 bohr.
  const start = performance.now();
  for (let k = 0; k < 100; k++) {
    await runCalculation(parseRunFile(fci([['H', 0, 0, 0], ['H', 0, 0, 0.5 + 0.1 * k]])));
  }
  console.log(`${'H2 curve, 100 points FCI'.padEnd(34)} ${String(4).padStart(9)} determinants  ${((performance.now() - start) / 1000).toFixed(3).padStart(8)} s in all\n`);

  await timed('H4 square 2.0 bohr FCI', fci([['H', 0, 0, 0], ['H', 2, 0, 0], ['H', 2, 2, 0], ['H', 0, 2, 0]]));
  await timed('LiH 3.015 bohr FCI', fci([['Li', 0, 0, 0], ['H', 0, 0, 3.015]]));
  await timed('H2O FCI (OH 1.809 bohr, 104.5°)', fci([['O', 0, 0, 0], ['H', 0, 1.4305, 1.1074], ['H', 0, -1.4305, 1.1074]]));
  await timed('H8 chain 1.8 bohr FCI', fci(chain(8, 1.8)));
  await timed('H10 chain 1.8 bohr FCI', fci(chain(10, 1.8)));
  if (!quick) await timed('H12 chain 1.8 bohr FCI', fci(chain(12, 1.8)));

  console.log('\nDense against Davidson on one space (H6 chain 1.8 bohr, CISD):');
  const dense = await timed('  dense', fci(chain(6, 1.8), { space: 'CISD', method: 'dense' }));
  const davidson = await timed('  Davidson', fci(chain(6, 1.8), { space: 'CISD', method: 'davidson' }));
  console.log(`  |ΔE| = ${Math.abs(dense.result.energies.roots[0] - davidson.result.energies.roots[0]).toExponential(2)} Eh`);

  console.log('\nCI engine alone (sigma builds per second, ns per alpha–beta multiply-add):');
  clearInterval(timer);
  if (quick) process.argv.push('--quick');
  await import('./ci-bench');
  await (await import('./longTasks')).benchLongTasks();
  await (await import('./scan-bench')).runScanBench();
}

main().catch((error) => {
  console.error(error);
  process.exitCode = 1;
});
