/**
 * Scan timings for `npm run bench` (figures only, nothing passes or fails): whole scans through
 * `runScan`, one point after another in one thread — the single-worker figure; the browser
 * pool is measured separately. Grid points and the constants (direct minimisation around each
 * minimum, fragments for D_e) are timed apart.
 *
 *   npx tsx tests/bench/scan-bench.ts   this part alone
 */
import { runScan } from '../../solver/scan';
import { parseRunFile } from '../../solver/runFile/parse';

async function timedScan(label: string, atoms: [string, number, number, number][], scan: object, methods: object[]) {
  const input = parseRunFile({ format: 'ketbook-run/1', system: { type: 'molecule', units: 'bohr', atoms, basis: 'STO-3G' }, scan, methods });
  const start = performance.now();
  let gridDone = start;
  let points = 0;
  const result = await runScan(input, {
    onPoint: () => {
      points++;
      gridDone = performance.now();
    },
  });
  const end = performance.now();
  const constants = result.constants
    .filter((c) => c.root === 0)
    .map((c) => `${result.methods[c.method].label} Re ${c.Re?.toFixed(4) ?? '–'}`)
    .join(', ');
  console.log(
    `${label.padEnd(44)} ${String(points).padStart(4)} points  grid ${((gridDone - start) / 1000).toFixed(2).padStart(7)} s  ` +
      `constants ${((end - gridDone) / 1000).toFixed(2).padStart(6)} s  total ${((end - start) / 1000).toFixed(2).padStart(7)} s  (${constants})`,
  );
}

export async function runScanBench(): Promise<void> {
  console.log('\nScans, one worker (wall seconds):');
  await timedScan(
    'H2 0.5–10.4 bohr: RHF, UHF, FCI',
    [['H', 0, 0, 0], ['H', 0, 0, 1.4]],
    { coordinate: { type: 'distance', atoms: [0, 1] }, from: 0.5, to: 10.4, step: 0.1, units: 'bohr' },
    [{ reference: 'RHF' }, { reference: 'UHF' }, { space: 'FCI' }],
  );
  await timedScan(
    'LiH 2.0–7.8 bohr: RHF, CISD, CISD+Q, FCI',
    [['Li', 0, 0, 0], ['H', 0, 0, 3.0]],
    { coordinate: { type: 'distance', atoms: [0, 1] }, from: 2.0, to: 7.8, step: 0.2, units: 'bohr' },
    [{ reference: 'RHF' }, { space: 'CISD' }, { space: 'CISD', plusQ: true }, { space: 'FCI' }],
  );
}

if (require.main === module) {
  runScanBench().catch((error) => {
    console.error(error);
    process.exitCode = 1;
  });
}
