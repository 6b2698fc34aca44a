/**
 * Password hashing with bcrypt (Provos & Mazières, "A Future-Adaptable Password Scheme",
 * USENIX 1999), via the pure-JS bcryptjs so no native build is needed.
 */
import bcrypt from 'bcryptjs';

/** Work factor 10: about 50–100 ms per hash on one core, the usual floor for interactive sign-in. */
export const BCRYPT_COST = 10;

export async function hashPassword(plainPassword: string): Promise<string> {
  return bcrypt.hash(plainPassword, BCRYPT_COST);
}

/** False (never an exception) for a malformed stored hash, so a bad row reads as a failed sign-in. */
export async function verifyPassword(plainPassword: string, passwordHash: string): Promise<boolean> {
  try {
    return await bcrypt.compare(plainPassword, passwordHash);
  } catch {
    return false;
  }
}
