import { z } from 'zod';

/**
 * The run file's `system.basis` and `system.zeta` fields. The layout of the even-tempered and
 * custom objects is Ketbook's own. Element keys are checked against H–Ne when the basis is
 * built (buildBasis), where the molecule is known.
 */

export const STO_NAMES = ['STO-2G', 'STO-3G', 'STO-4G', 'STO-5G', 'STO-6G'] as const;
export type StoName = (typeof STO_NAMES)[number];

/** Limits that keep a run's integral work and memory reasonable. */
export const MAX_PRIMITIVES_PER_SHELL = 30;
export const MAX_EVEN_TEMPERED_COUNT = 20;
export const MAX_SHELLS_PER_ELEMENT = 40;

const positiveExponent = z
  .number()
  .refine(Number.isFinite, 'exponents must be finite numbers')
  .refine((x) => x > 0, 'exponents must be greater than 0');
const finiteCoefficient = z.number().refine(Number.isFinite, 'coefficients must be finite numbers');

const stoNameSchema = z
  .string()
  .refine((s) => STO_NAMES.includes(s.trim().toUpperCase() as StoName), {
    message: `basis must be one of ${STO_NAMES.join(', ')}, or an even-tempered or custom set object`,
  })
  .transform((s) => s.trim().toUpperCase() as StoName);

const evenTemperedSeriesSchema = z
  .object({
    count: z
      .number()
      .int('count must be a whole number')
      .min(1, 'count must be at least 1')
      .max(MAX_EVEN_TEMPERED_COUNT, `count must be at most ${MAX_EVEN_TEMPERED_COUNT}`),
    alpha: positiveExponent,
    beta: z
      .number()
      .refine(Number.isFinite, 'beta must be a finite number')
      .refine((x) => x > 1, 'beta must be greater than 1 (the exponents α·β^k must be distinct)'),
  })
  .strict()
  .refine((s) => Number.isFinite(s.alpha * Math.pow(s.beta, s.count - 1)), 'the largest exponent α·β^(count−1) overflows');

const evenTemperedElementSchema = z
  .object({ s: evenTemperedSeriesSchema.optional(), p: evenTemperedSeriesSchema.optional(), d: evenTemperedSeriesSchema.optional() })
  .strict()
  .refine((e) => e.s || e.p || e.d, 'give at least one of s, p, d for each element');

export const evenTemperedBasisSchema = z
  .object({
    type: z.literal('even-tempered'),
    name: z.string().min(1).max(80).optional(),
    elements: z.record(z.string(), evenTemperedElementSchema),
  })
  .strict();

const customShellSchema = z
  .object({
    shell: z.enum(['s', 'p', 'd', 'sp'], { message: 'shell must be "s", "p", "d" or "sp"' }),
    exponents: z
      .array(positiveExponent)
      .min(1, 'a shell needs at least one exponent')
      .max(MAX_PRIMITIVES_PER_SHELL, `at most ${MAX_PRIMITIVES_PER_SHELL} primitives per shell`),
    coefficients: z.array(finiteCoefficient).min(1).max(MAX_PRIMITIVES_PER_SHELL),
    coefficientsP: z.array(finiteCoefficient).min(1).max(MAX_PRIMITIVES_PER_SHELL).optional(),
  })
  .strict()
  .superRefine((shell, ctx) => {
    if (shell.coefficients.length !== shell.exponents.length) {
      ctx.addIssue({
        code: 'custom',
        path: ['coefficients'],
        message: `${shell.exponents.length} exponents but ${shell.coefficients.length} coefficients`,
      });
    }
    if (shell.shell === 'sp') {
      if (!shell.coefficientsP) {
        ctx.addIssue({ code: 'custom', path: ['coefficientsP'], message: 'an sp shell needs coefficientsP for its p part' });
      } else if (shell.coefficientsP.length !== shell.exponents.length) {
        ctx.addIssue({
          code: 'custom',
          path: ['coefficientsP'],
          message: `${shell.exponents.length} exponents but ${shell.coefficientsP.length} p coefficients`,
        });
      }
    } else if (shell.coefficientsP) {
      ctx.addIssue({ code: 'custom', path: ['coefficientsP'], message: 'coefficientsP belongs to sp shells only' });
    }
    if (shell.coefficients.every((c) => c === 0)) {
      ctx.addIssue({ code: 'custom', path: ['coefficients'], message: 'the coefficients cannot all be zero' });
    }
  });

export const customBasisSchema = z
  .object({
    type: z.literal('custom'),
    name: z.string().min(1, 'give the set a name').max(80),
    elements: z.record(
      z.string(),
      z
        .array(customShellSchema)
        .min(1, 'each element needs at least one shell')
        .max(MAX_SHELLS_PER_ELEMENT, `at most ${MAX_SHELLS_PER_ELEMENT} shells per element`),
    ),
  })
  .strict();

const basisSetObjectSchema = z.discriminatedUnion('type', [evenTemperedBasisSchema, customBasisSchema], {
  error: 'a basis set object needs "type": "even-tempered" or "custom"',
});

/**
 * A name ("STO-3G", any letter case) or a set object. The input is dispatched on its type by
 * hand so that the user sees the messages of the branch they meant, not a generic union error.
 */
export const basisSpecSchema = z
  .union([z.string(), z.looseObject({})], {
    error: `basis must be one of ${STO_NAMES.join(', ')}, or an even-tempered or custom set object`,
  })
  .transform((value, ctx) => {
    const parsed = typeof value === 'string' ? stoNameSchema.safeParse(value) : basisSetObjectSchema.safeParse(value);
    if (!parsed.success) {
      for (const issue of parsed.error.issues) ctx.addIssue({ code: 'custom', path: issue.path, message: issue.message });
      return z.NEVER;
    }
    return parsed.data;
  });

const positiveZeta = z
  .number()
  .refine(Number.isFinite, 'ζ must be a finite number')
  .refine((x) => x > 0, 'ζ must be greater than 0');

/** Slater exponents per element: a bare number (H, He: the 1s shell) or per shell {"1s", "2sp"}. */
export const zetaSchema = z.record(z.string(), z.union([positiveZeta, z.object({ '1s': positiveZeta.optional(), '2sp': positiveZeta.optional() }).strict()]));

export type BasisSpec = z.infer<typeof basisSpecSchema>;
export type EvenTemperedBasisSpec = z.infer<typeof evenTemperedBasisSchema>;
export type CustomBasisSpec = z.infer<typeof customBasisSchema>;
export type CustomShellSpec = z.infer<typeof customShellSchema>;
export type ZetaSpec = z.infer<typeof zetaSchema>;
