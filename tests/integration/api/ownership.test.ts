import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addMember, cleanUpUsers, closeSequelize, getModels, makeWorkspace, signUpFresh, type TestUser } from './helpers';

let owner: TestUser;
let second: TestUser;
let workspace: { id: number; slug: string };

beforeAll(async () => {
  owner = await signUpFresh('lastowner');
  second = await signUpFresh('secondowner');
  workspace = await makeWorkspace(owner, 'own');
});

afterAll(async () => {
  await cleanUpUsers([owner, second]);
  await closeSequelize();
});

const members = () => `/api/workspaces/${workspace.slug}/members`;

describe('a workspace always keeps an owner', () => {
  it('the only owner can neither leave nor step down (409), and stays owner', async () => {
    const leave = await owner.client.delete(`${members()}/${owner.id}`);
    expect(leave.status).toBe(409);
    expect(leave.body.error.code).toBe('conflict:last-owner');
    const demote = await owner.client.patch(`${members()}/${owner.id}`, { role: 'editor' });
    expect(demote.status).toBe(409);
    const m = await getModels().Membership.findOne({ where: { workspaceId: workspace.id, userId: owner.id } });
    expect(m?.role).toBe('owner');
  });

  it('with a second owner, the first may step down, and then the second is the last owner', async () => {
    await addMember(workspace.id, second, 'viewer');
    expect((await owner.client.patch(`${members()}/${second.id}`, { role: 'owner' })).status).toBe(200);
    expect((await owner.client.patch(`${members()}/${owner.id}`, { role: 'viewer' })).status).toBe(200);
    expect((await second.client.delete(`${members()}/${second.id}`)).status).toBe(409);
    // A viewer may still leave on their own.
    expect((await owner.client.delete(`${members()}/${owner.id}`)).status).toBe(200);
    expect(await getModels().Membership.count({ where: { workspaceId: workspace.id } })).toBe(1);
  });
});
