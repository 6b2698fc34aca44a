import { createHash } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  ApiClient,
  cleanUpUsers,
  closeSequelize,
  getModels,
  makeWorkspace,
  signUpFresh,
  tokenFromMail,
  uniqueSuffix,
  waitForMailTo,
  type TestUser,
} from './helpers';

let owner: TestUser;
let existing: TestUser;
let stranger: TestUser;
let workspace: { id: number; slug: string; name: string };
const created: TestUser[] = [];

beforeAll(async () => {
  owner = await signUpFresh('invowner');
  existing = await signUpFresh('invexisting');
  stranger = await signUpFresh('invstranger');
  workspace = await makeWorkspace(owner, 'inv');
});

afterAll(async () => {
  await cleanUpUsers([owner, existing, stranger, ...created]);
  await closeSequelize();
});

async function invite(email: string, role: 'owner' | 'editor' | 'viewer') {
  const since = new Date();
  const reply = await owner.client.post(`/api/workspaces/${workspace.slug}/invitations`, { email, role });
  expect(reply.status, JSON.stringify(reply.body)).toBe(201);
  const token = tokenFromMail(await waitForMailTo(email, { after: since }), '/invitations/accept');
  return { id: reply.body.invitation.id as number, token };
}

describe('invitation flow', () => {
  it('a new person signs up from the link and joins with the invited role; the link then stops working', async () => {
    const email = `newcomer-${uniqueSuffix()}@it.example`;
    const { token } = await invite(email, 'editor');
    const { Invitation, Membership, User } = getModels();
    const stored = await Invitation.findOne({ where: { workspaceId: workspace.id, email } });
    expect(stored?.tokenHash).toBe(createHash('sha256').update(token).digest('hex'));
    // 7 days, within a minute (the product rule; common practice, no source).
    expect(Math.abs(new Date(stored!.expiresAt).getTime() - Date.now() - 7 * 86400_000)).toBeLessThan(60_000);

    // Signing up with a different e-mail is refused and creates no account.
    const usersBefore = await User.count();
    const wrong = await new ApiClient().post('/api/auth/sign-up', {
      email: `other-${uniqueSuffix()}@it.example`,
      displayName: 'Other',
      password: 'long enough pw',
      invitationToken: token,
    });
    expect(wrong.status).toBe(422);
    expect(wrong.body.error.code).toBe('unprocessable:invitation-email');
    expect(await User.count()).toBe(usersBefore);

    const client = new ApiClient();
    const reply = await client.post('/api/auth/sign-up', { email, displayName: 'Newcomer', password: 'long enough pw', invitationToken: token });
    expect(reply.status, JSON.stringify(reply.body)).toBe(201);
    expect(reply.body.workspace).toEqual({ slug: workspace.slug, role: 'editor' });
    created.push({ id: reply.body.user.id, email, password: 'long enough pw', displayName: 'Newcomer', client });

    const membership = await Membership.findOne({ where: { workspaceId: workspace.id, userId: reply.body.user.id } });
    expect(membership?.role).toBe('editor');
    expect((await client.get(`/api/workspaces/${workspace.slug}`)).body.workspace.access).toBe('editor');

    const reuse = await client.post('/api/invitations/accept', { token });
    expect(reuse.status).toBe(422);
  });

  it('a signed-in user accepts an invitation to their own e-mail; someone else cannot', async () => {
    const { token } = await invite(existing.email, 'viewer');
    const other = await stranger.client.post('/api/invitations/accept', { token });
    expect(other.status).toBe(422);
    expect(other.body.error.code).toBe('unprocessable:invitation-email');

    const anonymous = await new ApiClient().post('/api/invitations/accept', { token });
    expect(anonymous.status).toBe(401);

    const ok = await existing.client.post('/api/invitations/accept', { token });
    expect(ok.status).toBe(200);
    expect(ok.body.workspace).toEqual({ slug: workspace.slug, role: 'viewer' });
    const { Invitation } = getModels();
    const row = await Invitation.findOne({ where: { workspaceId: workspace.id, email: existing.email } });
    expect(row?.acceptedBy).toBe(existing.id);
    expect(row?.acceptedAt).not.toBeNull();
  });

  it('inviting someone who is already a member is 409; a second pending invitation is 409', async () => {
    const member = await owner.client.post(`/api/workspaces/${workspace.slug}/invitations`, { email: owner.email, role: 'viewer' });
    expect(member.status).toBe(409);
    const email = `twice-${uniqueSuffix()}@it.example`;
    await invite(email, 'viewer');
    const second = await owner.client.post(`/api/workspaces/${workspace.slug}/invitations`, { email, role: 'viewer' });
    expect(second.status).toBe(409);
    expect(second.body.error.code).toBe('conflict:invitation');
  });

  it('revoked and expired invitations are refused; unknown tokens are 404', async () => {
    const revokedUser = await signUpFresh('revoked');
    const expiredUser = await signUpFresh('expired');
    created.push(revokedUser, expiredUser);

    const revoked = await invite(revokedUser.email, 'viewer');
    expect((await owner.client.delete(`/api/workspaces/${workspace.slug}/invitations/${revoked.id}`)).status).toBe(200);
    expect((await revokedUser.client.post('/api/invitations/accept', { token: revoked.token })).status).toBe(422);

    const expired = await invite(expiredUser.email, 'viewer');
    await getModels().Invitation.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { id: expired.id } });
    expect((await expiredUser.client.post('/api/invitations/accept', { token: expired.token })).status).toBe(422);

    const { Membership } = getModels();
    expect(await Membership.count({ where: { workspaceId: workspace.id, userId: [revokedUser.id, expiredUser.id] } })).toBe(0);

    const unknown = await expiredUser.client.post('/api/invitations/accept', { token: 'Z'.repeat(43) });
    expect(unknown.status).toBe(404);
  });
});
