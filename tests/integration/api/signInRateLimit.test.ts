import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ApiClient, cleanUpUsers, closeSequelize, getModels, getSequelize, signUpFresh, uniqueAddress, uniqueSuffix, type TestUser } from './helpers';

// The test server runs with KETBOOK_SIGNIN_MAX_ATTEMPTS=5 and KETBOOK_TRUST_PROXY=1 (tests/run-all.sh).
const MAX = Number(process.env.KETBOOK_SIGNIN_MAX_ATTEMPTS ?? 5);

let victim: TestUser;
let bystander: TestUser;

beforeAll(async () => {
  victim = await signUpFresh('limit');
  bystander = await signUpFresh('bystander');
});

afterAll(async () => {
  await cleanUpUsers([victim, bystander]);
  await closeSequelize();
});

async function signIn(address: string, email: string, password: string) {
  return new ApiClient(address).post('/api/auth/sign-in', { email, password });
}

describe('sign-in rate limit', () => {
  it(`per account: after ${MAX} failures even the right password from another address gets 429 with Retry-After`, async () => {
    for (let i = 0; i < MAX; i++) {
      const reply = await signIn(uniqueAddress(), victim.email, 'wrong password');
      expect(reply.status).toBe(401);
      expect(reply.body.error.code).toBe('unauthorized:credentials');
    }
    const blocked = await signIn(uniqueAddress(), victim.email, victim.password);
    expect(blocked.status).toBe(429);
    expect(blocked.body.error.code).toBe('rate_limited:sign-in');
    const retryAfter = Number(blocked.headers.get('retry-after'));
    expect(Number.isInteger(retryAfter)).toBe(true);
    expect(retryAfter).toBeGreaterThan(0);
    expect(retryAfter).toBeLessThanOrEqual(Number(process.env.KETBOOK_SIGNIN_WINDOW_SECONDS ?? 900));

    const { SignInAttempt } = getModels();
    expect(await SignInAttempt.count({ where: { email: victim.email, succeeded: false } })).toBe(MAX);
    expect(await SignInAttempt.count({ where: { email: victim.email, succeeded: true } })).toBe(0);
  });

  it(`per address: ${MAX} failures from one address block that address, not others`, async () => {
    const address = uniqueAddress();
    for (let i = 0; i < MAX; i++) {
      const reply = await signIn(address, `nobody-${uniqueSuffix()}@it.example`, 'whatever');
      expect(reply.status).toBe(401);
    }
    const blocked = await signIn(address, bystander.email, bystander.password);
    expect(blocked.status).toBe(429);
    expect(Number(blocked.headers.get('retry-after'))).toBeGreaterThan(0);

    const elsewhere = await signIn(uniqueAddress(), bystander.email, bystander.password);
    expect(elsewhere.status).toBe(200);
    expect(elsewhere.body.user.email).toBe(bystander.email);

    const { SignInAttempt } = getModels();
    expect(await SignInAttempt.count({ where: { clientAddress: address, succeeded: false } })).toBe(MAX);
  });

  it('failures that have left the window no longer count', async () => {
    const address = uniqueAddress();
    for (let i = 0; i < MAX; i++) await signIn(address, bystander.email, 'wrong password');
    expect((await signIn(address, bystander.email, bystander.password)).status).toBe(429);
    // Move those failures out of the window (older than the window length).
    const windowSeconds = Number(process.env.KETBOOK_SIGNIN_WINDOW_SECONDS ?? 900);
    // Raw SQL: Sequelize's update() does not write created_at.
    await getSequelize().query('UPDATE sign_in_attempts SET created_at = ? WHERE client_address = ?', {
      replacements: [new Date(Date.now() - (windowSeconds + 60) * 1000), address],
    });
    expect((await signIn(address, bystander.email, bystander.password)).status).toBe(200);
  });
});
