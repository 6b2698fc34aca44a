import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ApiClient, cleanUpUsers, closeSequelize, getModels, signUpFresh, tokenFromMail, uniqueSuffix, waitForMailTo, type TestUser } from './helpers';

let user: TestUser;

beforeAll(async () => {
  user = await signUpFresh('reset');
});

afterAll(async () => {
  await cleanUpUsers([user]);
  await closeSequelize();
});

async function requestReset(email: string) {
  return new ApiClient().post('/api/auth/password-reset', { email });
}

describe('password reset', () => {
  it('answers identically for an existing and an unknown e-mail', async () => {
    const known = await requestReset(user.email);
    const unknown = await requestReset(`nobody-${uniqueSuffix()}@it.example`);
    expect(known.status).toBe(202);
    expect(unknown.status).toBe(known.status);
    expect(unknown.body).toEqual(known.body);
    expect(unknown.headers.get('content-type')).toBe(known.headers.get('content-type'));
  });

  it('mails a single-use link that sets a new password', async () => {
    const since = new Date();
    expect((await requestReset(user.email)).status).toBe(202);
    const token = tokenFromMail(await waitForMailTo(user.email, { after: since }), '/reset-password');
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);

    const newPassword = `new-${uniqueSuffix()}-pw`;
    const first = await new ApiClient().post('/api/auth/password-reset/confirm', { token, password: newPassword });
    expect(first.status).toBe(200);

    const again = await new ApiClient().post('/api/auth/password-reset/confirm', { token, password: `other-${uniqueSuffix()}-pw` });
    expect(again.status).toBe(422);
    expect(again.body.error.code).toBe('unprocessable:token');

    expect((await new ApiClient().post('/api/auth/sign-in', { email: user.email, password: newPassword })).status).toBe(200);
    expect((await new ApiClient().post('/api/auth/sign-in', { email: user.email, password: user.password })).status).toBe(401);
    user.password = newPassword;
  });

  it('refuses an expired link and leaves the password alone', async () => {
    const since = new Date();
    await requestReset(user.email);
    const token = tokenFromMail(await waitForMailTo(user.email, { after: since }), '/reset-password');
    const { PasswordReset } = getModels();
    const { createHash } = await import('node:crypto');
    const tokenHash = createHash('sha256').update(token).digest('hex');
    const [changed] = await PasswordReset.update({ expiresAt: new Date(Date.now() - 60_000) }, { where: { tokenHash } });
    expect(changed).toBe(1);

    const reply = await new ApiClient().post('/api/auth/password-reset/confirm', { token, password: `late-${uniqueSuffix()}-pw` });
    expect(reply.status).toBe(422);
    expect((await new ApiClient().post('/api/auth/sign-in', { email: user.email, password: user.password })).status).toBe(200);
  });

  it('refuses a made-up token', async () => {
    const reply = await new ApiClient().post('/api/auth/password-reset/confirm', { token: 'A'.repeat(43), password: 'some long password' });
    expect(reply.status).toBe(422);
  });
});
