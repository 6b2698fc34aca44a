import 'server-only';
import { getIronSession, type SessionOptions } from 'iron-session';
import { cookies } from 'next/headers';
import { getAppConfig } from './appConfig';

export interface SessionData {
  userId?: number;
  /** When the session was created (ms since epoch); sessions older than maxAge are refused. */
  signedInAt?: number;
}

export const SESSION_COOKIE_NAME = 'ketbook_session';
const SESSION_MAX_AGE_SECONDS = 14 * 24 * 60 * 60;

function sessionOptions(): SessionOptions {
  const { sessionSecret, publicUrl } = getAppConfig();
  return {
    password: sessionSecret,
    cookieName: SESSION_COOKIE_NAME,
    ttl: SESSION_MAX_AGE_SECONDS,
    cookieOptions: {
      httpOnly: true,
      sameSite: 'lax',
      // Explicit rather than NODE_ENV-based: Secure only when the site is served over https.
      secure: publicUrl.startsWith('https://'),
      path: '/',
    },
  };
}

/** The iron-session of this request. Only route handlers save or destroy it. */
export async function getSession() {
  return getIronSession<SessionData>(await cookies(), sessionOptions());
}
