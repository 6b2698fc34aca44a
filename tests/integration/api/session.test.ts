import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ApiClient, cleanUpUsers, closeSequelize, signUpFresh, type TestUser } from './helpers';

let user: TestUser;

beforeAll(async () => {
  user = await signUpFresh('session');
});

afterAll(async () => {
  await cleanUpUsers([user]);
  await closeSequelize();
});

function sessionCookie(setCookie: string[]): string {
  const c = setCookie.find((v) => v.startsWith('ketbook_session='));
  if (!c) throw new Error(`no session cookie in ${JSON.stringify(setCookie)}`);
  return c;
}

describe('session cookie', () => {
  it('is HttpOnly, SameSite=Lax, site-wide, and Secure only on an https public URL', async () => {
    const client = new ApiClient();
    const reply = await client.post('/api/auth/sign-in', { email: user.email, password: user.password });
    expect(reply.status).toBe(200);
    const cookie = sessionCookie(reply.setCookie);
    // Attribute names are case-insensitive (RFC 6265 §5.2).
    expect(cookie).toMatch(/;\s*HttpOnly/i);
    expect(cookie).toMatch(/;\s*SameSite=Lax/i);
    expect(cookie).toMatch(/;\s*Path=\//i);
    const https = (process.env.KETBOOK_PUBLIC_URL ?? '').startsWith('https://');
    expect(/;\s*Secure/i.test(cookie)).toBe(https);
    // iron-session seals the data (Fe26.2 format); the user id is not readable in the cookie.
    expect(cookie).toMatch(/^ketbook_session=Fe26\.2/);
  });

  it('signs in, reads /me, signs out, and is signed out afterwards', async () => {
    const client = new ApiClient();
    await client.post('/api/auth/sign-in', { email: user.email, password: user.password });
    const me = await client.get('/api/auth/me');
    expect(me.status).toBe(200);
    expect(me.body.user).toMatchObject({ id: user.id, email: user.email, siteRole: 'member' });
    expect(me.body.user.passwordHash).toBeUndefined();

    const out = await client.post('/api/auth/sign-out');
    expect(out.status).toBe(200);
    expect(client.signedIn).toBe(false);
    expect((await client.get('/api/auth/me')).status).toBe(401);
  });

  it('a tampered cookie is not a session', async () => {
    const client = new ApiClient();
    client.setCookieHeader('ketbook_session=Fe26.2**forged**value');
    expect((await client.get('/api/auth/me')).status).toBe(401);
  });

  it('a wrong password and an unknown e-mail get the same 401 reply', async () => {
    const wrong = await new ApiClient().post('/api/auth/sign-in', { email: user.email, password: 'not the password' });
    const unknown = await new ApiClient().post('/api/auth/sign-in', { email: `x-${user.email}`, password: 'not the password' });
    expect(wrong.status).toBe(401);
    expect(unknown.body).toEqual(wrong.body);
  });
});
