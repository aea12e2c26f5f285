/** Audit-log filters (page query string and API). Dates are whole UTC days; `to` is inclusive. */
import { z } from 'zod';

const day = z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'dates are YYYY-MM-DD').transform((s) => new Date(`${s}T00:00:00Z`))
  .refine((d) => !Number.isNaN(d.getTime()), 'not a calendar date');
const empty = (v: unknown) => (v === '' || Array.isArray(v) ? undefined : v);

export const auditFilterSchema = z.object({
  action: z.preprocess(empty, z.string().max(64).optional()),
  text: z.preprocess(empty, z.string().trim().max(100).optional()),
  from: z.preprocess(empty, day.optional()),
  to: z.preprocess(empty, day.transform((d) => new Date(d.getTime() + 86_400_000)).optional()),
  limit: z.preprocess(empty, z.coerce.number().int().min(1).max(1000).optional()),
}).refine((f) => !f.from || !f.to || f.from < f.to, { message: '“From” must be on or before “Until”', path: ['to'] });
