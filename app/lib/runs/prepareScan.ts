import 'server-only';
import { parseRunFile } from '@/solver/runFile/parse';
import { runFileHash } from '@/solver/runFile/canonical';
import { describeRunFile } from '@/solver/runFile/describe';
import { planScan } from '@/solver/scan';
import { SolverError } from '@/solver/errors';
import { ApiError } from '../errors';
import { MAX_RUN_JSON_BYTES } from './savedRunLimits';

/** Checks a scan file with the run-file schema and the scan planner (which places every point), before anything is stored. */
export async function prepareScan(scanFile: unknown) {
  const refuse = (error: SolverError) => {
    const issues = (error.details as { path: string; message: string }[] | undefined) ?? [{ path: error.field ?? '', message: error.message }];
    const fields: Record<string, string[]> = {};
    for (const issue of issues) (fields[issue.path ? `scanFile.${issue.path}` : 'scanFile'] ??= []).push(issue.message);
    return new ApiError('unprocessable:run-file', { message: error.message, fields });
  };
  const json = JSON.stringify(scanFile);
  if (new TextEncoder().encode(json).length > MAX_RUN_JSON_BYTES) throw new ApiError('payload_too_large:body');
  try {
    const runFile = parseRunFile(scanFile);
    if (!runFile.scan) throw new SolverError('bad-input', 'a scan file needs a "scan" field', { field: 'scan' });
    const plan = planScan(runFile);
    const labels = describeRunFile(runFile);
    return {
      labels: { system: labels.system, basis: labels.basis, methods: plan.methods.map((m) => m.label).join(', ') },
      pointCount: plan.points.length,
      scanFileHash: await runFileHash(runFile),
      scanFileJson: json,
    };
  } catch (error) {
    if (error instanceof SolverError) throw refuse(error);
    throw error;
  }
}
