import { deflate, deflateSync, inflateSync } from 'fflate';

/**
 * The stored form of a run's CI vectors: the roots one after another as little-endian
 * IEEE-754 float64 values, deflate-compressed (RFC 1951) and, in transit, base64 (RFC 4648).
 * Written once here for the page, the route handler and the tests.
 */
export const VECTOR_ENCODING = 'deflate-float64le' as const;

const littleEndian = new Uint8Array(new Float64Array([1]).buffer)[7] === 0x3f;

function toLittleEndianBytes(values: Float64Array): Uint8Array {
  if (littleEndian) return new Uint8Array(values.buffer, values.byteOffset, values.byteLength);
  const out = new Uint8Array(values.length * 8);
  const view = new DataView(out.buffer);
  values.forEach((v, i) => view.setFloat64(i * 8, v, true));
  return out;
}

function fromLittleEndianBytes(bytes: Uint8Array): Float64Array {
  const out = new Float64Array(bytes.byteLength / 8);
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  for (let i = 0; i < out.length; i++) out[i] = view.getFloat64(i * 8, true);
  return out;
}

export interface EncodedVectors {
  roots: number;
  length: number;
  bytes: Uint8Array;
}

function flatten(vectors: ArrayLike<number>[]): { flat: Float64Array; length: number } {
  const length = vectors[0]?.length ?? 0;
  if (vectors.some((v) => v.length !== length)) throw new Error('every root vector must have the same length');
  const flat = new Float64Array(vectors.length * length);
  vectors.forEach((v, k) => flat.set(v, k * length));
  return { flat, length };
}

/**
 * The same as encodeVectors, compressed off the page's main thread (fflate's asynchronous
 * deflate runs in its own worker in browsers), so saving a large vector does not freeze the page.
 */
export function encodeVectorsAsync(vectors: ArrayLike<number>[]): Promise<EncodedVectors> {
  const { flat, length } = flatten(vectors);
  return new Promise((resolve, reject) => {
    deflate(toLittleEndianBytes(flat), { level: 6 }, (error, bytes) => (error ? reject(error) : resolve({ roots: vectors.length, length, bytes })));
  });
}

/** `level` 0 stores without compression (deflate "stored" blocks); tests use it to reach exact sizes. */
export function encodeVectors(vectors: ArrayLike<number>[], level: 0 | 6 | 9 = 6): EncodedVectors {
  const { flat, length } = flatten(vectors);
  return { roots: vectors.length, length, bytes: deflateSync(toLittleEndianBytes(flat), { level }) };
}

/**
 * Inflates and checks: the output must be exactly roots × length values, every one finite.
 * fflate stops quietly when its output buffer is full, so the buffer is one byte longer than
 * expected: a blob that fills it holds too much, and none can expand past it.
 */
export function decodeVectors(bytes: Uint8Array, roots: number, length: number): Float64Array[] {
  const expected = roots * length * 8;
  let raw: Uint8Array;
  try {
    raw = inflateSync(bytes, { out: new Uint8Array(expected + 1) });
  } catch {
    throw new Error('the CI vector data is not valid deflate data of the stated size');
  }
  if (raw.byteLength !== expected) {
    const held = raw.byteLength > expected ? 'more than' : `${raw.byteLength} bytes, not`;
    throw new Error(`the CI vector data holds ${held} the ${expected} bytes of ${roots} × ${length} values`);
  }
  const flat = fromLittleEndianBytes(raw);
  for (let i = 0; i < flat.length; i++) {
    if (!Number.isFinite(flat[i])) throw new Error(`CI vector value ${i} is not a finite number`);
  }
  return Array.from({ length: roots }, (_, k) => flat.slice(k * length, (k + 1) * length));
}

const CHUNK = 0x8000;

/** Base64 (RFC 4648 §4) without Buffer, so the same code runs in the page. */
export function bytesToBase64(bytes: Uint8Array): string {
  let binary = '';
  for (let i = 0; i < bytes.length; i += CHUNK) binary += String.fromCharCode(...bytes.subarray(i, i + CHUNK));
  return btoa(binary);
}

/** True for canonical padded base64 (RFC 4648 §4). A loop, not a regex: the text can be ~20 MB. */
function isBase64(text: string): boolean {
  if (text.length % 4 !== 0) return false;
  const padding = text.endsWith('==') ? 2 : text.endsWith('=') ? 1 : 0;
  for (let i = 0; i < text.length - padding; i++) {
    const c = text.charCodeAt(i);
    const ok = (c >= 65 && c <= 90) || (c >= 97 && c <= 122) || (c >= 48 && c <= 57) || c === 43 || c === 47;
    if (!ok) return false;
  }
  return true;
}

/** Bytes a base64 text decodes to, without decoding it. */
export function base64DecodedLength(text: string): number {
  const padding = text.endsWith('==') ? 2 : text.endsWith('=') ? 1 : 0;
  return Math.floor((text.length * 3) / 4) - padding;
}

export function base64ToBytes(text: string): Uint8Array {
  if (!isBase64(text)) throw new Error('the CI vector data is not base64');
  const binary = atob(text);
  const out = new Uint8Array(binary.length);
  for (let i = 0; i < binary.length; i++) out[i] = binary.charCodeAt(i);
  return out;
}
