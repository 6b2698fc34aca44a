import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createHash, randomBytes } from 'node:crypto';
import {
  addMember,
  ApiClient,
  cleanUpUsers,
  closeSequelize,
  getModels,
  makeAdmin,
  makeWorkspace,
  signUpFresh,
  uniqueSuffix,
  type TestUser,
} from './helpers';
import { parseRunFile } from '@/solver/runFile/parse';
import { runCalculation } from '@/solver/run';
import { encodeVectors } from '@/app/lib/runs/vectorCodec';

// Who may do what is the product rule in app/lib/permissions.ts, written out here by hand
// (common practice, no source): 401 without a session, 404 for outsiders (the workspace is
// not revealed), 403 for a role without the right. Admins who are not members only read.
type Actor = 'anonymous' | 'outsider' | 'viewer' | 'editor' | 'owner' | 'admin';
const ACTORS: Actor[] = ['anonymous', 'outsider', 'viewer', 'editor', 'owner', 'admin'];

interface Row {
  name: string;
  method: 'GET' | 'POST' | 'PATCH' | 'DELETE';
  /** Builds the path and body afresh for each actor, so one actor's change never decides another's status. */
  prepare: () => Promise<{ path: string; body?: unknown }>;
  expected: Record<Actor, number>;
}

let users: Record<Exclude<Actor, 'anonymous'>, TestUser>;
let workspace: { id: number; slug: string };
const extraUsers: TestUser[] = [];

function statuses(anonymous: number, outsider: number, viewer: number, editor: number, owner: number, admin: number) {
  return { anonymous, outsider, viewer, editor, owner, admin };
}

async function freshProjectId(): Promise<number> {
  const { Project } = getModels();
  const p = await Project.create({ workspaceId: workspace.id, name: `p-${uniqueSuffix()}`, description: '', createdBy: users.owner.id });
  return p.id;
}

async function freshMemberId(): Promise<number> {
  const u = await signUpFresh('extra');
  extraUsers.push(u);
  await addMember(workspace.id, u, 'viewer');
  return u.id;
}

async function freshInvitationId(): Promise<number> {
  const { Invitation } = getModels();
  const inv = await Invitation.create({
    workspaceId: workspace.id,
    email: `inv-${uniqueSuffix()}@it.example`,
    role: 'viewer',
    tokenHash: createHash('sha256').update(randomBytes(32).toString('base64url')).digest('hex'),
    invitedBy: users.owner.id,
    expiresAt: new Date(Date.now() + 3600_000),
    acceptedAt: null,
    acceptedBy: null,
    revokedAt: null,
  });
  return inv.id;
}

async function someMailId(): Promise<number> {
  const { MailMessage } = getModels();
  const m = await MailMessage.create({
    messageId: `<matrix-${uniqueSuffix()}@it.example>`,
    envelopeFrom: 'noreply@ketbook.example',
    envelopeTo: 'someone@it.example',
    subject: 'matrix test mail',
    textBody: 'hello',
    htmlBody: null,
    receivedAt: new Date(),
  });
  return m.id;
}

const ws = () => `/api/workspaces/${workspace.slug}`;

// A real H2 STO-3G FCI run (computed once in beforeAll) is what the save row sends.
const h2RunFile = {
  format: 'ketbook-run/1',
  system: { type: 'molecule', units: 'bohr', atoms: [['H', 0, 0, 0], ['H', 0, 0, 1.4]], basis: 'STO-3G' },
  ci: { space: 'FCI' },
};
let h2Result: unknown;

const h2ScanFile = {
  ...h2RunFile,
  ci: undefined,
  scan: { coordinate: { type: 'distance', atoms: [0, 1] }, points: [1.0, 1.4], units: 'bohr' },
  methods: [{ reference: 'RHF' }],
};

async function freshScanId(): Promise<string> {
  const { Scan } = getModels();
  const scan = await Scan.create({
    publicId: randomBytes(12).toString('base64url'),
    workspaceId: workspace.id,
    projectId: null,
    createdBy: users.owner.id,
    title: `matrix scan ${uniqueSuffix()}`,
    systemLabel: 'H2',
    basisLabel: 'STO-3G',
    methodsLabel: 'RHF',
    pointCount: 2,
    scanFileHash: '0'.repeat(64),
    scanFile: JSON.stringify(h2ScanFile),
    summary: null,
  });
  return scan.publicId;
}

async function freshRunId(): Promise<string> {
  const { Run } = getModels();
  const run = await Run.create({
    publicId: randomBytes(12).toString('base64url'),
    workspaceId: workspace.id,
    projectId: null,
    createdBy: users.owner.id,
    title: `matrix run ${uniqueSuffix()}`,
    systemLabel: 'H2',
    basisLabel: 'STO-3G',
    methodLabel: 'RHF · FCI',
    electrons: 2,
    determinantCount: 4,
    energyUnit: 'hartree',
    referenceEnergy: null,
    lowestEnergy: null,
    runFileHash: '0'.repeat(64),
    solverVersion: 'matrix',
    runFile: JSON.stringify(h2RunFile),
    result: JSON.stringify(h2Result),
    ciVector: Buffer.from(encodeVectors([[1, 0, 0, 0]]).bytes),
    ciVectorRoots: 1,
    ciVectorLength: 4,
    ciVectorBytes: encodeVectors([[1, 0, 0, 0]]).bytes.byteLength,
  });
  return run.publicId;
}

const rows: Row[] = [
  { name: 'health', method: 'GET', prepare: async () => ({ path: '/api/health' }), expected: statuses(200, 200, 200, 200, 200, 200) },
  { name: 'me', method: 'GET', prepare: async () => ({ path: '/api/auth/me' }), expected: statuses(401, 200, 200, 200, 200, 200) },
  { name: 'list workspaces', method: 'GET', prepare: async () => ({ path: '/api/workspaces' }), expected: statuses(401, 200, 200, 200, 200, 200) },
  {
    name: 'create workspace',
    method: 'POST',
    prepare: async () => {
      const s = uniqueSuffix();
      return { path: '/api/workspaces', body: { name: `m ${s}`, slug: `m-${s}` } };
    },
    expected: statuses(401, 201, 201, 201, 201, 201),
  },
  { name: 'get workspace', method: 'GET', prepare: async () => ({ path: ws() }), expected: statuses(401, 404, 200, 200, 200, 200) },
  {
    name: 'rename workspace',
    method: 'PATCH',
    prepare: async () => ({ path: ws(), body: { description: `d ${uniqueSuffix()}` } }),
    expected: statuses(401, 404, 403, 403, 200, 403),
  },
  { name: 'list members', method: 'GET', prepare: async () => ({ path: `${ws()}/members` }), expected: statuses(401, 404, 200, 200, 200, 200) },
  {
    name: 'change role',
    method: 'PATCH',
    prepare: async () => ({ path: `${ws()}/members/${await freshMemberId()}`, body: { role: 'editor' } }),
    expected: statuses(401, 404, 403, 403, 200, 403),
  },
  {
    name: 'remove member',
    method: 'DELETE',
    prepare: async () => ({ path: `${ws()}/members/${await freshMemberId()}` }),
    expected: statuses(401, 404, 403, 403, 200, 403),
  },
  { name: 'list invitations', method: 'GET', prepare: async () => ({ path: `${ws()}/invitations` }), expected: statuses(401, 404, 403, 403, 200, 200) },
  {
    name: 'create invitation',
    method: 'POST',
    prepare: async () => ({ path: `${ws()}/invitations`, body: { email: `new-${uniqueSuffix()}@it.example`, role: 'viewer' } }),
    expected: statuses(401, 404, 403, 403, 201, 403),
  },
  {
    name: 'revoke invitation',
    method: 'DELETE',
    prepare: async () => ({ path: `${ws()}/invitations/${await freshInvitationId()}` }),
    expected: statuses(401, 404, 403, 403, 200, 403),
  },
  { name: 'list projects', method: 'GET', prepare: async () => ({ path: `${ws()}/projects` }), expected: statuses(401, 404, 200, 200, 200, 200) },
  {
    name: 'create project',
    method: 'POST',
    prepare: async () => ({ path: `${ws()}/projects`, body: { name: `proj ${uniqueSuffix()}` } }),
    expected: statuses(401, 404, 403, 201, 201, 403),
  },
  {
    name: 'rename project',
    method: 'PATCH',
    prepare: async () => ({ path: `${ws()}/projects/${await freshProjectId()}`, body: { name: `renamed ${uniqueSuffix()}` } }),
    expected: statuses(401, 404, 403, 200, 200, 403),
  },
  {
    name: 'delete project',
    method: 'DELETE',
    prepare: async () => ({ path: `${ws()}/projects/${await freshProjectId()}` }),
    expected: statuses(401, 404, 403, 200, 200, 403),
  },
  { name: 'list runs', method: 'GET', prepare: async () => ({ path: `${ws()}/runs` }), expected: statuses(401, 404, 200, 200, 200, 200) },
  {
    name: 'save run',
    method: 'POST',
    prepare: async () => ({ path: `${ws()}/runs`, body: { title: `saved ${uniqueSuffix()}`, runFile: h2RunFile, result: h2Result } }),
    expected: statuses(401, 404, 403, 201, 201, 403),
  },
  { name: 'open run', method: 'GET', prepare: async () => ({ path: `${ws()}/runs/${await freshRunId()}` }), expected: statuses(401, 404, 200, 200, 200, 200) },
  {
    name: 'run vectors',
    method: 'GET',
    prepare: async () => ({ path: `${ws()}/runs/${await freshRunId()}/vector` }),
    expected: statuses(401, 404, 200, 200, 200, 200),
  },
  {
    name: 'rename or tag run',
    method: 'PATCH',
    prepare: async () => ({ path: `${ws()}/runs/${await freshRunId()}`, body: { title: `renamed ${uniqueSuffix()}`, tags: ['matrix'] } }),
    expected: statuses(401, 404, 403, 200, 200, 403),
  },
  {
    name: 'delete run',
    method: 'DELETE',
    prepare: async () => ({ path: `${ws()}/runs/${await freshRunId()}` }),
    expected: statuses(401, 404, 403, 200, 200, 403),
  },
  { name: 'list scans', method: 'GET', prepare: async () => ({ path: `${ws()}/scans` }), expected: statuses(401, 404, 200, 200, 200, 200) },
  {
    name: 'start scan',
    method: 'POST',
    prepare: async () => ({ path: `${ws()}/scans`, body: { title: `scan ${uniqueSuffix()}`, scanFile: h2ScanFile } }),
    expected: statuses(401, 404, 403, 201, 201, 403),
  },
  { name: 'open scan', method: 'GET', prepare: async () => ({ path: `${ws()}/scans/${await freshScanId()}` }), expected: statuses(401, 404, 200, 200, 200, 200) },
  {
    name: 'finish scan',
    method: 'PATCH',
    prepare: async () => ({ path: `${ws()}/scans/${await freshScanId()}`, body: { status: 'cancelled' } }),
    expected: statuses(401, 404, 403, 200, 200, 403),
  },
  {
    name: 'delete scan',
    method: 'DELETE',
    prepare: async () => ({ path: `${ws()}/scans/${await freshScanId()}` }),
    expected: statuses(401, 404, 403, 200, 200, 403),
  },
  { name: 'outbox list', method: 'GET', prepare: async () => ({ path: '/api/admin/outbox' }), expected: statuses(401, 403, 403, 403, 403, 200) },
  {
    name: 'outbox message',
    method: 'GET',
    prepare: async () => ({ path: `/api/admin/outbox/${await someMailId()}` }),
    expected: statuses(401, 403, 403, 403, 403, 200),
  },
  { name: 'audit log', method: 'GET', prepare: async () => ({ path: '/api/admin/audit' }), expected: statuses(401, 403, 403, 403, 403, 200) },
];

beforeAll(async () => {
  const [outsider, viewer, editor, owner, admin] = await Promise.all(
    ['outsider', 'viewer', 'editor', 'owner', 'admin'].map((label) => signUpFresh(label)),
  );
  users = { outsider, viewer, editor, owner, admin };
  workspace = await makeWorkspace(owner, 'matrix');
  await addMember(workspace.id, viewer, 'viewer');
  await addMember(workspace.id, editor, 'editor');
  await makeAdmin(admin);
  const result = await runCalculation(parseRunFile(h2RunFile));
  h2Result = result;
});

afterAll(async () => {
  const { MailMessage } = getModels();
  await MailMessage.destroy({ where: { subject: 'matrix test mail' } });
  await cleanUpUsers([...Object.values(users ?? {}), ...extraUsers]);
  await closeSequelize();
});

describe('authorisation matrix: each API route × each kind of caller', () => {
  for (const row of rows) {
    for (const actor of ACTORS) {
      it(`${row.method} ${row.name} as ${actor} → ${row.expected[actor]}`, async () => {
        const client = actor === 'anonymous' ? new ApiClient() : users[actor].client;
        const { path, body } = await row.prepare();
        const reply = await client.json(row.method, path, row.method === 'GET' || row.method === 'DELETE' ? undefined : body);
        expect(reply.status, JSON.stringify(reply.body)).toBe(row.expected[actor]);
        if (reply.status >= 400) {
          expect(typeof reply.body.error.code).toBe('string');
          expect(reply.body.error.message.length).toBeGreaterThan(0);
        }
      });
    }
  }

  it('an unknown API path answers with the error JSON and 404', async () => {
    const reply = await users.owner.client.get('/api/no-such-route');
    expect(reply.status).toBe(404);
    expect(reply.body.error.code).toBe('not_found:route');
  });
});
