import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ApiClient, cleanUpUsers, closeSequelize, getModels, makeWorkspace, signUpFresh, uniqueSuffix, type TestUser } from './helpers';

// Bad requests must be refused with 4xx, a message, and no row written (common practice, no source).
let owner: TestUser;
let workspace: { id: number; slug: string };

beforeAll(async () => {
  owner = await signUpFresh('bad');
  workspace = await makeWorkspace(owner, 'bad');
});

afterAll(async () => {
  await cleanUpUsers([owner]);
  await closeSequelize();
});

type Counter = () => Promise<number>;
const counters: Record<string, Counter> = {
  users: () => getModels().User.count(),
  workspaces: () => getModels().Workspace.count(),
  projects: () => getModels().Project.count(),
  invitations: () => getModels().Invitation.count(),
};

interface Case {
  name: string;
  path: () => string;
  method?: 'POST' | 'PATCH';
  body: string;
  contentType?: string;
  status: number;
  field?: string;
  count: keyof typeof counters;
  signedIn: boolean;
}

const long = (n: number) => 'x'.repeat(n);
const s = uniqueSuffix();
const cases: Case[] = [
  { name: 'sign-up: malformed JSON', path: () => '/api/auth/sign-up', body: '{"email": "a@b.example",', status: 400, count: 'users', signedIn: false },
  { name: 'sign-up: missing fields', path: () => '/api/auth/sign-up', body: '{}', status: 400, field: 'email', count: 'users', signedIn: false },
  {
    name: 'sign-up: wrong-typed field',
    path: () => '/api/auth/sign-up',
    body: JSON.stringify({ email: `t-${s}@it.example`, displayName: 42, password: 'long enough pw' }),
    status: 400,
    field: 'displayName',
    count: 'users',
    signedIn: false,
  },
  {
    name: 'sign-up: overlong name',
    path: () => '/api/auth/sign-up',
    body: JSON.stringify({ email: `o-${s}@it.example`, displayName: long(101), password: 'long enough pw' }),
    status: 400,
    field: 'displayName',
    count: 'users',
    signedIn: false,
  },
  {
    name: 'sign-up: overlong e-mail',
    path: () => '/api/auth/sign-up',
    body: JSON.stringify({ email: `${long(250)}@it.example`, displayName: 'A', password: 'long enough pw' }),
    status: 400,
    field: 'email',
    count: 'users',
    signedIn: false,
  },
  {
    name: 'sign-up: unknown field (rejected, not ignored)',
    path: () => '/api/auth/sign-up',
    body: JSON.stringify({ email: `u-${s}@it.example`, displayName: 'A', password: 'long enough pw', siteRole: 'admin' }),
    status: 400,
    field: 'siteRole',
    count: 'users',
    signedIn: false,
  },
  { name: 'sign-up: array body', path: () => '/api/auth/sign-up', body: '[1,2,3]', status: 400, count: 'users', signedIn: false },
  {
    name: 'sign-up: body over 64 KiB',
    path: () => '/api/auth/sign-up',
    body: JSON.stringify({ email: `big-${s}@it.example`, displayName: 'A', password: 'long enough pw', pad: long(70_000) }),
    status: 413,
    count: 'users',
    signedIn: false,
  },
  { name: 'workspace: malformed JSON', path: () => '/api/workspaces', body: 'not json', status: 400, count: 'workspaces', signedIn: true },
  {
    name: 'workspace: overlong name',
    path: () => '/api/workspaces',
    body: JSON.stringify({ name: long(121), slug: `ok-${s}` }),
    status: 400,
    field: 'name',
    count: 'workspaces',
    signedIn: true,
  },
  {
    name: 'workspace: bad address',
    path: () => '/api/workspaces',
    body: JSON.stringify({ name: 'Fine', slug: 'Not A Slug' }),
    status: 400,
    field: 'slug',
    count: 'workspaces',
    signedIn: true,
  },
  {
    name: 'project: overlong description',
    path: () => `/api/workspaces/${workspace.slug}/projects`,
    body: JSON.stringify({ name: 'P', description: long(2001) }),
    status: 400,
    field: 'description',
    count: 'projects',
    signedIn: true,
  },
  {
    name: 'project: name of wrong type',
    path: () => `/api/workspaces/${workspace.slug}/projects`,
    body: JSON.stringify({ name: ['P'] }),
    status: 400,
    field: 'name',
    count: 'projects',
    signedIn: true,
  },
  {
    name: 'invitation: unknown role',
    path: () => `/api/workspaces/${workspace.slug}/invitations`,
    body: JSON.stringify({ email: `r-${s}@it.example`, role: 'superuser' }),
    status: 400,
    field: 'role',
    count: 'invitations',
    signedIn: true,
  },
  {
    name: 'invitation: not an e-mail',
    path: () => `/api/workspaces/${workspace.slug}/invitations`,
    body: JSON.stringify({ email: 'nobody', role: 'viewer' }),
    status: 400,
    field: 'email',
    count: 'invitations',
    signedIn: true,
  },
];

describe('bad input is refused and writes nothing', () => {
  for (const c of cases) {
    it(`${c.name} → ${c.status}`, async () => {
      const client = c.signedIn ? owner.client : new ApiClient();
      const before = await counters[c.count]();
      const reply = await client.raw(c.method ?? 'POST', c.path(), {
        body: c.body,
        headers: { 'content-type': c.contentType ?? 'application/json' },
      });
      expect(reply.status, JSON.stringify(reply.body)).toBe(c.status);
      expect(reply.body.error.message.length).toBeGreaterThan(0);
      if (c.field) expect(Object.keys(reply.body.error.fields ?? {})).toContain(c.field);
      expect(await counters[c.count]()).toBe(before);
    });
  }

  it('an unknown role in a role change leaves the membership as it was', async () => {
    const reply = await owner.client.patch(`/api/workspaces/${workspace.slug}/members/${owner.id}`, { role: 'emperor' });
    expect(reply.status).toBe(400);
    expect(reply.body.error.fields.role.length).toBeGreaterThan(0);
    const m = await getModels().Membership.findOne({ where: { workspaceId: workspace.id, userId: owner.id } });
    expect(m?.role).toBe('owner');
  });

  it('a duplicate e-mail at sign-up is 409 and adds no user', async () => {
    const before = await counters.users();
    const reply = await new ApiClient().post('/api/auth/sign-up', { email: owner.email.toUpperCase(), displayName: 'Again', password: 'long enough pw' });
    expect(reply.status).toBe(409);
    expect(reply.body.error.code).toBe('conflict:email');
    expect(await counters.users()).toBe(before);
  });
});
