import { describe, expect, it } from 'vitest';
import { retryAfterSeconds } from '@/app/lib/rateLimit';

const now = new Date('2026-12-01T12:00:00Z');
const ago = (s: number) => new Date(now.getTime() - s * 1000);

describe('retryAfterSeconds (sliding window; common practice, no source)', () => {
  it('allows fewer than max failures', () => {
    expect(retryAfterSeconds({ failureTimes: [ago(10), ago(20), ago(30), ago(40)], max: 5, windowSeconds: 900, now })).toBeNull();
  });

  it('blocks at max failures until the oldest counted one leaves the window', () => {
    const times = [ago(100), ago(200), ago(300), ago(400), ago(500)];
    // The oldest failure (500 s ago) leaves a 900 s window in 400 s.
    expect(retryAfterSeconds({ failureTimes: times, max: 5, windowSeconds: 900, now })).toBe(400);
  });

  it('with more than max failures, waits for enough of them to leave', () => {
    const times = [ago(10), ago(20), ago(30), ago(40), ago(50), ago(600), ago(800)];
    // Seven failures, max 5: the window must drop to four, so the third-oldest (50 s ago) must leave: 850 s.
    expect(retryAfterSeconds({ failureTimes: times, max: 5, windowSeconds: 900, now })).toBe(850);
  });

  it('rounds partial seconds up so the client never retries too early', () => {
    const times = Array.from({ length: 3 }, () => new Date(now.getTime() - 899_500));
    expect(retryAfterSeconds({ failureTimes: times, max: 3, windowSeconds: 900, now })).toBe(1);
  });
});
