import { describe, expect, it } from 'vitest';
import { signUpSchema } from '@/app/api/auth/sign-up/schema';
import { createWorkspaceSchema } from '@/app/api/workspaces/schema';
import { createInvitationSchema } from '@/app/api/workspaces/[slug]/invitations/schema';
import { ApiError } from '@/app/lib/errors';
import { parseWithSchema } from '@/app/lib/validation';

function fieldsOf(fn: () => unknown): Record<string, string[]> {
  try {
    fn();
  } catch (e) {
    expect(e).toBeInstanceOf(ApiError);
    expect((e as ApiError).status).toBe(400);
    return (e as ApiError).fields ?? {};
  }
  throw new Error('expected a validation error');
}

describe('request validation', () => {
  it('rejects unknown fields by name', () => {
    const fields = fieldsOf(() => parseWithSchema(createInvitationSchema, { email: 'a@b.example', role: 'viewer', admin: true }));
    expect(fields.admin).toEqual(['Unknown field.']);
  });

  it('rejects an unknown role', () => {
    expect(Object.keys(fieldsOf(() => parseWithSchema(createInvitationSchema, { email: 'a@b.example', role: 'boss' })))).toEqual(['role']);
  });

  it('rejects overlong strings at the column sizes', () => {
    // Column sizes: display_name VARCHAR(100), workspaces.name VARCHAR(120), slug VARCHAR(80) (project schema).
    const f1 = fieldsOf(() => parseWithSchema(signUpSchema, { email: 'a@b.example', displayName: 'x'.repeat(101), password: 'long enough pw' }));
    expect(Object.keys(f1)).toEqual(['displayName']);
    const f2 = fieldsOf(() => parseWithSchema(createWorkspaceSchema, { name: 'n'.repeat(121), slug: 'a'.repeat(81) }));
    expect(Object.keys(f2).sort()).toEqual(['name', 'slug']);
  });

  it('refuses passwords bcrypt would truncate (over 72 bytes)', () => {
    // bcrypt uses at most 72 bytes of the key (Provos & Mazières, USENIX 1999).
    const pw = 'é'.repeat(40); // 80 bytes in UTF-8, 40 characters
    expect(Object.keys(fieldsOf(() => parseWithSchema(signUpSchema, { email: 'a@b.example', displayName: 'A', password: pw })))).toEqual(['password']);
  });

  it('rejects wrong types and non-objects', () => {
    expect(Object.keys(fieldsOf(() => parseWithSchema(signUpSchema, { email: 5, displayName: [], password: null }))).sort()).toEqual([
      'displayName',
      'email',
      'password',
    ]);
    expect(() => parseWithSchema(signUpSchema, [1, 2])).toThrow(ApiError);
    expect(() => parseWithSchema(signUpSchema, 'text')).toThrow(ApiError);
  });

  it('trims names and accepts a valid body', () => {
    const v = parseWithSchema(createWorkspaceSchema, { name: '  Larkspur  ', slug: 'lark-spur' });
    expect(v).toEqual({ name: 'Larkspur', slug: 'lark-spur' });
  });

  it('refuses reserved and malformed addresses', () => {
    expect(Object.keys(fieldsOf(() => parseWithSchema(createWorkspaceSchema, { name: 'x', slug: 'new' })))).toEqual(['slug']);
    expect(Object.keys(fieldsOf(() => parseWithSchema(createWorkspaceSchema, { name: 'x', slug: '-bad-' })))).toEqual(['slug']);
    expect(Object.keys(fieldsOf(() => parseWithSchema(createWorkspaceSchema, { name: 'x', slug: 'Has Caps' })))).toEqual(['slug']);
  });
});
