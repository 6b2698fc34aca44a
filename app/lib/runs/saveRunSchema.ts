import { z } from 'zod';
import { RESULT_FORMAT } from '@/solver/runFile/schema';
import { MAX_TAG_LENGTH, MAX_TAGS_PER_RUN } from './savedRunLimits';
import { VECTOR_ENCODING } from './vectorCodec';

/**
 * What the page sends to save a run. The run file itself is checked by the one run-file
 * schema (parseRunFile) on the server; here it is only "some JSON object". The result has no
 * schema of its own in the solver (it is the solver's output type), so only the parts the
 * server reads or indexes are checked, and the rest is stored as sent.
 */
export const titleField = z
  .string({ error: 'Enter a title.' })
  .trim()
  .min(1, { error: 'Enter a title.' })
  .max(200, { error: 'At most 200 characters.' });

export const tagField = z
  .string({ error: 'A tag is text.' })
  .trim()
  .toLowerCase()
  .min(1, { error: 'A tag cannot be empty.' })
  .max(MAX_TAG_LENGTH, { error: `A tag has at most ${MAX_TAG_LENGTH} characters.` })
  .regex(/^[\p{L}\p{N}][\p{L}\p{N} ._+-]*$/u, { error: 'A tag uses letters, digits, spaces and . _ + - (starting with a letter or digit).' });

export const tagsField = z
  .array(tagField, { error: 'Tags are a list.' })
  .max(MAX_TAGS_PER_RUN, { error: `At most ${MAX_TAGS_PER_RUN} tags.` })
  .transform((tags) => [...new Set(tags)]);

const finite = z.number().refine(Number.isFinite, { error: 'must be a finite number' });

export const savedResultShape = z.looseObject({
  format: z.literal(RESULT_FORMAT, { error: `the result's format must be "${RESULT_FORMAT}"` }),
  energyUnit: z.enum(['hartree', 't']),
  energies: z.looseObject({
    reference: finite,
    roots: z.array(finite).max(50),
  }),
  determinantCount: z.number().int().min(0),
  system: z.looseObject({ electrons: z.number().int().min(0) }),
  ci: z.looseObject({ roots: z.array(z.unknown()).max(50) }).nullable(),
  provenance: z.looseObject({
    solverVersion: z.string().min(1).max(40),
    runFileHash: z.string().regex(/^[0-9a-f]{64}$/, { error: 'must be a SHA-256 hex digest' }),
  }),
});

export const saveRunSchema = z.strictObject({
  title: titleField,
  projectId: z.number().int().positive().nullable().optional(),
  tags: tagsField.optional(),
  runFile: z.looseObject({}, { error: 'The run file must be a JSON object.' }),
  result: savedResultShape,
  vector: z
    .strictObject({
      encoding: z.literal(VECTOR_ENCODING),
      roots: z.number().int().min(1).max(50),
      length: z.number().int().min(1),
      data: z.string().min(1),
    })
    .optional(),
});
export type SaveRunInput = z.infer<typeof saveRunSchema>;

export const updateRunSchema = z
  .strictObject({
    title: titleField.optional(),
    tags: tagsField.optional(),
    projectId: z.number().int().positive().nullable().optional(),
  })
  .refine((v) => v.title !== undefined || v.tags !== undefined || v.projectId !== undefined, { error: 'Change the title, the tags or the project.' });
export type UpdateRunInput = z.infer<typeof updateRunSchema>;

export const RUN_SORT_KEYS = ['created', 'title', 'system', 'method', 'energy', 'determinants'] as const;

/** The run table's query string. */
export const listRunsQuerySchema = z.object({
  q: z.string().trim().max(120).optional(),
  tag: tagField.optional(),
  method: z.string().trim().max(80).optional(),
  projectId: z.coerce.number().int().positive().optional(),
  sort: z.enum(RUN_SORT_KEYS).default('created'),
  dir: z.enum(['asc', 'desc']).default('desc'),
  page: z.coerce.number().int().min(1).max(100_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(20),
});
export type ListRunsQuery = z.infer<typeof listRunsQuerySchema>;
