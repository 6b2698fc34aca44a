import { z } from 'zod';
import { basisSpecSchema, zetaSchema } from '../basis/schema';

/**
 * The run file: the one JSON document that fully describes a Ketbook run.
 * This schema is the only definition of it — the run builder's form, the API and the
 * command-line runner all validate with it. Every field is documented in DEVELOPERS.md
 * ("The run file"); the names are fixed so that outside scripts can drive Ketbook.
 */

export const RUN_FILE_FORMAT = 'ketbook-run/1';
export const RESULT_FORMAT = 'ketbook-result/1';

/** Default memory budget: 1 GiB fits a desktop browser tab. */
export const DEFAULT_BUDGET_BYTES = 2 ** 30;

const finite = z.number().refine(Number.isFinite, 'must be a finite number');
const count = (max: number, requiredMessage?: string) =>
  z.number({ message: requiredMessage }).int('must be a whole number').min(0).max(max);
const orbitalIndexList = z.array(count(10_000)).max(500);

const ghostMarker = z.object({ ghost: z.boolean() }).strict();
const atomEntry = z.union([
  z.tuple([z.string().min(1).max(3), finite, finite, finite]),
  z.tuple([z.string().min(1).max(3), finite, finite, finite, ghostMarker]),
]);

export const moleculeSystemSchema = z
  .object({
    type: z.literal('molecule'),
    units: z.enum(['bohr', 'angstrom']),
    atoms: z.array(atomEntry).min(1, 'add at least one atom').max(60, 'at most 60 atoms'),
    charge: z.number().int('charge must be a whole number').min(-10).max(20).default(0),
    multiplicity: z.number().int('multiplicity must be a whole number').min(1).max(11).default(1),
    basis: basisSpecSchema,
    zeta: zetaSchema.optional(),
  })
  .strict();

export const hubbardSystemSchema = z
  .object({
    type: z.literal('hubbard'),
    sites: z.number().int().min(2, 'at least 2 sites').max(40),
    periodic: z.boolean().default(false),
    t: finite.default(1),
    U: finite,
    electrons: z.number().int().min(1),
    multiplicity: z.number().int().min(1).max(41).default(1),
  })
  .strict()
  .superRefine((system, ctx) => {
    if (system.periodic && system.sites < 3) {
      ctx.addIssue({ code: 'custom', path: ['periodic'], message: 'a ring needs at least 3 sites' });
    }
    if (system.electrons > 2 * system.sites) {
      ctx.addIssue({ code: 'custom', path: ['electrons'], message: `${system.sites} sites hold at most ${2 * system.sites} electrons` });
    }
  });

export const integralsSystemSchema = z
  .object({
    type: z.literal('integrals'),
    orbitals: z.number().int().min(1).max(200),
    electrons: z.number().int().min(1),
    multiplicity: z.number().int().min(1).max(41).default(1),
    coreEnergy: finite.default(0),
    oneBody: z.array(z.array(finite)),
    twoBody: z.array(z.tuple([count(199), count(199), count(199), count(199), finite])).max(5_000_000),
    /** Overlap of non-orthogonal functions (n×n); present, the functions are orthogonalised before the run (solver/system/integralsFile.ts). */
    overlap: z.array(z.array(finite)).optional(),
  })
  .strict()
  .superRefine((system, ctx) => {
    if (system.electrons > 2 * system.orbitals) {
      ctx.addIssue({ code: 'custom', path: ['electrons'], message: `${system.orbitals} orbitals hold at most ${2 * system.orbitals} electrons` });
    }
  });

export const systemSchema = z.discriminatedUnion('type', [moleculeSystemSchema, hubbardSystemSchema, integralsSystemSchema]);

export const referenceSchema = z.enum(['RHF', 'UHF', 'ROHF']);

export const ciSpaceNames = ['CIS', 'CISD', 'CISDT', 'CISDTQ', 'FCI', 'CAS', 'CI'] as const;

/** The fields of a CI setting; `ciSchema` adds the checks between them. */
const ciFields = {
    space: z.enum(ciSpaceNames),
    /** Only with "space": "CI": the highest excitation level kept (spin orbitals, α and β together). */
    excitationLevel: z.number().int().min(1).max(100).optional(),
    /** The lowest SCF orbitals kept doubly occupied (spatial orbitals). */
    frozenCore: count(500).default(0),
    /** The highest SCF orbitals left out of the CI. */
    deletedVirtuals: count(500).default(0),
    /** CAS window by size: n electrons in m orbitals next to the Fermi level. */
    active: z.object({ electrons: count(200), orbitals: z.number().int().min(1).max(200) }).strict().optional(),
    /** CAS window by choice: 0-based SCF orbital indices (overrides the default window). */
    activeOrbitals: orbitalIndexList.optional(),
    /** RAS-style limits inside the correlated orbitals; indices are 0-based SCF orbital indices. */
    ras: z
      .object({
        ras1: orbitalIndexList.default([]),
        ras3: orbitalIndexList.default([]),
        maxHoles: count(100, 'ras needs maxHoles (0 forbids holes in ras1)'),
        maxParticles: count(100, 'ras needs maxParticles (0 forbids electrons in ras3)'),
      })
      .strict()
      .optional(),
    /** Twice the spin projection Ms; default the reference's 2S (high-spin). */
    twoMs: z.number().int().min(-40).max(40).optional(),
    /** Keep finding roots until `roots` of this multiplicity are found. */
    targetMultiplicity: z.number().int().min(1).max(41).optional(),
    roots: z.number().int().min(1).max(50).default(1),
    /** Restrict the CI to one irreducible representation, e.g. "Ag" (needs a symmetric molecule). */
    irrep: z.string().min(1).max(8).optional(),
    method: z.enum(['auto', 'dense', 'davidson']).default('auto'),
    convergence: z
      .object({
        residualNorm: z.number().positive().max(1e-2).default(1e-7),
        energyChange: z.number().positive().max(1e-2).default(1e-12),
        maxIterations: z.number().int().min(1).max(2000).default(200),
      })
      .strict()
      .optional(),
};

type CiFieldsOutput = z.output<z.ZodObject<typeof ciFields>>;
type CiChecked = Omit<CiFieldsOutput, 'space'> & { space?: CiFieldsOutput['space'] };

/** Checks between CI fields, shared by the run's `ci` and each entry of a scan's `methods`. */
function checkCi(ci: CiChecked, ctx: z.RefinementCtx): void {
  if (ci.space === undefined) return;
  {
    if (ci.space === 'CI' && ci.excitationLevel === undefined) {
      ctx.addIssue({ code: 'custom', path: ['excitationLevel'], message: 'space "CI" needs an excitationLevel' });
    }
    if (ci.space !== 'CI' && ci.excitationLevel !== undefined) {
      ctx.addIssue({
        code: 'custom',
        path: ['excitationLevel'],
        message: `excitationLevel goes only with space "CI"; space "${ci.space}" fixes its own level`,
      });
    }
    if (ci.space !== 'CAS' && (ci.active || ci.activeOrbitals)) {
      ctx.addIssue({ code: 'custom', path: ['active'], message: 'an active window goes with space "CAS"' });
    }
    if (ci.space === 'CAS' && !ci.active) {
      ctx.addIssue({ code: 'custom', path: ['active'], message: 'space "CAS" needs active: { electrons, orbitals }' });
    }
    if (ci.active && ci.activeOrbitals && ci.activeOrbitals.length !== ci.active.orbitals) {
      ctx.addIssue({
        code: 'custom',
        path: ['activeOrbitals'],
        message: `activeOrbitals lists ${ci.activeOrbitals.length} orbitals but active.orbitals is ${ci.active.orbitals}`,
      });
    }
    if (ci.activeOrbitals && new Set(ci.activeOrbitals).size !== ci.activeOrbitals.length) {
      ctx.addIssue({ code: 'custom', path: ['activeOrbitals'], message: 'activeOrbitals lists an orbital twice' });
    }
    if (ci.active && ci.active.electrons > 2 * ci.active.orbitals) {
      ctx.addIssue({ code: 'custom', path: ['active', 'electrons'], message: `${ci.active.orbitals} orbitals hold at most ${2 * ci.active.orbitals} electrons` });
    }
    if (ci.ras && ci.ras.ras1.some((p) => ci.ras!.ras3.includes(p))) {
      ctx.addIssue({ code: 'custom', path: ['ras'], message: 'an orbital cannot be in both ras1 and ras3' });
    }
  }
}

export const ciSchema = z.object(ciFields).strict().superRefine(checkCi);

export const scfSettingsSchema = z
  .object({
    guess: z.enum(['core', 'huckel']).default('huckel'),
    maxIterations: z.number().int().min(1).max(2000).default(200),
    energyTolerance: z.number().positive().max(1e-4).default(1e-10),
    commutatorTolerance: z.number().positive().max(1e-3).default(1e-8),
    diis: z.boolean().default(true),
    /** UHF only: start from a spin-symmetry-broken guess (lets H2 dissociate to two atoms). */
    breakSymmetry: z.boolean().default(false),
    /** Run the orbital-Hessian stability analysis after convergence. */
    stability: z.boolean().default(true),
    /** Follow an instability down to a stable solution (RHF→UHF returns a UHF solution). */
    followInstability: z.boolean().default(false),
  })
  .strict();

export const outputSettingsSchema = z
  .object({
    /** How many leading determinants to list per root. */
    leadingDeterminants: z.number().int().min(1).max(10_000).default(20),
    /** Include the full CI vectors (number arrays) in the result. */
    vectors: z.boolean().default(false),
    /** Include the MO coefficient matrix. */
    orbitals: z.boolean().default(false),
    /** Include the one- and two-particle density matrices of root 0. */
    densities: z.boolean().default(false),
  })
  .strict();

/**
 * One method of a scan: the fields of `ci` with `space` optional (no space means SCF only),
 * the reference it starts from, and `plusQ` for the Langhoff–Davidson-corrected energy of a
 * truncated CI (CISD+Q and the like).
 */
export const scanMethodSchema = z
  .object({
    ...ciFields,
    space: z.enum(ciSpaceNames).optional(),
    reference: referenceSchema.optional(),
    plusQ: z.boolean().default(false),
    /** Free text shown beside the curve, e.g. "CAS(2,2)". */
    label: z.string().min(1).max(60).optional(),
  })
  .strict()
  .superRefine((method, ctx) => {
    checkCi(method, ctx);
    if (method.space === undefined) {
      const ciOnly = (['excitationLevel', 'active', 'activeOrbitals', 'ras', 'twoMs', 'targetMultiplicity', 'irrep'] as const).filter(
        (key) => method[key] !== undefined,
      );
      if (ciOnly.length > 0) {
        ctx.addIssue({ code: 'custom', path: [ciOnly[0]], message: `${ciOnly[0]} is a CI setting: give the method a space, or leave it out for SCF only` });
      }
      if (method.roots > 1) ctx.addIssue({ code: 'custom', path: ['roots'], message: 'an SCF-only method has one root; give a CI space for excited roots' });
    }
    if (method.reference === 'UHF' && method.space !== undefined) {
      ctx.addIssue({ code: 'custom', path: ['space'], message: 'UHF methods are SCF only: CI needs RHF or ROHF orbitals' });
    }
    if (method.plusQ && !(method.space === 'CISD' || method.space === 'CISDT' || method.space === 'CISDTQ' || method.space === 'CI')) {
      ctx.addIssue({ code: 'custom', path: ['plusQ'], message: 'plusQ goes with a truncated CI (CISD, CISDT, CISDTQ or CI with an excitationLevel)' });
    }
    if (method.plusQ && method.roots > 1) {
      ctx.addIssue({ code: 'custom', path: ['roots'], message: 'the +Q correction is for the lowest root only: use roots 1 with plusQ' });
    }
    if (method.plusQ && (method.ras || method.irrep)) {
      ctx.addIssue({ code: 'custom', path: ['plusQ'], message: 'plusQ needs the plain excitation space: no ras limits and no irrep restriction' });
    }
  });

const atomIndex = z.number().int('an atom index is a whole number').min(0, 'atom indices start at 0').max(59);

export const scanCoordinateSchema = z.discriminatedUnion('type', [
  z
    .object({
      type: z.literal('distance'),
      /** The distance from atoms[0] to atoms[1]. */
      atoms: z.tuple([atomIndex, atomIndex]),
      /** The group that moves along the atoms[0]→atoms[1] axis; default [atoms[1]]. */
      move: z.array(atomIndex).min(1).max(59).optional(),
    })
    .strict(),
  z
    .object({
      type: z.literal('stretch'),
      /** Bonds set to the same length together; the second atom of each bond moves along it. */
      bonds: z.array(z.tuple([atomIndex, atomIndex])).min(2, 'a stretch needs at least two bonds; use "distance" for one').max(12),
    })
    .strict(),
  z
    .object({
      type: z.literal('angle'),
      /** The angle atoms[0]–atoms[1]–atoms[2] at atoms[1]. */
      atoms: z.tuple([atomIndex, atomIndex, atomIndex]),
      /** The group rotated about atoms[1]; default [atoms[2]]. */
      move: z.array(atomIndex).min(1).max(59).optional(),
    })
    .strict(),
]);

/** At most this many points per scan: a browser pool should finish a scan in minutes. */
export const MAX_SCAN_POINTS = 2000;

export const scanSchema = z
  .object({
    coordinate: scanCoordinateSchema,
    from: finite.optional(),
    to: finite.optional(),
    step: finite.optional(),
    /** An explicit list of coordinate values instead of from/to/step. */
    points: z.array(finite).min(1).max(MAX_SCAN_POINTS).optional(),
    /** "bohr" or "angstrom" for distances and stretches, "degree" for angles. */
    units: z.enum(['bohr', 'angstrom', 'degree']),
    /** Index into `methods` of the method errors are measured against (default: the first FCI method). */
    referenceMethod: z.number().int().min(0).optional(),
    /** How the minimum is first located: a natural cubic spline through all points, or a quartic over the seven nearest. */
    fit: z.enum(['spline', 'polynomial']).default('spline'),
    /** Refine R_e, E_min and the curvature by extra solver calls around the fitted minimum. */
    refine: z.boolean().default(true),
    /** What D_e is measured against: separately computed fragments (default for a distance), the far end of the scan, or nothing. */
    dissociation: z.enum(['fragments', 'far-end', 'none']).optional(),
    /** The two fragments of a distance scan (default: the moved group and the rest, neutral, lowest spin). */
    fragments: z
      .array(
        z
          .object({
            atoms: z.array(atomIndex).min(1).max(59),
            charge: z.number().int().min(-10).max(20).default(0),
            multiplicity: z.number().int().min(1).max(11).optional(),
          })
          .strict(),
      )
      .length(2, 'give exactly two fragments')
      .optional(),
  })
  .strict()
  .superRefine((scan, ctx) => {
    const ranged = [scan.from, scan.to, scan.step].filter((v) => v !== undefined).length;
    if (scan.points && ranged > 0) {
      ctx.addIssue({ code: 'custom', path: ['points'], message: 'give either points or from, to and step, not both' });
    } else if (!scan.points && ranged < 3) {
      ctx.addIssue({ code: 'custom', path: ['step'], message: 'a scan needs from, to and step (or a points list)' });
    } else if (!scan.points) {
      const { from, to, step } = scan as { from: number; to: number; step: number };
      if (step === 0) ctx.addIssue({ code: 'custom', path: ['step'], message: 'step must not be zero' });
      else if (to !== from && Math.sign(to - from) !== Math.sign(step)) {
        ctx.addIssue({ code: 'custom', path: ['step'], message: `a step of ${step} never goes from ${from} to ${to}` });
      } else if (Math.abs(to - from) / Math.abs(step) + 1 > MAX_SCAN_POINTS + 1e-9) {
        ctx.addIssue({ code: 'custom', path: ['step'], message: `this range and step give more than ${MAX_SCAN_POINTS} points` });
      }
    }
    const values = scan.points ?? (scan.from !== undefined ? [scan.from, scan.to ?? scan.from] : []);
    const isAngle = scan.coordinate.type === 'angle';
    if (isAngle !== (scan.units === 'degree')) {
      ctx.addIssue({
        code: 'custom',
        path: ['units'],
        message: isAngle ? 'an angle scan is in "degree"' : 'a distance or stretch scan is in "bohr" or "angstrom"',
      });
    }
    if (isAngle && values.some((v) => v <= 0 || v > 180)) {
      ctx.addIssue({ code: 'custom', path: [scan.points ? 'points' : 'from'], message: 'angles must lie in (0, 180] degrees' });
    }
    if (!isAngle && values.some((v) => v <= 0)) {
      ctx.addIssue({ code: 'custom', path: [scan.points ? 'points' : 'from'], message: 'distances must be positive' });
    }
    if (scan.points && new Set(scan.points).size !== scan.points.length) {
      ctx.addIssue({ code: 'custom', path: ['points'], message: 'points lists a value twice' });
    }
    if (scan.fragments && scan.coordinate.type !== 'distance') {
      ctx.addIssue({ code: 'custom', path: ['fragments'], message: 'fragments go with a distance scan' });
    }
    if (scan.dissociation === 'fragments' && scan.coordinate.type !== 'distance') {
      ctx.addIssue({ code: 'custom', path: ['dissociation'], message: 'fragment energies go with a distance scan; use "far-end" or "none"' });
    }
  });

export const runFileSchema = z
  .object({
    format: z.literal(RUN_FILE_FORMAT, { message: `format must be "${RUN_FILE_FORMAT}"` }),
    title: z.string().max(200).optional(),
    system: systemSchema,
    reference: referenceSchema.optional(),
    scf: scfSettingsSchema.optional(),
    ci: ciSchema.optional(),
    /** Use the molecule's abelian point group (orbital and root labels, irrep-restricted CI). */
    symmetry: z.boolean().default(true),
    budget: z.object({ memoryBytes: z.number().int().min(1 << 20).max(2 ** 34).default(DEFAULT_BUDGET_BYTES) }).strict().optional(),
    output: outputSettingsSchema.optional(),
    /** A series of runs along a coordinate (DEVELOPERS.md, "Scans"). */
    scan: scanSchema.optional(),
    /** The same system across bases: each method in each basis, as shares of the full-CI correlation energy. */
    ladder: z
      .object({ bases: z.array(basisSpecSchema).min(1, 'list at least one basis').max(12, 'at most 12 bases') })
      .strict()
      .optional(),
    /** The methods run at each scan point or ladder basis; without it the run's own reference and ci. */
    methods: z.array(scanMethodSchema).min(1, 'list at least one method').max(20, 'at most 20 methods').optional(),
  })
  .strict()
  .superRefine((run, ctx) => {
    if (run.methods && !run.scan && !run.ladder) {
      ctx.addIssue({ code: 'custom', path: ['methods'], message: 'a methods list goes with a scan or a ladder' });
    }
    if (run.scan && run.ladder) {
      ctx.addIssue({ code: 'custom', path: ['ladder'], message: 'a run file holds a scan or a ladder, not both' });
    } else if (run.scan) checkScanAgainstRun(run, ctx);
    else if (run.ladder) {
      if (run.system.type !== 'molecule') ctx.addIssue({ code: 'custom', path: ['ladder'], message: 'a ladder changes the basis: it needs a molecule' });
      if (run.methods && run.ci !== undefined) {
        ctx.addIssue({ code: 'custom', path: ['ci'], message: 'with a methods list, put the CI settings in methods' });
      }
      run.methods?.forEach((method, k) => {
        if (method.reference === 'UHF' && method.space !== undefined) {
          ctx.addIssue({ code: 'custom', path: ['methods', k, 'space'], message: 'UHF methods are SCF only: CI needs RHF or ROHF orbitals' });
        }
      });
    }
    if (run.reference === 'UHF' && run.ci) {
      ctx.addIssue({
        code: 'custom',
        path: ['ci'],
        message: 'UHF runs are SCF only: CI needs RHF or ROHF orbitals (use ROHF for an open shell)',
      });
    }
    if (run.system.type === 'molecule' && run.reference === 'RHF' && run.system.multiplicity !== 1) {
      ctx.addIssue({ code: 'custom', path: ['reference'], message: 'RHF needs a singlet; use ROHF or UHF for multiplicity > 1' });
    }
  });

type ScanOutput = z.output<typeof scanSchema>;

/** Checks of a scan that need the rest of the run file: atom indices, fragments, methods. */
function checkScanAgainstRun(
  run: { system: z.output<typeof systemSchema>; scan?: ScanOutput; methods?: z.output<typeof scanMethodSchema>[]; ci?: unknown; reference?: string },
  ctx: z.RefinementCtx,
): void {
  const scan = run.scan!;
  if (run.system.type !== 'molecule') {
    ctx.addIssue({ code: 'custom', path: ['scan'], message: 'a scan moves atoms: it needs a molecule' });
    return;
  }
  const nAtoms = run.system.atoms.length;
  const c = scan.coordinate;
  const named: number[] = c.type === 'stretch' ? c.bonds.flat() : [...c.atoms, ...(c.move ?? [])];
  const outside = named.find((a) => a >= nAtoms);
  if (outside !== undefined) {
    ctx.addIssue({ code: 'custom', path: ['scan', 'coordinate'], message: `atom ${outside} does not exist: the molecule has atoms 0 to ${nAtoms - 1}` });
    return;
  }
  if (c.type === 'distance' || c.type === 'angle') {
    if (new Set(c.atoms).size !== c.atoms.length) {
      ctx.addIssue({ code: 'custom', path: ['scan', 'coordinate', 'atoms'], message: 'the coordinate names an atom twice' });
    }
    const move = c.move ?? [c.atoms[c.atoms.length - 1]];
    const moving = c.atoms[c.atoms.length - 1];
    if (!move.includes(moving)) {
      ctx.addIssue({ code: 'custom', path: ['scan', 'coordinate', 'move'], message: `the moved group must contain atom ${moving}` });
    }
    const fixed = c.atoms.slice(0, -1).find((a) => move.includes(a));
    if (fixed !== undefined) {
      ctx.addIssue({ code: 'custom', path: ['scan', 'coordinate', 'move'], message: `atom ${fixed} defines the coordinate and cannot move with the group` });
    }
  } else {
    const seconds = c.bonds.map((b) => b[1]);
    if (c.bonds.some(([a, b]) => a === b)) {
      ctx.addIssue({ code: 'custom', path: ['scan', 'coordinate', 'bonds'], message: 'a bond joins two different atoms' });
    } else if (new Set(seconds).size !== seconds.length || c.bonds.some(([a]) => seconds.includes(a))) {
      ctx.addIssue({ code: 'custom', path: ['scan', 'coordinate', 'bonds'], message: 'each bond moves its second atom: no atom may move in two bonds or anchor a moving bond' });
    }
  }
  if (scan.fragments) {
    const all = scan.fragments.flatMap((f) => f.atoms);
    if (all.some((a) => a >= nAtoms) || new Set(all).size !== all.length || all.length !== nAtoms) {
      ctx.addIssue({ code: 'custom', path: ['scan', 'fragments'], message: `the two fragments must share the atoms 0 to ${nAtoms - 1} between them, each atom once` });
    }
  }
  if (run.methods && run.ci !== undefined) {
    ctx.addIssue({ code: 'custom', path: ['ci'], message: 'with a methods list, put the CI settings in methods' });
  }
  const methodCount = run.methods?.length ?? 1;
  if (scan.referenceMethod !== undefined && scan.referenceMethod >= methodCount) {
    ctx.addIssue({ code: 'custom', path: ['scan', 'referenceMethod'], message: `there is no method ${scan.referenceMethod}: methods are 0 to ${methodCount - 1}` });
  }
  run.methods?.forEach((method, k) => {
    const reference = method.reference ?? run.reference;
    if (reference === 'RHF' && run.system.type === 'molecule' && run.system.multiplicity !== 1) {
      ctx.addIssue({ code: 'custom', path: ['methods', k, 'reference'], message: 'RHF needs a singlet; use ROHF or UHF for multiplicity > 1' });
    }
    if (reference === 'UHF' && method.space !== undefined) {
      ctx.addIssue({ code: 'custom', path: ['methods', k, 'space'], message: 'UHF methods are SCF only: CI needs RHF or ROHF orbitals' });
    }
  });
}

/** What a caller writes (defaults may be left out). */
export type RunFileInput = z.input<typeof runFileSchema>;
/** What the solver receives after parsing (defaults filled in). */
export type RunFile = z.output<typeof runFileSchema>;
export type CiSettings = z.output<typeof ciSchema>;
export type ScfSettings = z.output<typeof scfSettingsSchema>;
export type SystemSpec = z.output<typeof systemSchema>;
export type ScanSettings = z.output<typeof scanSchema>;
export type ScanMethod = z.output<typeof scanMethodSchema>;
export type ScanCoordinate = z.output<typeof scanCoordinateSchema>;
