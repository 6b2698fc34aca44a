import { ApiError } from '../errors';

/** Saved scans have the same kind of address as runs: 16 base64url characters. */
export function checkScanId(raw: string): string {
  if (!/^[A-Za-z0-9_-]{16}$/.test(raw)) throw new ApiError('not_found:scan');
  return raw;
}
