/**
 * Shared helpers for the API integration tests: an HTTP client with its own cookie jar
 * and client address, fresh users with random suffixes, and direct DB access for
 * row counts and for putting rows into states (expired, revoked) a test needs.
 */
import { randomBytes } from 'node:crypto';
import http from 'node:http';
import { Op } from 'sequelize';
import { getModels } from '@/models';
import { closeSequelize, getSequelize } from '@/db/connection';

export const BASE_URL = (process.env.KETBOOK_TEST_BASE_URL ?? 'http://127.0.0.1:3100').replace(/\/+$/, '');

export function uniqueSuffix(): string {
  return `${Date.now().toString(36)}${randomBytes(3).toString('hex')}`;
}

/** A documentation-range address (RFC 5737 TEST-NET-3) unique enough per test run. */
export function uniqueAddress(): string {
  const b = randomBytes(2);
  return `203.0.${b[0]}.${b[1]}`;
}

export interface ApiReply<T = any> {
  status: number;
  headers: Headers;
  body: T;
  setCookie: string[];
}

export class ApiClient {
  private cookie: string | null = null;
  constructor(readonly address: string = uniqueAddress()) {}

  get signedIn(): boolean {
    return this.cookie !== null;
  }

  async raw(method: string, path: string, { body, headers = {} }: { body?: BodyInit; headers?: Record<string, string> } = {}): Promise<ApiReply> {
    const response = await fetch(`${BASE_URL}${path}`, {
      method,
      body,
      redirect: 'manual',
      headers: {
        'x-forwarded-for': this.address,
        ...(this.cookie ? { cookie: this.cookie } : {}),
        ...headers,
      },
    });
    const setCookie = response.headers.getSetCookie();
    for (const c of setCookie) {
      const [pair] = c.split(';');
      const [name, value] = pair.split('=');
      if (name.trim() !== 'ketbook_session') continue;
      // An expired or empty cookie is the server signing us out.
      this.cookie = value && !/max-age=0/i.test(c) && !/expires=thu, 01 jan 1970/i.test(c) ? pair : null;
    }
    const text = await response.text();
    let parsed: unknown = null;
    try {
      parsed = text ? JSON.parse(text) : null;
    } catch {
      parsed = text;
    }
    return { status: response.status, headers: response.headers, body: parsed, setCookie };
  }

  json(method: string, path: string, data?: unknown, headers: Record<string, string> = {}): Promise<ApiReply> {
    return this.raw(method, path, {
      body: data === undefined ? undefined : JSON.stringify(data),
      headers: data === undefined ? headers : { 'content-type': 'application/json', ...headers },
    });
  }

  get(path: string) {
    return this.json('GET', path);
  }

  /**
   * A JSON POST on a connection of its own (node:http, no keep-alive pool). For bodies that take
   * seconds to build: fetch would reuse a pooled socket that the server may close after its
   * 5 s keep-alive timeout just as the upload starts, which ends in EPIPE instead of a reply.
   */
  postOnNewConnection(path: string, data: unknown): Promise<ApiReply> {
    const body = JSON.stringify(data);
    const url = new URL(`${BASE_URL}${path}`);
    return new Promise((resolve, reject) => {
      const req = http.request(
        {
          host: url.hostname,
          port: url.port,
          path: url.pathname + url.search,
          method: 'POST',
          agent: false,
          headers: {
            'content-type': 'application/json',
            'content-length': Buffer.byteLength(body),
            'x-forwarded-for': this.address,
            ...(this.cookie ? { cookie: this.cookie } : {}),
          },
        },
        (res) => {
          const chunks: Buffer[] = [];
          res.on('data', (c: Buffer) => chunks.push(c));
          res.on('end', () => {
            const text = Buffer.concat(chunks).toString('utf8');
            let parsed: unknown = text;
            try {
              parsed = text ? JSON.parse(text) : null;
            } catch {
              /* not JSON */
            }
            const headers = new Headers();
            for (const [k, v] of Object.entries(res.headers)) if (typeof v === 'string') headers.set(k, v);
            resolve({ status: res.statusCode ?? 0, headers, body: parsed, setCookie: [] });
          });
        },
      );
      // The server may answer (e.g. 413) and close before the whole body is written; the reply still counts.
      req.on('error', (error) => reject(error));
      req.end(body);
    });
  }

  /** A binary reply (downloads), with this client's cookie. */
  async bytes(path: string): Promise<{ status: number; headers: Headers; bytes: Uint8Array }> {
    const response = await fetch(`${BASE_URL}${path}`, {
      headers: { 'x-forwarded-for': this.address, ...(this.cookie ? { cookie: this.cookie } : {}) },
    });
    return { status: response.status, headers: response.headers, bytes: new Uint8Array(await response.arrayBuffer()) };
  }
  post(path: string, data?: unknown) {
    return this.json('POST', path, data ?? {});
  }
  patch(path: string, data: unknown) {
    return this.json('PATCH', path, data);
  }
  delete(path: string) {
    return this.json('DELETE', path);
  }

  setCookieHeader(value: string | null) {
    this.cookie = value;
  }
}

export interface TestUser {
  id: number;
  email: string;
  password: string;
  displayName: string;
  client: ApiClient;
}

export async function signUpFresh(label: string): Promise<TestUser> {
  const s = uniqueSuffix();
  const email = `${label}-${s}@it.example`;
  const password = `pw-${s}-long`;
  const displayName = `${label} ${s}`;
  const client = new ApiClient();
  const reply = await client.post('/api/auth/sign-up', { email, password, displayName });
  if (reply.status !== 201) throw new Error(`sign-up failed: ${reply.status} ${JSON.stringify(reply.body)}`);
  return { id: reply.body.user.id, email, password, displayName, client };
}

export async function makeWorkspace(owner: TestUser, label = 'ws'): Promise<{ id: number; slug: string; name: string }> {
  const s = uniqueSuffix();
  const reply = await owner.client.post('/api/workspaces', { name: `${label} ${s}`, slug: `${label}-${s}` });
  if (reply.status !== 201) throw new Error(`workspace create failed: ${reply.status} ${JSON.stringify(reply.body)}`);
  return reply.body.workspace;
}

export async function addMember(workspaceId: number, user: TestUser, role: 'owner' | 'editor' | 'viewer') {
  const { Membership } = getModels();
  await Membership.create({ workspaceId, userId: user.id, role });
}

export async function makeAdmin(user: TestUser) {
  const { User } = getModels();
  await User.update({ siteRole: 'admin' }, { where: { id: user.id } });
}

/** Waits for the fake SMTP server to write a mail to `email` into the outbox, and returns its text. */
export async function waitForMailTo(email: string, { after = new Date(0), timeoutMs = 10_000 } = {}): Promise<string> {
  const { MailMessage } = getModels();
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const row = await MailMessage.findOne({
      where: { envelopeTo: { [Op.like]: `%${email}%` }, receivedAt: { [Op.gte]: new Date(after.getTime() - 2000) } },
      order: [['id', 'DESC']],
    });
    if (row) return row.textBody ?? '';
    if (Date.now() > deadline) throw new Error(`no mail to ${email} within ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 200));
  }
}

export function tokenFromMail(text: string, path: string): string {
  const match = text.match(new RegExp(`${path.replace(/[/?]/g, '\\$&')}\\?token=([A-Za-z0-9_-]+)`));
  if (!match) throw new Error(`no ${path} link in mail:\n${text}`);
  return match[1];
}

/** Deletes the users a test made (memberships, resets and the like cascade). */
export async function cleanUpUsers(users: (TestUser | undefined)[]) {
  const { User, Workspace, SignInAttempt } = getModels();
  const ids = users.filter((u): u is TestUser => Boolean(u)).map((u) => u.id);
  const emails = users.filter((u): u is TestUser => Boolean(u)).map((u) => u.email);
  if (ids.length) {
    await Workspace.destroy({ where: { createdBy: ids } });
    await User.destroy({ where: { id: ids } });
    await SignInAttempt.destroy({ where: { email: emails } });
  }
}

export { getModels, closeSequelize, getSequelize };
