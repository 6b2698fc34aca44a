import { beforeAll, describe, expect, it, vi } from 'vitest';
import type { SolverWorkerApi } from '../../workers/solver.worker';
import type { ProgressEvent } from '../../solver/types';

/**
 * The worker module exposes its API through comlink at load time. Here comlink's expose is
 * replaced by a catcher so the very object the browser talks to can be called directly in Node:
 * what crosses the worker boundary must be plain, structured-cloneable data.
 */
const caught = vi.hoisted(() => ({ api: null as unknown }));
vi.mock('comlink', () => ({
  expose: (api: unknown) => {
    caught.api = api;
  },
}));

let api: SolverWorkerApi;
beforeAll(async () => {
  await import('../../workers/solver.worker');
  api = caught.api as SolverWorkerApi;
});

const h2 = (extra: Record<string, unknown> = {}) => ({
  format: 'ketbook-run/1',
  system: { type: 'molecule', units: 'bohr', atoms: [['H', 0, 0, 0], ['H', 0, 0, 1.4]], charge: 0, multiplicity: 1, basis: 'STO-3G' },
  ci: { space: 'FCI' },
  ...extra,
});

describe('the solver worker API', () => {
  it('is what the worker module exposes', () => {
    expect(typeof api?.run).toBe('function');
    expect(typeof api?.estimate).toBe('function');
  });

  it('estimates without running: H2 STO-3G full CI has 4 determinants', () => {
    const outcome = api.estimate(h2());
    expect(outcome.ok).toBe(true);
    // Two electrons in two spatial orbitals: C(2,1) α strings × C(2,1) β strings = 4 (analytic count).
    if (outcome.ok) expect(outcome.value.determinants).toBe(4);
  });

  it('answers bad input with a bad-input outcome naming the field, never by throwing', () => {
    const outcome = api.estimate(h2({ ci: { space: 'FCI', roots: 0 } }));
    expect(outcome.ok).toBe(false);
    if (outcome.ok) return;
    expect(outcome.error.code).toBe('bad-input');
    const paths = (outcome.error.issues as { path: string }[]).map((i) => i.path);
    // The schema asks for at least one root (solver/runFile/schema.ts); the path is the run file's own.
    expect(paths.some((p) => p.includes('roots'))).toBe(true);
    // The outcome crosses postMessage: it must survive the structured clone unchanged.
    expect(structuredClone(outcome)).toEqual(outcome);
  });

  it('answers an electron count the multiplicity cannot have with bad-input, not a crash', async () => {
    // Two electrons cannot make a doublet: N − (2S+1) + 1 must be even (common practice, no source).
    const outcome = await api.run(h2({ system: { ...h2().system, multiplicity: 2 }, reference: 'ROHF' }));
    expect(outcome.ok).toBe(false);
    if (!outcome.ok) expect(outcome.error.code).toBe('bad-input');
  });

  it('runs H2 full CI and returns a cloneable result', async () => {
    const outcome = await api.run(h2());
    expect(outcome.ok).toBe(true);
    if (!outcome.ok) return;
    // from memory of Szabo & Ostlund (1996) §4.3: H2 STO-3G full CI at R = 1.4 bohr ≈ −1.1373 hartree
    expect(outcome.value.energies.roots[0]).toBeCloseTo(-1.1373, 3);
    expect(structuredClone(outcome.value)).toEqual(outcome.value);
  });

  it('throttles progress across the boundary and never loses the converged SCF iteration', async () => {
    // LiH at 3.015 bohr, STO-3G (a starter system): an SCF of several iterations.
    const lih = h2({ system: { ...h2().system, atoms: [['Li', 0, 0, 0], ['H', 0, 0, 3.015]] } });
    const events: { event: ProgressEvent; atMs: number }[] = [];
    const outcome = await api.run(lih, (event) => events.push({ event, atMs: Date.now() }));
    expect(outcome.ok).toBe(true);
    if (!outcome.ok) return;
    const iterations = outcome.value.scf!.iterations;
    const scfSent = events.filter((e) => e.event.phase === 'scf') as { event: Extract<ProgressEvent, { phase: 'scf' }>; atMs: number }[];
    expect(iterations.length).toBeGreaterThan(3);
    expect(scfSent[0].event.iteration).toBe(iterations[0].iteration);
    expect(scfSent[scfSent.length - 1].event.iteration).toBe(iterations[iterations.length - 1].iteration);
    // The worker's throttle is 100 ms (workers/progressThrottle.ts): over the SCF's span at most
    // the first event, one per full interval, and the held-back last one cross the boundary.
    const spanMs = scfSent[scfSent.length - 1].atMs - scfSent[0].atMs;
    expect(scfSent.length).toBeLessThanOrEqual(2 + Math.floor(spanMs / 100));
    // Phases arrive in pipeline order.
    const phases = [...new Set(events.map((e) => e.event.phase))];
    expect(phases.indexOf('scf')).toBeGreaterThanOrEqual(0);
    expect(phases.indexOf('scf')).toBeLessThan(phases.indexOf('ci-setup'));
  });

  it('keeps the whole CI vectors for saving (a run option outside the run file)', async () => {
    const outcome = await api.run(h2());
    expect(outcome.ok).toBe(true);
    if (!outcome.ok) return;
    const vectors = outcome.value.ci!.vectors;
    expect(vectors).toHaveLength(1);
    // A normalised CI vector over the 4 determinants: Σ c² = 1 (the definition of a normalised state).
    expect(vectors![0]).toHaveLength(4);
    expect(vectors![0].reduce((s, c) => s + c * c, 0)).toBeCloseTo(1, 10);
  });
});
