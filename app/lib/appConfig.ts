import 'server-only';

/**
 * The few settings the web app reads. Until the shared db/config.ts lands, they come
 * straight from the environment with the documented defaults.
 */
export interface AppConfig {
  sessionSecret: string;
  publicUrl: string;
  signInMaxAttempts: number;
  signInWindowSeconds: number;
  trustProxy: boolean;
}

function positiveInt(raw: string | undefined, fallback: number): number {
  const n = Number(raw);
  return Number.isInteger(n) && n > 0 ? n : fallback;
}

export function getAppConfig(): AppConfig {
  const sessionSecret = process.env.KETBOOK_SESSION_SECRET ?? '';
  if (sessionSecret.length < 32) {
    throw new Error('KETBOOK_SESSION_SECRET must be set to at least 32 characters');
  }
  return {
    sessionSecret,
    publicUrl: (process.env.KETBOOK_PUBLIC_URL ?? 'http://127.0.0.1:3000').replace(/\/+$/, ''),
    signInMaxAttempts: positiveInt(process.env.KETBOOK_SIGNIN_MAX_ATTEMPTS, 5),
    signInWindowSeconds: positiveInt(process.env.KETBOOK_SIGNIN_WINDOW_SECONDS, 900),
    trustProxy: process.env.KETBOOK_TRUST_PROXY === '1',
  };
}
