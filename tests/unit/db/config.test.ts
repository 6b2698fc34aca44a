import { describe, expect, it } from 'vitest';
import { readSettings } from '../../../db/config';

// The defaults are the foundation's documented conventions (demo ports, loopback, limits).
describe('readSettings', () => {
  it('falls back to the demo defaults', () => {
    const s = readSettings({ KETBOOK_DB_PASSWORD: 'pw', KETBOOK_DATA_DIR: '/nonexistent-ketbook' });
    expect(s.database).toEqual({ host: '127.0.0.1', port: 3307, name: 'ketbook', user: 'ketbook', password: 'pw' });
    expect([s.smtpHost, s.smtpPort]).toEqual(['127.0.0.1', 2525]);
    expect(s.publicUrl).toBe('http://127.0.0.1:3000');
    expect([s.signInMaxAttempts, s.signInWindowSeconds, s.trustProxy, s.distDir]).toEqual([5, 900, false, '.next']);
    expect(s.sessionSecret).toBe('');
  });

  it('reads the test environment and ignores malformed numbers', () => {
    const s = readSettings({
      KETBOOK_DB_PORT: '3308',
      KETBOOK_DB_NAME: 'ketbook_test',
      KETBOOK_DB_PASSWORD: '',
      KETBOOK_SMTP_PORT: '2526',
      KETBOOK_PUBLIC_URL: 'http://127.0.0.1:3100/',
      KETBOOK_SIGNIN_MAX_ATTEMPTS: 'many',
      KETBOOK_SIGNIN_WINDOW_SECONDS: '-3',
      KETBOOK_TRUST_PROXY: '1',
      KETBOOK_DIST_DIR: '.next-test',
      KETBOOK_SESSION_SECRET: 's'.repeat(40),
    });
    expect([s.database.port, s.database.name, s.database.password]).toEqual([3308, 'ketbook_test', '']);
    expect(s.smtpPort).toBe(2526);
    expect(s.publicUrl).toBe('http://127.0.0.1:3100');
    expect([s.signInMaxAttempts, s.signInWindowSeconds]).toEqual([5, 900]);
    expect([s.trustProxy, s.distDir, s.sessionSecret.length]).toEqual([true, '.next-test', 40]);
  });
});
