import { describe, expect, it } from 'vitest';
import { ApiError } from '@/app/lib/errors';

// Statuses are the shared API convention of the project (common practice, no source: RFC 9110 meanings).
const cases: [ConstructorParameters<typeof ApiError>[0], number][] = [
  ['bad_request:json', 400],
  ['bad_request:validation', 400],
  ['unauthorized:session', 401],
  ['forbidden:workspace', 403],
  ['not_found:workspace', 404],
  ['conflict:last-owner', 409],
  ['payload_too_large:body', 413],
  ['unprocessable:token', 422],
  ['rate_limited:sign-in', 429],
  ['internal:server', 500],
];

describe('ApiError', () => {
  for (const [code, status] of cases) {
    it(`${code} → ${status}`, () => {
      const e = new ApiError(code);
      expect(e.status).toBe(status);
      expect(e.toJSON().error.code).toBe(code);
      expect(e.toJSON().error.message.length).toBeGreaterThan(5);
    });
  }

  it('carries field messages and headers', () => {
    const e = new ApiError('rate_limited:sign-in', { headers: { 'Retry-After': '30' }, fields: { email: ['x'] } });
    expect(e.headers).toEqual({ 'Retry-After': '30' });
    expect(e.toJSON()).toEqual({ error: { code: 'rate_limited:sign-in', message: e.message, fields: { email: ['x'] } } });
  });
});
