/**
 * Is a CI space spin-complete, i.e. does it hold, with every determinant, all determinants
 * of the same spatial occupation (same doubly and singly occupied orbitals) and the same
 * M_s? Only then are its eigenvectors pure spin states.
 *
 * The rule. RAS hole/particle limits and the irrep filter depend only on spatial
 * occupations, so they never break completeness. The excitation level does when the
 * reference is high-spin: with regions A = [0, nβ) (doubly occupied in the reference),
 * B = [nβ, nα) (singly occupied, alpha) and C = [nα, n) (empty), a determinant's level is
 * d_B + 2·d_C + s_C + (number of beta electrons among the singly occupied B orbitals),
 * where d_X / s_X count doubly / singly occupied orbitals of region X. Re-coupling spins
 * inside one spatial occupation changes the last count, so the space is incomplete
 * exactly when some occupation's range of levels straddles maxExcitation. We scan all
 * count combinations (d_A, s_A, d_B, s_B, d_C, s_C) for such an occupation. With nα = nβ
 * region B is empty and every excitation-level space is spin-complete.
 * The check ignores RAS and irrep filters, so it may warn for a space that they happen to
 * cut back to completeness (a conservative warning).
 */
import type { CiSpaceSpec } from './spaceSpec';

export interface SpinCompletenessReport {
  warning: boolean;
  message: string | null;
}

export function spinCompleteWarning(spec: CiSpaceSpec): SpinCompletenessReport {
  const L = spec.maxExcitation;
  const nA = Math.min(spec.nAlpha, spec.nBeta);
  const nHigh = Math.max(spec.nAlpha, spec.nBeta);
  if (L === null || nHigh === nA) return { warning: false, message: null };
  const a = nA;
  const b = nHigh - nA;
  const c = spec.nOrbitals - nHigh;
  const electrons = spec.nAlpha + spec.nBeta;
  const unpaired = nHigh - nA; // |2 M_s|
  for (let dB = 0; dB <= b; dB++)
    for (let sB = 0; sB <= b - dB; sB++)
      for (let dC = 0; dC <= c; dC++)
        for (let sC = 0; sC <= c - dC; sC++)
          for (let dA = 0; dA <= a; dA++) {
            const sA = electrons - 2 * (dA + dB + dC) - sB - sC;
            if (sA < 0 || sA > a - dA) continue;
            const open = sA + sB + sC;
            if (open < unpaired || (open - unpaired) % 2 !== 0) continue;
            const minorityOpen = (open - unpaired) / 2; // open-shell electrons of the minority spin
            const lowest = Math.max(0, minorityOpen - (sA + sC));
            const highest = Math.min(sB, minorityOpen);
            const base = dB + 2 * dC + sC;
            if (base + lowest <= L && base + highest > L) {
              return {
                warning: true,
                message:
                  `This excitation-level space from a high-spin reference (${spec.nAlpha} alpha, ${spec.nBeta} beta) is not spin-complete: ` +
                  `some determinants with the same orbital occupations are ${L} excitations away and others ${L + 1}, so the ` +
                  'states found may be spin-contaminated (check ⟨S²⟩). Full CI, a CAS window or a RAS space is spin-complete.',
              };
            }
          }
  return { warning: false, message: null };
}
