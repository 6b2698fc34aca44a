import { describe, expect, it } from 'vitest';
import { applyProgress, EMPTY_PROGRESS, MAX_PROGRESS_ROWS, describePhase } from '../../../components/run/progressLog';

// The log only re-arranges what the worker posts; expected values are the inputs themselves (common practice, no source).
describe('progress log of a run', () => {
  it('follows the phases and keeps SCF and Davidson iterations in order', () => {
    let log = applyProgress(EMPTY_PROGRESS, { phase: 'integrals', done: 3, total: 10 });
    expect(log.phase).toBe('integrals');
    expect(log.integrals).toEqual({ done: 3, total: 10 });
    log = applyProgress(log, { phase: 'scf', iteration: 1, energyHartree: -1.1, error: 1e-2 });
    log = applyProgress(log, { phase: 'scf', iteration: 2, energyHartree: -1.11, error: 1e-5 });
    log = applyProgress(log, { phase: 'ci-setup', determinants: 63504 });
    log = applyProgress(log, { phase: 'davidson', iteration: 1, energies: [-5.1], residualNorms: [0.3] });
    expect(log.phase).toBe('davidson');
    expect(log.scf.map((s) => s.iteration)).toEqual([1, 2]);
    expect(log.scf[1].energyHartree).toBe(-1.11);
    expect(log.determinants).toBe(63504);
    expect(log.davidson[0]).toEqual({ iteration: 1, energies: [-5.1], residualNorms: [0.3] });
    expect(describePhase(log.phase)).toContain('Davidson');
  });

  it('does not change the previous state (React state stays immutable)', () => {
    const before = applyProgress(EMPTY_PROGRESS, { phase: 'scf', iteration: 1, energyHartree: -1, error: 1 });
    const after = applyProgress(before, { phase: 'scf', iteration: 2, energyHartree: -2, error: 0.1 });
    expect(before.scf).toHaveLength(1);
    expect(after.scf).toHaveLength(2);
    expect(EMPTY_PROGRESS.scf).toHaveLength(0);
  });

  it('keeps only the latest rows of a long run', () => {
    let log = EMPTY_PROGRESS;
    for (let i = 1; i <= MAX_PROGRESS_ROWS + 25; i++) {
      log = applyProgress(log, { phase: 'davidson', iteration: i, energies: [-i], residualNorms: [1 / i] });
    }
    expect(log.davidson).toHaveLength(MAX_PROGRESS_ROWS);
    expect(log.davidson[0].iteration).toBe(26);
    expect(log.davidson[MAX_PROGRESS_ROWS - 1].iteration).toBe(MAX_PROGRESS_ROWS + 25);
  });
});
