import { describe, expect, it } from 'vitest';
import { clientAddressFrom } from '@/app/lib/clientAddress';
import { linkify } from '@/app/lib/linkify';
import { invitationMail, passwordResetMail } from '@/app/lib/mailTemplates';
import { createToken, hashToken } from '@/app/lib/tokens';
import { slugFromName } from '@/components/workspace/CreateWorkspaceForm';

describe('tokens', () => {
  it('hashes with SHA-256 (FIPS 180-2 test vector for "abc")', () => {
    // FIPS 180-2, Appendix B.1
    expect(hashToken('abc')).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
  });

  it('makes 32-byte base64url tokens (43 characters) stored as 64 hex characters', () => {
    const a = createToken();
    const b = createToken();
    expect(a.token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    expect(Buffer.from(a.token, 'base64url').length).toBe(32);
    expect(a.tokenHash).toMatch(/^[0-9a-f]{64}$/);
    expect(a.tokenHash).toBe(hashToken(a.token));
    expect(a.token).not.toBe(b.token);
  });
});

describe('clientAddressFrom', () => {
  it('uses the first X-Forwarded-For entry only behind a trusted proxy', () => {
    const h = new Headers({ 'x-forwarded-for': '203.0.113.7, 10.0.0.1' });
    expect(clientAddressFrom(h, true)).toBe('203.0.113.7');
    expect(clientAddressFrom(h, false)).toBe('local');
    expect(clientAddressFrom(new Headers(), true)).toBe('local');
  });
});

describe('linkify', () => {
  it('finds links and leaves sentence punctuation outside', () => {
    const pieces = linkify('Open http://127.0.0.1:3100/reset-password?token=ab_c-1. Thanks');
    expect(pieces).toEqual([
      { kind: 'text', text: 'Open ' },
      { kind: 'link', href: 'http://127.0.0.1:3100/reset-password?token=ab_c-1' },
      { kind: 'text', text: '. Thanks' },
    ]);
  });

  it('does not turn other schemes into links', () => {
    expect(linkify('javascript:alert(1) and ftp://x')).toEqual([{ kind: 'text', text: 'javascript:alert(1) and ftp://x' }]);
  });
});

describe('mail templates', () => {
  it('put the link on its own line', () => {
    const link = 'http://127.0.0.1:3100/invitations/accept?token=T';
    const inv = invitationMail({ workspaceName: 'Larkspur', inviterName: 'Ines', role: 'viewer', link, expiresAt: new Date('2026-12-08T10:00:00Z') });
    expect(inv.text.split('\n')).toContain(link);
    expect(inv.subject).toContain('Larkspur');
    expect(inv.text).toContain('2026-12-08 10:00 UTC');
    const reset = passwordResetMail({ displayName: 'Mei', link });
    expect(reset.text.split('\n')).toContain(link);
  });
});

describe('slugFromName', () => {
  it('makes a lower-case hyphenated address', () => {
    expect(slugFromName('Larkspur Correlation Group')).toBe('larkspur-correlation-group');
    expect(slugFromName('  Ångström & Co.  ')).toBe('angstrom-co');
  });
});
