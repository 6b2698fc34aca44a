import { createHash, randomBytes } from 'node:crypto';

/** Reset and invitation links carry 32 random bytes; the database keeps only their SHA-256. */
export const TOKEN_BYTES = 32;
export const RESET_TOKEN_LIFETIME_MS = 60 * 60 * 1000;
export const INVITATION_LIFETIME_MS = 7 * 24 * 60 * 60 * 1000;

export function hashToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}

export function createToken(): { token: string; tokenHash: string } {
  const token = randomBytes(TOKEN_BYTES).toString('base64url');
  return { token, tokenHash: hashToken(token) };
}
