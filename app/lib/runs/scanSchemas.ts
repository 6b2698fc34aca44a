import { z } from 'zod';
import { titleField } from './saveRunSchema';

/** A point's result as the page sends it. Only what the server checks is spelled out; the rest is the solver's PointResult, stored as sent. */
export const MAX_SCAN_POINT_JSON_BYTES = 1024 * 1024;

const finite = z.number().refine(Number.isFinite, { error: 'must be a finite number' });

export const scanPointResultShape = z.looseObject({
  value: finite,
  methods: z
    .array(z.looseObject({ energies: z.array(z.number().refine(Number.isFinite, { error: 'must be a finite number' })).max(50) }))
    .min(1)
    .max(40),
});

export const createScanSchema = z.strictObject({
  title: titleField,
  projectId: z.number().int().positive().nullable().optional(),
  scanFile: z.looseObject({}, { error: 'The scan file must be a JSON object.' }),
});

export const saveScanPointSchema = z.strictObject({ result: scanPointResultShape });

export const updateScanSchema = z
  .strictObject({
    title: titleField.optional(),
    status: z.enum(['running', 'done', 'cancelled']).optional(),
    summary: z.looseObject({}).nullable().optional(),
  })
  .refine((v) => v.title !== undefined || v.status !== undefined || v.summary !== undefined, { error: 'Change the title, the status or the summary.' });

export const listScansQuerySchema = z.object({
  q: z.string().trim().max(120).optional(),
  sort: z.enum(['created', 'title']).default('created'),
  dir: z.enum(['asc', 'desc']).default('desc'),
  page: z.coerce.number().int().min(1).max(100_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(20),
});
export type ListScansQuery = z.infer<typeof listScansQuerySchema>;
