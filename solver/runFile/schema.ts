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

export const ciSchema = z
  .object({
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
  })
  .strict()
  .superRefine((ci, ctx) => {
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
  });

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
  })
  .strict()
  .superRefine((run, ctx) => {
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

/** What a caller writes (defaults may be left out). */
export type RunFileInput = z.input<typeof runFileSchema>;
/** What the solver receives after parsing (defaults filled in). */
export type RunFile = z.output<typeof runFileSchema>;
export type CiSettings = z.output<typeof ciSchema>;
export type ScfSettings = z.output<typeof scfSettingsSchema>;
export type SystemSpec = z.output<typeof systemSchema>;
