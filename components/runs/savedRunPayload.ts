import type { RunResult } from '@/solver/run/result';
import { MAX_VECTOR_COMPRESSED_BYTES, MAX_VECTOR_VALUES } from '@/app/lib/runs/savedRunLimits';
import { bytesToBase64, encodeVectorsAsync, VECTOR_ENCODING } from '@/app/lib/runs/vectorCodec';

/** The result as displayed and stored: the whole CI vectors travel separately (compressed). */
export function withoutVectors(result: RunResult): RunResult {
  if (!result.ci?.vectors) return result;
  const { vectors: _vectors, ...ci } = result.ci;
  return { ...result, ci };
}

export interface VectorPlan {
  vector?: { encoding: typeof VECTOR_ENCODING; roots: number; length: number; data: string };
  /** Why the whole vector is left out, when it is. */
  note: string | null;
}

/** Compresses the CI vectors when they fit the limits; otherwise says why only the leading determinants are kept. */
export async function planVectorUpload(result: RunResult): Promise<VectorPlan> {
  const vectors = result.ci?.vectors;
  if (!vectors || vectors.length === 0) return { note: result.ci ? 'This result carries no CI vectors; the leading determinants are saved.' : null };
  const values = vectors.length * vectors[0].length;
  if (values > MAX_VECTOR_VALUES) {
    return { note: `The whole CI vectors (${values.toLocaleString('en')} values) are above the ${MAX_VECTOR_VALUES.toLocaleString('en')}-value limit; only the leading determinants are saved.` };
  }
  const encoded = await encodeVectorsAsync(vectors);
  if (encoded.bytes.byteLength > MAX_VECTOR_COMPRESSED_BYTES) {
    return { note: `The compressed CI vectors (${(encoded.bytes.byteLength / 2 ** 20).toFixed(1)} MiB) are above the ${MAX_VECTOR_COMPRESSED_BYTES / 2 ** 20} MiB limit; only the leading determinants are saved.` };
  }
  return {
    vector: { encoding: VECTOR_ENCODING, roots: encoded.roots, length: encoded.length, data: bytesToBase64(encoded.bytes) },
    note: null,
  };
}
