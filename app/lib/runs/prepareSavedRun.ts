import 'server-only';
import { parseRunFile } from '@/solver/runFile/parse';
import { runFileHash } from '@/solver/runFile/canonical';
import { SolverError } from '@/solver/errors';
import { ApiError } from '../errors';
import type { SaveRunInput } from './saveRunSchema';
import { MAX_RUN_JSON_BYTES, MAX_VECTOR_COMPRESSED_BYTES, MAX_VECTOR_VALUES } from './savedRunLimits';
import { savedRunColumns, type SavedRunColumns } from './savedRunRow';
import { base64DecodedLength, base64ToBytes, decodeVectors } from './vectorCodec';

type Prepared = SavedRunColumns;

function fieldsOfRunFileError(error: SolverError): Record<string, string[]> {
  const fields: Record<string, string[]> = {};
  const issues = (error.details as { path: string; message: string }[] | undefined) ?? [{ path: error.field ?? '', message: error.message }];
  for (const issue of issues) (fields[issue.path ? `runFile.${issue.path}` : 'runFile'] ??= []).push(issue.message);
  return fields;
}

/**
 * Checks a save request beyond its shape: the run file must pass the one run-file schema,
 * the result must carry that run file's hash, and the vector blob must inflate to exactly the
 * stated roots × determinants of finite values. Only then is anything written.
 */
export async function prepareSavedRun(input: SaveRunInput): Promise<Prepared> {
  let runFile;
  try {
    runFile = parseRunFile(input.runFile);
  } catch (error) {
    if (error instanceof SolverError) throw new ApiError('unprocessable:run-file', { message: error.message, fields: fieldsOfRunFileError(error) });
    throw error;
  }
  const hash = await runFileHash(runFile);
  if (hash !== input.result.provenance.runFileHash) throw new ApiError('unprocessable:result-mismatch', { fields: { result: ['The result was not computed from this run file.'] } });

  const jsonBytes = new TextEncoder().encode(JSON.stringify(input.runFile)).length + new TextEncoder().encode(JSON.stringify(input.result)).length;
  if (jsonBytes > MAX_RUN_JSON_BYTES) {
    throw new ApiError('payload_too_large:body', { message: `The run file and the result together exceed ${MAX_RUN_JSON_BYTES / 1024 / 1024} MiB.` });
  }

  let vector: Prepared['vector'] = null;
  if (input.vector) {
    const { roots, length, data } = input.vector;
    const vectorField = (message: string) => new ApiError('unprocessable:vector', { message, fields: { vector: [message] } });
    if (length !== input.result.determinantCount) throw vectorField(`The CI vectors have ${length} values per root, but the run has ${input.result.determinantCount} determinants.`);
    if (roots > input.result.energies.roots.length) throw vectorField(`The CI vectors hold ${roots} roots, but the run has ${input.result.energies.roots.length}.`);
    if (roots * length > MAX_VECTOR_VALUES) throw new ApiError('payload_too_large:body', { message: `Whole CI vectors above ${MAX_VECTOR_VALUES} values are not stored; save the leading determinants only.` });
    if (base64DecodedLength(data) > MAX_VECTOR_COMPRESSED_BYTES) {
      throw new ApiError('payload_too_large:body', { message: `The compressed CI vectors exceed ${MAX_VECTOR_COMPRESSED_BYTES / 1024 / 1024} MiB; save the leading determinants only.` });
    }
    let bytes: Uint8Array;
    try {
      bytes = base64ToBytes(data);
    } catch (error) {
      throw vectorField((error as Error).message);
    }
    try {
      decodeVectors(bytes, roots, length);
    } catch (error) {
      throw vectorField((error as Error).message);
    }
    vector = { bytes: Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength), roots, length };
  }

  return savedRunColumns({
    runFile,
    runFileAsSent: input.runFile,
    result: input.result,
    title: input.title,
    tags: input.tags ?? [],
    projectId: input.projectId ?? null,
    vector,
  });
}
