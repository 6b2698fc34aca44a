import 'server-only';
import { readSettings } from '@/db/config';

/** The settings the web app reads, taken from the shared db/config.ts. */
export interface AppConfig {
  sessionSecret: string;
  publicUrl: string;
  signInMaxAttempts: number;
  signInWindowSeconds: number;
  trustProxy: boolean;
}

export function getAppConfig(): AppConfig {
  const s = readSettings();
  if (s.sessionSecret.length < 32) {
    throw new Error('KETBOOK_SESSION_SECRET must be set to at least 32 characters');
  }
  return {
    sessionSecret: s.sessionSecret,
    publicUrl: s.publicUrl,
    signInMaxAttempts: s.signInMaxAttempts,
    signInWindowSeconds: s.signInWindowSeconds,
    trustProxy: s.trustProxy,
  };
}
