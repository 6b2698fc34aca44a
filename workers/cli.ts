/**
 * The command-line face of the solver: `npm run -s solve -- run.json [--estimate]`.
 * Reads a run file (a path, or "-" for standard input), prints exactly one JSON document
 * on stdout — the result, or `{ "error": { "code", "message", "field"?, "issues"? } }` —
 * and writes progress to stderr. Exit codes: 0 done, 2 bad input, 3 over the memory
 * budget, 4 not converged, 1 anything else.
 */
import { readFileSync } from 'node:fs';
import { SolverError } from '../solver/errors';
import { parseRunFile } from '../solver/runFile/parse';
import { toJsonSafe } from '../solver/runFile/jsonSafety';
import { runCalculation, estimateRun } from '../solver/run';
import { planScan, runScan, scanToJson, runLadder } from '../solver/scan';
import type { RunFile } from '../solver/runFile/schema';
import type { ProgressEvent } from '../solver/types';

const KNOWN_FLAGS = new Set(['--estimate', '--quiet']);
const EXIT_CODES: Record<string, number> = { 'bad-input': 2, 'over-budget': 3, 'not-converged': 4 };

function describeProgress(event: ProgressEvent): string {
  switch (event.phase) {
    case 'integrals': return `integrals ${event.done}/${event.total}`;
    case 'scf': return `SCF ${event.iteration}: E = ${event.energyHartree.toFixed(12)} Eh, error ${event.error.toExponential(2)}`;
    case 'transform': return 'transforming integrals to orbitals';
    case 'ci-setup': return `CI space: ${event.determinants} determinants`;
    case 'davidson':
      return `Davidson ${event.iteration}: ${event.energies.map((e) => e.toFixed(12)).join(' ')} | residual ${Math.max(...event.residualNorms).toExponential(2)}`;
    case 'properties': return 'properties';
  }
}

function printError(error: unknown): number {
  const solverError =
    error instanceof SolverError ? error : new SolverError('internal', error instanceof Error ? error.message : String(error));
  const payload: Record<string, unknown> = { code: solverError.code, message: solverError.message };
  if (solverError.field) payload.field = solverError.field;
  if (solverError.code === 'bad-input' && Array.isArray(solverError.details)) payload.issues = solverError.details;
  process.stdout.write(`${JSON.stringify({ error: payload })}\n`);
  return EXIT_CODES[solverError.code] ?? 1;
}

/**
 * A run file with a "scan": one JSON document with "points", "curves" and "constants" (see
 * DEVELOPERS.md, "Scans"); progress per point on stderr. --estimate sizes each method at the
 * first point.
 */
async function solveScan(runFile: RunFile, flags: string[]): Promise<number> {
  const quiet = flags.includes('--quiet');
  if (flags.includes('--estimate')) {
    const plan = planScan(runFile);
    const estimates = plan.methods.map((m) => ({
      method: m.label,
      estimate: m.ci ? estimateRun({ ...plan.pointRunFiles[0], reference: m.reference, ci: m.ci } as RunFile) : null,
    }));
    process.stdout.write(`${JSON.stringify(toJsonSafe({ points: plan.points.length, methods: estimates }))}\n`);
    return 0;
  }
  const scan = await runScan(runFile, {
    onPoint: quiet
      ? undefined
      : (index, result, plan) =>
          process.stderr.write(
            `point ${index + 1}/${plan.points.length} at ${plan.points[index]} ${plan.units}: ` +
              (result ? result.methods.map((m, k) => `${plan.methods[k].label} ${m.energies[0].toFixed(10)}`).join(', ') : 'not converged') +
              '\n',
          ),
  });
  process.stdout.write(`${scanToJson(scan)}\n`);
  return 0;
}

async function main(argv: string[]): Promise<number> {
  const flags = argv.filter((a) => a.startsWith('--'));
  const paths = argv.filter((a) => !a.startsWith('--'));
  const unknownFlags = flags.filter((f) => !KNOWN_FLAGS.has(f));
  if (unknownFlags.length > 0) {
    return printError(new SolverError('bad-input', `unknown option ${unknownFlags.join(', ')}; known: ${[...KNOWN_FLAGS].join(', ')}`));
  }
  if (paths.length !== 1) {
    return printError(new SolverError('bad-input', 'usage: npm run -s solve -- <run.json | -> [--estimate] [--quiet]'));
  }
  let text: string;
  try {
    text = paths[0] === '-' ? readFileSync(0, 'utf8') : readFileSync(paths[0], 'utf8');
  } catch (e) {
    return printError(new SolverError('bad-input', `cannot read ${paths[0]}: ${(e as Error).message}`));
  }
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (e) {
    return printError(new SolverError('bad-input', `the run file is not valid JSON: ${(e as Error).message}`));
  }
  try {
    const runFile = parseRunFile(json);
    if (runFile.scan) return await solveScan(runFile, flags);
    if (runFile.ladder) {
      const quiet = flags.includes('--quiet');
      const ladder = await runLadder(runFile, {
        onBasis: quiet ? undefined : (index, _result, plan) => process.stderr.write(`basis ${index + 1}/${plan.bases.length}: ${plan.bases[index]}\n`),
      });
      process.stdout.write(`${JSON.stringify(ladder)}\n`);
      return 0;
    }
    if (flags.includes('--estimate')) {
      process.stdout.write(`${JSON.stringify(toJsonSafe(estimateRun(runFile)))}\n`);
      return 0;
    }
    const quiet = flags.includes('--quiet');
    const result = await runCalculation(runFile, {
      onProgress: quiet ? undefined : (event) => process.stderr.write(`${describeProgress(event)}\n`),
    });
    process.stdout.write(`${JSON.stringify(result)}\n`);
    return 0;
  } catch (error) {
    return printError(error);
  }
}

main(process.argv.slice(2)).then((code) => {
  process.exitCode = code;
});
