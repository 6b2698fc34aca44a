import { ApiError } from '../errors';

/** A saved run's address is 16 base64url characters (12 random bytes); anything else is simply not found. */
export function checkRunId(raw: string): string {
  if (!/^[A-Za-z0-9_-]{16}$/.test(raw)) throw new ApiError('not_found:run');
  return raw;
}
