import { describe, expect, it } from 'vitest';
import { throttleProgress } from '../../../workers/progressThrottle';
import type { ProgressEvent } from '../../../solver/types';

const scf = (iteration: number): ProgressEvent => ({ phase: 'scf', iteration, energyHartree: -1, error: 1 / iteration });

describe('progress throttling across the worker boundary', () => {
  it('sends the first event of a phase, then at most one per interval, and the last one of each phase', () => {
    let clock = 0;
    const sent: ProgressEvent[] = [];
    const { push, flush } = throttleProgress((e) => sent.push(e), 100, () => clock);
    for (let i = 1; i <= 50; i++) {
      clock += 10; // 50 iterations in 500 ms
      push(scf(i));
    }
    push({ phase: 'ci-setup', determinants: 4 });
    push({ phase: 'davidson', iteration: 1, energies: [-1], residualNorms: [1] });
    clock += 5;
    push({ phase: 'davidson', iteration: 2, energies: [-1], residualNorms: [0.1] });
    flush();
    const scfSent = sent.filter((e) => e.phase === 'scf').map((e) => (e as { iteration: number }).iteration);
    expect(scfSent.length).toBeLessThanOrEqual(7);
    expect(scfSent[0]).toBe(1);
    expect(scfSent[scfSent.length - 1]).toBe(50); // the converged iteration is never lost
    expect(sent.filter((e) => e.phase === 'davidson')).toHaveLength(2);
    expect(sent.map((e) => e.phase).indexOf('ci-setup')).toBeGreaterThan(sent.map((e) => e.phase).lastIndexOf('scf'));
  });
});
