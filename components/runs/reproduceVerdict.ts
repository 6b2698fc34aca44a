import type { RunResult } from '@/solver/run/result';

/**
 * Comparing a stored result with a fresh computation of the same run file. The tolerance
 * is far above the solver's convergence thresholds (SCF energy 1e-10, Davidson residual 1e-7,
 * whose energy error is of the order of the residual squared) and far below any chemical
 * meaning, so "differs" means a different solver or a different solution, not noise.
 */
export const REPRODUCE_TOLERANCE = 1e-8;

export interface ReproduceLine {
  quantity: string;
  stored: number | null;
  recomputed: number | null;
  difference: number | null;
  verdict: 'reproduced' | 'differs';
}

function line(quantity: string, stored: number | null, recomputed: number | null): ReproduceLine {
  if (stored === null || recomputed === null) {
    return { quantity, stored, recomputed, difference: null, verdict: stored === recomputed ? 'reproduced' : 'differs' };
  }
  const difference = recomputed - stored;
  return { quantity, stored, recomputed, difference, verdict: Math.abs(difference) <= REPRODUCE_TOLERANCE ? 'reproduced' : 'differs' };
}

export function compareResults(stored: RunResult, recomputed: RunResult): ReproduceLine[] {
  const lines = [line('Reference energy', stored.energies.reference, recomputed.energies.reference)];
  const roots = Math.max(stored.energies.roots.length, recomputed.energies.roots.length);
  for (let k = 0; k < roots; k++) {
    lines.push(line(`Root ${k} energy`, stored.energies.roots[k] ?? null, recomputed.energies.roots[k] ?? null));
  }
  if (stored.energies.plusQ !== null || recomputed.energies.plusQ !== null) lines.push(line('+Q energy', stored.energies.plusQ, recomputed.energies.plusQ));
  return lines;
}
