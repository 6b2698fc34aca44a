import type { BasisSet } from '../types';
import { eriIndex, eriLength } from './eriIndex';
import { prepareShells } from './preparedShells';
import { buildShellPair, hermiteTriples, type ShellPair } from './shellPairs';
import { HermiteCoulomb } from './hermiteCoulomb';

export interface ElectronRepulsionOptions {
  /** Skip shell quartets whose Schwarz bound √(ab|ab)·√(cd|cd) is below this (hartree). */
  schwarzThreshold?: number;
  /** Called after each bra shell pair with quartets done and the total. */
  onProgress?: (done: number, total: number) => void;
}

const TWO_PI_TO_5_2 = 2 * Math.pow(Math.PI, 2.5);

/**
 * Contracts bra and ket Hermite expansions through R_{t+τ,u+ν,v+φ}:
 * (ab|cd) = Σ_prims 2π^{5/2}/(pq√(p+q)) Σ_tuv E^{ab}_tuv Σ_τνφ (−1)^{τ+ν+φ} E^{cd}_τνφ R_{t+τ,u+ν,v+φ}(pq/(p+q), P−Q)
 * (McMurchie & Davidson, J. Comput. Phys. 26, 218 (1978)). Work arrays are allocated once.
 */
class QuartetEngine {
  private readonly coulomb: HermiteCoulomb;
  private readonly r: Float64Array;
  private readonly g: Float64Array;
  private readonly w: Float64Array;
  private readonly indexCache = new Map<number, { index: Int32Array; sign: Float64Array }>();
  private readonly maxL: number;

  constructor(maxPairL: number) {
    this.maxL = 2 * maxPairL;
    this.coulomb = new HermiteCoulomb(this.maxL);
    const d = this.maxL + 1;
    this.r = new Float64Array(d * d * d);
    const maxHermite = ((maxPairL + 1) * (maxPairL + 2) * (maxPairL + 3)) / 6;
    const maxComponents = (((maxPairL + 1) * (maxPairL + 2)) / 2) ** 2;
    this.g = new Float64Array(maxHermite * maxHermite);
    this.w = new Float64Array(maxComponents * maxHermite);
  }

  /** Where G[j][k] reads R for bra Hermite j and ket Hermite k, and the ket sign (−1)^{τ+ν+φ}. */
  private indexTable(lBra: number, lKet: number) {
    const key = lBra * 64 + lKet;
    let entry = this.indexCache.get(key);
    if (!entry) {
      const bra = hermiteTriples(lBra);
      const ket = hermiteTriples(lKet);
      const d = lBra + lKet + 1;
      const nb = bra.length / 3;
      const nk = ket.length / 3;
      const index = new Int32Array(nb * nk);
      const sign = new Float64Array(nk);
      for (let k = 0; k < nk; k++) sign[k] = (ket[3 * k] + ket[3 * k + 1] + ket[3 * k + 2]) % 2 === 0 ? 1 : -1;
      for (let j = 0; j < nb; j++) {
        for (let k = 0; k < nk; k++) {
          index[j * nk + k] = ((bra[3 * j] + ket[3 * k]) * d + (bra[3 * j + 1] + ket[3 * k + 1])) * d + (bra[3 * j + 2] + ket[3 * k + 2]);
        }
      }
      entry = { index, sign };
      this.indexCache.set(key, entry);
    }
    return entry;
  }

  /** Accumulates the (bra|ket) block, [bra component pair][ket component pair], into out (zeroed here). */
  compute(bra: ShellPair, ket: ShellPair, out: Float64Array): void {
    const nCompBra = bra.nComponentsA * bra.nComponentsB;
    const nCompKet = ket.nComponentsA * ket.nComponentsB;
    const nHb = bra.nHermite;
    const nHk = ket.nHermite;
    const L = bra.L + ket.L;
    out.fill(0, 0, nCompBra * nCompKet);
    const { index, sign } = this.indexTable(bra.L, ket.L);
    const r = this.r;
    const g = this.g;
    const w = this.w;
    const eb = bra.hermite;
    const ek = ket.hermite;
    for (let i = 0; i < bra.nPrimitivePairs; i++) {
      const p = bra.p[i];
      const braBase = i * nCompBra * nHb;
      for (let k = 0; k < ket.nPrimitivePairs; k++) {
        const q = ket.p[k];
        const prefactor = (TWO_PI_TO_5_2 / (p * q * Math.sqrt(p + q))) * bra.weight[i] * ket.weight[k];
        this.coulomb.compute(L, (p * q) / (p + q), bra.px[i] - ket.px[k], bra.py[i] - ket.py[k], bra.pz[i] - ket.pz[k], r);
        for (let jb = 0; jb < nHb; jb++) {
          for (let jk = 0; jk < nHk; jk++) g[jb * nHk + jk] = r[index[jb * nHk + jk]] * sign[jk];
        }
        // W[ck][jb] = Σ_jk E^{cd}[ck][jk] G[jb][jk]
        const ketBase = k * nCompKet * nHk;
        for (let ck = 0; ck < nCompKet; ck++) {
          const eRow = ketBase + ck * nHk;
          for (let jb = 0; jb < nHb; jb++) {
            let sum = 0;
            const gRow = jb * nHk;
            for (let jk = 0; jk < nHk; jk++) sum += ek[eRow + jk] * g[gRow + jk];
            w[ck * nHb + jb] = sum;
          }
        }
        for (let cb = 0; cb < nCompBra; cb++) {
          const eRow = braBase + cb * nHb;
          for (let ck = 0; ck < nCompKet; ck++) {
            let sum = 0;
            const wRow = ck * nHb;
            for (let jb = 0; jb < nHb; jb++) sum += eb[eRow + jb] * w[wRow + jb];
            out[cb * nCompKet + ck] += prefactor * sum;
          }
        }
      }
    }
  }
}

/**
 * All two-electron integrals (μν|λσ) in chemists' notation, one per 8-fold class, packed at
 * eriIndex(μ, ν, λ, σ). Loops run over unique shell quartets (pair ab ≥ pair cd), and a
 * quartet is skipped when its Schwarz bound is below the threshold (Häser & Ahlrichs,
 * J. Comput. Chem. 10, 104 (1989)); skipped entries stay 0.
 */
export function electronRepulsionIntegrals(basis: BasisSet, options: ElectronRepulsionOptions = {}): Float64Array {
  const threshold = options.schwarzThreshold ?? 1e-12;
  const shells = prepareShells(basis);
  const eri = new Float64Array(eriLength(basis.nFunctions));
  const maxL = shells.reduce((m, s) => Math.max(m, s.l), 0);
  const engine = new QuartetEngine(2 * maxL);
  const maxComponents = (((maxL + 1) * (maxL + 2)) / 2) ** 2;
  const block = new Float64Array(maxComponents * maxComponents);

  const pairs: ShellPair[] = [];
  for (let a = 0; a < shells.length; a++) for (let b = 0; b <= a; b++) pairs.push(buildShellPair(shells, a, b));

  // Schwarz factors Q_ab = max over components of √(ab|ab).
  const bound = new Float64Array(pairs.length);
  pairs.forEach((pair, i) => {
    engine.compute(pair, pair, block);
    const nComp = pair.nComponentsA * pair.nComponentsB;
    let largest = 0;
    for (let c = 0; c < nComp; c++) largest = Math.max(largest, Math.abs(block[c * nComp + c]));
    bound[i] = Math.sqrt(largest);
  });

  const total = (pairs.length * (pairs.length + 1)) / 2;
  let done = 0;
  for (let ij = 0; ij < pairs.length; ij++) {
    const bra = pairs[ij];
    const sa = shells[bra.a];
    const sb = shells[bra.b];
    for (let kl = 0; kl <= ij; kl++) {
      if (bound[ij] * bound[kl] < threshold) continue;
      const ket = pairs[kl];
      engine.compute(bra, ket, block);
      const sc = shells[ket.a];
      const sd = shells[ket.b];
      const nCompKet = ket.nComponentsA * ket.nComponentsB;
      for (let ca = 0; ca < sa.nComponents; ca++) {
        const mu = sa.offset + ca;
        for (let cb = 0; cb < sb.nComponents; cb++) {
          const nu = sb.offset + cb;
          const rowBase = (ca * sb.nComponents + cb) * nCompKet;
          for (let cc = 0; cc < sc.nComponents; cc++) {
            const lambda = sc.offset + cc;
            for (let cd = 0; cd < sd.nComponents; cd++) {
              eri[eriIndex(mu, nu, lambda, sd.offset + cd)] = block[rowBase + cc * sd.nComponents + cd];
            }
          }
        }
      }
    }
    done += ij + 1;
    options.onProgress?.(done, total);
  }
  return eri;
}
