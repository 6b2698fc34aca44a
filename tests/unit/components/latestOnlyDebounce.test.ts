import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { latestOnlyDebounce } from '../../../components/run/latestOnlyDebounce';

// The behaviour under test is the debounce contract itself (common practice, no source).
describe('latest-only debounce of the live estimate', () => {
  beforeEach(() => vi.useFakeTimers());
  afterEach(() => vi.useRealTimers());

  it('runs once, with the last arguments, after the quiet time', async () => {
    const work = vi.fn(async (n: number) => n * 10);
    const results: number[] = [];
    const d = latestOnlyDebounce(work, (r) => results.push(r), 300);
    d.schedule(1);
    vi.advanceTimersByTime(100);
    d.schedule(2);
    vi.advanceTimersByTime(100);
    d.schedule(3);
    vi.advanceTimersByTime(299);
    expect(work).not.toHaveBeenCalled();
    vi.advanceTimersByTime(1);
    await vi.runAllTimersAsync();
    expect(work).toHaveBeenCalledTimes(1);
    expect(work).toHaveBeenCalledWith(3);
    expect(results).toEqual([30]);
  });

  it('drops an answer that arrives after newer inputs were scheduled', async () => {
    let release: (v: string) => void = () => {};
    const work = vi.fn((arg: string) => (arg === 'slow' ? new Promise<string>((r) => (release = r)) : Promise.resolve(arg)));
    const results: string[] = [];
    const d = latestOnlyDebounce(work, (r) => results.push(r), 50);
    d.schedule('slow');
    vi.advanceTimersByTime(50);
    expect(work).toHaveBeenCalledWith('slow');
    d.schedule('fast');
    release('slow');
    await vi.runAllTimersAsync();
    expect(results).toEqual(['fast']);
  });

  it('reports nothing after cancel', async () => {
    const results: number[] = [];
    const d = latestOnlyDebounce(async (n: number) => n, (r) => results.push(r), 10);
    d.schedule(7);
    d.cancel();
    await vi.runAllTimersAsync();
    expect(results).toEqual([]);
  });

  it('passes a failure of the latest call to onError', async () => {
    const errors: unknown[] = [];
    const d = latestOnlyDebounce(async () => Promise.reject(new Error('boom')), () => {}, 10, { onError: (e) => errors.push(e) });
    d.schedule(undefined);
    await vi.runAllTimersAsync();
    expect(errors).toHaveLength(1);
    expect((errors[0] as Error).message).toBe('boom');
  });
});
