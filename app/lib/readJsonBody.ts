import { ApiError } from './errors';

/** The JSON endpoints of the foundation take small bodies; 64 KiB is far above any real form. */
export const MAX_JSON_BODY_BYTES = 64 * 1024;

/**
 * Reads a request body as JSON with a byte limit. The declared Content-Length is checked
 * first, then the stream is counted while read, so a client that lies about the length
 * (or sends chunked data) is still stopped at the limit.
 */
export async function readJsonBody(request: Request, maxBytes = MAX_JSON_BODY_BYTES): Promise<unknown> {
  const declared = Number(request.headers.get('content-length') ?? '');
  if (Number.isFinite(declared) && declared > maxBytes) throw new ApiError('payload_too_large:body');
  if (!request.body) throw new ApiError('bad_request:body');

  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > maxBytes) {
      await reader.cancel();
      throw new ApiError('payload_too_large:body');
    }
    chunks.push(value);
  }
  const bytes = new Uint8Array(total);
  let offset = 0;
  for (const chunk of chunks) {
    bytes.set(chunk, offset);
    offset += chunk.byteLength;
  }
  const text = new TextDecoder('utf-8', { fatal: false }).decode(bytes);
  if (text.trim() === '') throw new ApiError('bad_request:body');
  try {
    return JSON.parse(text);
  } catch {
    throw new ApiError('bad_request:json');
  }
}
