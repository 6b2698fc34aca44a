/**
 * Every setting the server side reads from the environment, with the documented defaults.
 * The one place that knows variable names; scripts, models and the app read from here.
 */
import fs from 'node:fs';
import path from 'node:path';

export interface DatabaseSettings {
  host: string;
  port: number;
  name: string;
  user: string;
  password: string;
}

export interface KetbookSettings {
  database: DatabaseSettings;
  sessionSecret: string;
  smtpHost: string;
  smtpPort: number;
  publicUrl: string;
  signInMaxAttempts: number;
  signInWindowSeconds: number;
  trustProxy: boolean;
  distDir: string;
}

type Env = Record<string, string | undefined>;

/** Folder for local state (`.data/`): the project root is the working directory of every entry point. */
export function dataDir(env: Env = process.env): string {
  // The ignore comments keep the bundler from tracing the whole project for this runtime path.
  return path.resolve(/*turbopackIgnore: true*/ env.KETBOOK_DATA_DIR ?? path.join(/*turbopackIgnore: true*/ process.cwd(), '.data'));
}

function positiveInt(raw: string | undefined, fallback: number): number {
  const n = Number(raw);
  return raw !== undefined && raw !== '' && Number.isInteger(n) && n > 0 ? n : fallback;
}

function readPersisted(file: string): string {
  try {
    return fs.readFileSync(/*turbopackIgnore: true*/ file, 'utf8').trim();
  } catch {
    return '';
  }
}

/**
 * Reads the settings. The database password falls back to the dev password that
 * db/scripts/mariadb.sh persists in `.data/db-password`, so hand-run scripts need no env.
 */
export function readSettings(env: Env = process.env): KetbookSettings {
  return {
    database: {
      host: env.KETBOOK_DB_HOST || '127.0.0.1',
      port: positiveInt(env.KETBOOK_DB_PORT, 3307),
      name: env.KETBOOK_DB_NAME || 'ketbook',
      user: env.KETBOOK_DB_USER || 'ketbook',
      password: env.KETBOOK_DB_PASSWORD ?? readPersisted(path.join(dataDir(env), 'db-password')),
    },
    sessionSecret: env.KETBOOK_SESSION_SECRET ?? '',
    smtpHost: '127.0.0.1',
    smtpPort: positiveInt(env.KETBOOK_SMTP_PORT, 2525),
    publicUrl: (env.KETBOOK_PUBLIC_URL || 'http://127.0.0.1:3000').replace(/\/+$/, ''),
    signInMaxAttempts: positiveInt(env.KETBOOK_SIGNIN_MAX_ATTEMPTS, 5),
    signInWindowSeconds: positiveInt(env.KETBOOK_SIGNIN_WINDOW_SECONDS, 900),
    trustProxy: env.KETBOOK_TRUST_PROXY === '1',
    distDir: env.KETBOOK_DIST_DIR || '.next',
  };
}
