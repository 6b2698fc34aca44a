import type { CiSettings, RunFile, ScanMethod } from '../runFile/schema';
import { ANGSTROM_TO_BOHR } from '../constants';
import { badInput } from '../errors';
import { elementBySymbol } from '../system/elements';
import { setCoordinate, closestPair, MIN_ATOM_SEPARATION_BOHR, type Position } from './geometry';
import { reducedMassElectronMasses } from './isotopeMasses';
import type { FragmentPlan, ScanMethodPlan, ScanPlan, ScfReferenceName } from './types';

/** The values from..to by step; the end is kept when the step lands on it to within 1e-9 of a step. */
function rangeValues(from: number, to: number, step: number): number[] {
  const n = Math.floor((to - from) / step + 1e-9) + 1;
  return Array.from({ length: n }, (_, k) => {
    const v = from + k * step;
    // Round away the floating-point drift of k·step (e.g. 0.30000000000000004) at 12 digits.
    return Number(v.toPrecision(12));
  });
}

/** Ketbook's short name of a method, e.g. "RHF", "UHF", "CISD+Q", "CAS(2,2)", "CI(3)". */
export function methodLabel(method: { reference: ScfReferenceName; ci: CiSettings | null; plusQ: boolean; label?: string }): string {
  if (method.label) return method.label;
  if (!method.ci) return method.reference;
  const ci = method.ci;
  let name: string = ci.space;
  if (ci.space === 'CAS' && ci.active) name = `CAS(${ci.active.electrons},${ci.active.orbitals})`;
  if (ci.space === 'CI') name = `CI(${ci.excitationLevel})`;
  if (method.plusQ) name += '+Q';
  if (method.reference !== 'RHF') name = `${method.reference}-${name}`;
  return name;
}

function resolveMethod(method: ScanMethod, index: number, runFile: RunFile, twoS: number): ScanMethodPlan {
  const reference = (method.reference ?? runFile.reference ?? (twoS === 0 ? 'RHF' : 'ROHF')) as ScfReferenceName;
  const { reference: _r, plusQ, label, space, ...ciFields } = method;
  const ci: CiSettings | null = space === undefined ? null : ({ ...ciFields, space } as CiSettings);
  return { index, label: methodLabel({ reference, ci, plusQ, label }), reference, ci, plusQ, roots: ci ? ci.roots : 1 };
}

/** The run file's methods with defaults resolved; without a methods list, its own reference and ci. */
export function planMethods(runFile: RunFile): ScanMethodPlan[] {
  const twoS = runFile.system.type === 'molecule' ? runFile.system.multiplicity - 1 : 0;
  const inputs: ScanMethod[] = runFile.methods ?? [{ ...(runFile.ci ?? {}), reference: runFile.reference, plusQ: false } as ScanMethod];
  return inputs.map((m, k) => resolveMethod(m, k, runFile, twoS));
}

export function withoutScan(runFile: RunFile): RunFile {
  const { scan: _s, methods: _m, ci: _c, ladder: _l, ...rest } = runFile;
  return rest as RunFile;
}

/** Lowest multiplicity an electron count allows: singlet for even, doublet for odd. */
function lowestMultiplicity(electrons: number): number {
  return electrons % 2 === 0 ? 1 : 2;
}

/**
 * The plain run file of one scan point: the molecule with the coordinate set to `value` (in the
 * scan's units), written in the molecule's own units; no scan, methods or ci. Used for the grid
 * and for the extra points of the direct minimisation.
 */
export function scanPointRunFile(runFile: RunFile, value: number, field = 'scan'): RunFile {
  const scan = runFile.scan;
  const system = runFile.system;
  if (!scan || system.type !== 'molecule') throw badInput('the run file has no scan of a molecule', 'scan');
  const systemToBohr = system.units === 'angstrom' ? ANGSTROM_TO_BOHR : 1;
  let target = value;
  if (scan.units !== 'degree') target = (scan.units === 'angstrom' ? value * ANGSTROM_TO_BOHR : value) / systemToBohr;
  const start: Position[] = system.atoms.map((a) => [a[1], a[2], a[3]]);
  const moved = setCoordinate(scan.coordinate, start, target);
  const pair = closestPair(moved);
  if (pair && pair.distance * systemToBohr < MIN_ATOM_SEPARATION_BOHR) {
    throw badInput(`${value} ${scan.units} puts atoms ${pair.i} and ${pair.j} ${(pair.distance * systemToBohr).toPrecision(3)} bohr apart`, field);
  }
  const atoms = system.atoms.map((atom, a) => {
    const entry = [atom[0], moved[a][0], moved[a][1], moved[a][2]] as unknown[];
    if (atom.length === 5) entry.push(atom[4]);
    return entry;
  });
  return { ...withoutScan(runFile), system: { ...system, atoms } } as RunFile;
}

/**
 * Everything a scan will compute, before computing anything: the coordinate values, one plain
 * run file per point, the methods with their defaults, the fragments for D_e and the reduced
 * mass for ω_e. Bad input (atoms that collide, fragments of impossible spin) is refused here,
 * so nothing starts that cannot finish.
 */
export function planScan(runFile: RunFile): ScanPlan {
  const scan = runFile.scan;
  if (!scan) throw badInput('the run file has no scan', 'scan');
  const system = runFile.system;
  if (system.type !== 'molecule') throw badInput('a scan moves atoms: it needs a molecule', 'system.type');
  const warnings: string[] = [];

  const points = scan.points ?? rangeValues(scan.from!, scan.to!, scan.step!);
  const pointRunFiles = points.map((value, k) => scanPointRunFile(runFile, value, scan.points ? `scan.points.${k}` : 'scan.from'));
  const base = withoutScan(runFile);

  const methods = planMethods(runFile);

  let referenceMethod: number | null = scan.referenceMethod ?? null;
  if (referenceMethod === null) {
    const fci = methods.find((m) => m.ci?.space === 'FCI' && !m.ci.frozenCore && !m.ci.deletedVirtuals && !m.ci.ras && !m.ci.irrep);
    referenceMethod = fci && methods.length > 1 ? fci.index : null;
  }

  const dissociation = scan.dissociation ?? (scan.coordinate.type === 'distance' ? 'fragments' : 'none');
  let fragments: FragmentPlan[] | null = null;
  let reducedMassElectron: number | null = null;
  if (scan.coordinate.type === 'distance') {
    const coordinate = scan.coordinate;
    const moving = coordinate.move ?? [coordinate.atoms[1]];
    const specs = scan.fragments ?? [
      { atoms: system.atoms.map((_, a) => a).filter((a) => !moving.includes(a)), charge: 0, multiplicity: undefined },
      { atoms: [...moving].sort((a, b) => a - b), charge: 0, multiplicity: undefined },
    ];
    if (!scan.fragments && system.charge !== 0 && dissociation === 'fragments') {
      throw badInput('a charged molecule needs scan.fragments to say which fragment carries the charge', 'scan.fragments');
    }
    if (scan.fragments) {
      const fixedSide = scan.fragments.findIndex((f) => f.atoms.includes(coordinate.atoms[0]));
      const movedSide = scan.fragments.findIndex((f) => f.atoms.includes(coordinate.atoms[1]));
      if (fixedSide === movedSide) {
        throw badInput('the two atoms of the distance must lie in different fragments', 'scan.fragments');
      }
    }
    const chargeSum = specs.reduce((s, f) => s + f.charge, 0);
    if (chargeSum !== system.charge) {
      throw badInput(`the fragments' charges add up to ${chargeSum}, the molecule's charge is ${system.charge}`, 'scan.fragments');
    }
    fragments = specs.map((spec, f) => {
      const entries = spec.atoms.map((a) => system.atoms[a]);
      const electrons =
        entries.reduce((sum, atom) => sum + (atom.length === 5 && atom[4].ghost ? 0 : elementBySymbol(atom[0]).atomicNumber), 0) - spec.charge;
      if (electrons < 0) throw badInput(`fragment ${f} has charge ${spec.charge} but only ${electrons + spec.charge} electrons`, 'scan.fragments');
      const multiplicity = spec.multiplicity ?? lowestMultiplicity(electrons);
      if ((electrons - (multiplicity - 1)) % 2 !== 0 || multiplicity - 1 > electrons) {
        throw badInput(`fragment ${f} has ${electrons} electrons and cannot have multiplicity ${multiplicity}`, `scan.fragments.${f}.multiplicity`);
      }
      const fragmentRun = {
        ...base,
        reference: undefined,
        system: { ...system, atoms: entries, charge: spec.charge, multiplicity },
      } as RunFile;
      delete (fragmentRun as { reference?: unknown }).reference;
      return { atoms: spec.atoms, charge: spec.charge, multiplicity, runFile: fragmentRun };
    });
    const realSymbols = (atoms: number[]) =>
      atoms.map((a) => system.atoms[a]).filter((atom) => !(atom.length === 5 && atom[4].ghost)).map((atom) => atom[0]);
    const sideA = realSymbols(fragments[0].atoms);
    const sideB = realSymbols(fragments[1].atoms);
    if (sideA.length > 0 && sideB.length > 0) reducedMassElectron = reducedMassElectronMasses(sideA, sideB);
    if (sideA.length + sideB.length > 2) {
      warnings.push('ω_e treats the two fragments as rigid bodies on a line (a pseudo-diatomic): it is not a normal-mode frequency');
    }
  }

  if (points.length < 5) warnings.push('fewer than five points: R_e, E_min, D_e and ω_e need at least five');
  return {
    coordinate: scan.coordinate,
    units: scan.units,
    points,
    pointRunFiles,
    methods,
    referenceMethod,
    dissociation,
    fragments: dissociation === 'fragments' ? fragments : null,
    reducedMassElectron,
    fit: scan.fit,
    refine: scan.refine,
    warnings,
  };
}

/**
 * The same method on a fragment: an open-shell fragment of a closed-shell method gets ROHF
 * orbitals (RHF cannot describe it); CI windows and orbital counts do not carry over, so
 * such methods get no fragment energy (null, with the reason).
 */
export function fragmentMethod(method: ScanMethodPlan, fragment: FragmentPlan): { method: ScanMethodPlan | null; note: string | null } {
  const openShell = fragment.multiplicity > 1;
  let reference: ScfReferenceName = method.reference;
  let note: string | null = null;
  if (reference === 'RHF' && openShell) {
    // A CI on an open-shell fragment needs ROHF orbitals anyway; only for RHF itself is that a change of method.
    reference = 'ROHF';
    if (!method.ci) note = `fragment ${fragment.atoms.join(',')} is open-shell: RHF cannot describe it, so its ROHF energy is used`;
  }
  if (!method.ci) return { method: { ...method, reference, roots: 1 }, note };
  const ci = method.ci;
  if (ci.frozenCore || ci.deletedVirtuals || ci.active || ci.activeOrbitals || ci.ras || ci.irrep || ci.twoMs !== undefined) {
    return { method: null, note: `${method.label}: frozen core, deleted virtuals, windows, RAS limits, irrep and Ms settings do not carry over to fragments` };
  }
  const { targetMultiplicity: _t, ...rest } = ci;
  return { method: { ...method, reference, ci: { ...rest, roots: 1 } as CiSettings, roots: 1 }, note };
}
