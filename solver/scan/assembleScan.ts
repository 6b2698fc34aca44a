import { ANGSTROM_TO_BOHR, HARTREE_TO_INVERSE_CM, HARTREE_TO_KCAL_PER_MOL } from '../constants';
import { toJsonSafe } from '../runFile/jsonSafety';
import { fitMinimum, refineMinimum } from './fitMinimum';
import { followStates } from './followStates';
import type { AssembledScan, PointResult, ScanConstants, ScanCurve, ScanFlag, ScanPlan, SizeExtensivityRow } from './types';

/** A far end whose last step changes the energy by more than this (hartree) is not flat (common practice, no source). */
export const FLAT_END_HARTREE = 1e-5;
/** The neighbour's continued SCF solution lying this far (hartree) above the kept one counts as a switch (common practice, no source). */
export const SWITCH_HARTREE = 1e-6;

export interface AssembleOptions {
  /**
   * One method's energy of one root (energy order at that geometry) at a coordinate value in
   * the scan's units: the extra solver calls of the direct minimisation. The browser routes
   * them to its workers; without it the fitted minimum is reported.
   */
  evaluate?: (methodIndex: number, root: number, value: number) => Promise<number>;
  /** The summed energies of the plan's fragments in one method (energy null, with a note, when it has no counterpart). */
  fragmentEnergy?: (methodIndex: number) => Promise<{ energy: number | null; note: string | null }>;
}

/** The stencil spacing of the direct minimisation: 0.01 bohr or 0.2° (common practice, no source), at most a quarter of the grid step. */
function refineStep(plan: ScanPlan, gridStep: number): number {
  return Math.min(plan.units === 'degree' ? 0.2 : 0.01, gridStep / 4);
}

/**
 * Curves, flags and constants from the plan and its point results (null for a point that has
 * none yet or failed). Pure except for the two callbacks, which make extra solver calls.
 */
export async function assembleScan(plan: ScanPlan, results: (PointResult | null)[], options: AssembleOptions = {}): Promise<AssembledScan> {
  const warnings = [...plan.warnings];
  const flags: ScanFlag[] = [];
  const curves: ScanCurve[] = [];
  const rootAtPointByCurve: (number | null)[][] = [];

  results.forEach((r, p) => {
    if (!r) flags.push({ type: 'not-converged', between: [p, p], message: `point ${p} (${plan.points[p]} ${plan.units}) has no result` });
  });

  for (const method of plan.methods) {
    const followed = followStates(results.map((r) => r?.methods[method.index] ?? null), plan.points, method.index);
    flags.push(...followed.flags);
    followed.rootAtPoint.forEach((roots, c) => {
      curves.push({
        method,
        root: c,
        label: c === 0 ? method.label : `${method.label} root ${c}`,
        energies: roots.map((j, p) => (j === null ? null : results[p]!.methods[method.index].energies[j])),
        rootAtPoint: roots,
        irrep: followed.irreps[c] ?? null,
        multiplicity: followed.multiplicities[c] ?? null,
      });
      rootAtPointByCurve.push(roots);
    });
  }

  if (plan.referenceMethod !== null) {
    for (const curve of curves) {
      const reference = curves.find((c) => c.method.index === plan.referenceMethod && c.root === curve.root);
      if (!reference) continue;
      curve.errors = curve.energies.map((e, p) => (e === null || reference.energies[p] === null ? null : e - reference.energies[p]!));
    }
  }

  // Solution switches: the solution continued from the neighbour is not the one kept.
  for (const reference of ['RHF', 'ROHF', 'UHF'] as const) {
    let prev = -1;
    results.forEach((r, p) => {
      const record = r?.solutions[reference];
      if (!record) return;
      const neighbour = record.candidates.find((c) => c.source === 'neighbour');
      if (prev >= 0 && neighbour) {
        if (!neighbour.converged) {
          flags.push({ type: 'solution-switch', between: [prev, p], message: `${reference}: the solution continued from point ${prev} did not converge at point ${p}; another start was kept` });
        } else if (neighbour.energy! - record.energy > SWITCH_HARTREE) {
          flags.push({
            type: 'solution-switch',
            between: [prev, p],
            message: `${reference}: at point ${p} the solution continued from point ${prev} lies ${(neighbour.energy! - record.energy).toExponential(2)} Eh above the one kept (from the ${record.source} start); the curve changes solution here`,
          });
        }
      }
      prev = p;
    });
  }

  // The Coulson–Fischer point: the RHF triplet (RHF→UHF) Hessian eigenvalue crosses zero.
  let coulsonFischer: AssembledScan['coulsonFischer'] = null;
  {
    let prev = -1;
    for (let p = 0; p < results.length && !coulsonFischer; p++) {
      const now = results[p]?.solutions.RHF?.stability?.rhfToUhf;
      if (now === undefined) continue;
      const before = prev >= 0 ? results[prev]!.solutions.RHF!.stability!.rhfToUhf! : undefined;
      if (before !== undefined && before > 0 && now < 0) {
        const value = plan.points[prev] + ((plan.points[p] - plan.points[prev]) * before) / (before - now);
        coulsonFischer = { value, between: [prev, p] };
        flags.push({
          type: 'coulson-fischer',
          between: [prev, p],
          value,
          message: `RHF becomes unstable towards UHF near ${value.toPrecision(5)} ${plan.units} (the Coulson–Fischer point): beyond it a lower, spin-broken UHF solution exists`,
        });
      }
      prev = p;
    }
  }

  // Constants per curve.
  const toInternal = (value: number) => (plan.units === 'angstrom' ? value * ANGSTROM_TO_BOHR : value);
  const fromInternal = (value: number) => (plan.units === 'angstrom' ? value / ANGSTROM_TO_BOHR : value);
  const fragmentCache = new Map<number, { energy: number | null; note: string | null }>();
  const constants: ScanConstants[] = [];
  for (let k = 0; k < curves.length; k++) {
    const curve = curves[k];
    const roots = rootAtPointByCurve[k];
    const c: ScanConstants = {
      method: curve.method.index,
      root: curve.root,
      Re: null,
      ReUnit: plan.units === 'degree' ? 'degree' : 'bohr',
      Emin: null,
      De: null,
      DeReference: null,
      fragmentEnergy: null,
      omegaE: null,
      curvature: null,
      fit: null,
      nonParallelityError: null,
      maxError: null,
      warnings: [],
    };
    const known = curve.energies.map((e, p) => ({ e, p })).filter((q): q is { e: number; p: number } => q.e !== null);
    const xs = known.map((q) => toInternal(plan.points[q.p]));
    const ys = known.map((q) => q.e);
    const fit = fitMinimum(xs, ys, plan.fit);
    if (!fit.ok) {
      c.warnings.push(`no minimum: ${fit.reason}`);
    } else {
      c.Re = fit.x;
      c.Emin = fit.energy;
      c.curvature = fit.curvature;
      c.fit = plan.fit;
      if (plan.refine && options.evaluate) {
        const order = known.map((q, i) => ({ x: xs[i], p: q.p })).sort((a, b) => a.x - b.x);
        let right = order.findIndex((o) => o.x > fit.x);
        if (right <= 0) right = order.length - 1;
        const lo = order[Math.max(0, right - 2)];
        const hi = order[Math.min(order.length - 1, right + 1)];
        const rootNear = [roots[order[right - 1].p], roots[order[right].p]];
        if (rootNear[0] === null || rootNear[0] !== rootNear[1]) {
          c.warnings.push('the state changes root number at the minimum: the fitted minimum is reported without direct minimisation');
        } else {
          const root = rootNear[0];
          const method = curve.method.index;
          const refined = await refineMinimum((x) => options.evaluate!(method, root, fromInternal(x)), fit.x, {
            step: refineStep(plan, order[right].x - order[right - 1].x),
            lo: lo.x,
            hi: hi.x,
          });
          if ('failure' in refined) c.warnings.push(`${refined.failure}; the fitted minimum is reported`);
          else {
            c.Re = refined.x;
            c.Emin = refined.energy;
            c.curvature = refined.curvature;
            c.fit = `${plan.fit}+refined`;
          }
        }
      }
    }
    if (c.Emin !== null && curve.root === 0) {
      if (plan.dissociation === 'fragments' && options.fragmentEnergy) {
        if (!fragmentCache.has(curve.method.index)) fragmentCache.set(curve.method.index, await options.fragmentEnergy(curve.method.index));
        const fragments = fragmentCache.get(curve.method.index)!;
        if (fragments.note) c.warnings.push(fragments.note);
        if (fragments.energy !== null) {
          c.fragmentEnergy = fragments.energy;
          c.De = fragments.energy - c.Emin;
          c.DeReference = 'fragments';
        }
      } else if (plan.dissociation === 'far-end') {
        const order = known.map((q, i) => ({ x: xs[i], e: q.e })).sort((a, b) => a.x - b.x);
        const last = order[order.length - 1];
        const before = order[order.length - 2];
        c.De = last.e - c.Emin;
        c.DeReference = 'far-end';
        if (Math.abs(last.e - before.e) > FLAT_END_HARTREE) {
          c.warnings.push(
            `the far end is not flat (the last step changes the energy by ${(last.e - before.e).toExponential(2)} Eh): D_e from it is not the dissociation energy`,
          );
        }
      }
    }
    if (c.curvature !== null && c.curvature > 0 && plan.coordinate.type === 'distance' && plan.reducedMassElectron) {
      // Harmonic oscillator: ω = √(k/μ) in atomic units (ħ = 1), an energy in hartree, then a wavenumber.
      c.omegaE = Math.sqrt(c.curvature / plan.reducedMassElectron) * HARTREE_TO_INVERSE_CM;
    }
    if (curve.errors) {
      const errors = curve.errors.filter((e): e is number => e !== null);
      if (errors.length > 0) {
        // Non-parallelity error: the spread of the error along the curve.
        c.nonParallelityError = Math.max(...errors) - Math.min(...errors);
        c.maxError = Math.max(...errors.map(Math.abs));
      }
    }
    constants.push(c);
  }

  let sizeExtensivity: SizeExtensivityRow[] | null = null;
  if (fragmentCache.size > 0) {
    sizeExtensivity = [];
    for (const [method, fragments] of fragmentCache) {
      if (fragments.energy === null) continue;
      const curve = curves.find((cv) => cv.method.index === method && cv.root === 0)!;
      const differences = curve.energies.map((e) => (e === null ? null : e - fragments.energy!));
      sizeExtensivity.push({
        method,
        differenceMilliHartree: differences.map((d) => (d === null ? null : d * 1000)),
        differenceKcalPerMol: differences.map((d) => (d === null ? null : d * HARTREE_TO_KCAL_PER_MOL)),
      });
    }
  }

  const assembled: AssembledScan = {
    format: 'ketbook-scan/1',
    coordinate: plan.coordinate,
    units: plan.units,
    points: plan.points,
    methods: plan.methods,
    curves,
    constants,
    flags,
    coulsonFischer,
    sizeExtensivity,
    warnings,
  };
  return toJsonSafe(assembled) as AssembledScan;
}
