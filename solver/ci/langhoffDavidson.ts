/**
 * Size-extensivity estimate for truncated CI, the "+Q" correction
 * (Langhoff & Davidson, Int. J. Quantum Chem. 8, 61 (1974)):
 * E ≈ E_CI + (1 − c0²)(E_CI − E_ref), with c0 the reference coefficient of the normalised CI vector.
 */
export function langhoffDavidson(energyCi: number, energyRef: number, c0sq: number): number {
  return energyCi + (1 - c0sq) * (energyCi - energyRef);
}
