import { z } from 'astro/zod';

/**
 * Where a true count comes from: a published work (authors, year, title, venue), or an honest admission that
 * the value is common practice without a source, or recalled from memory and not re-read.
 */
export const countSourceSchema = z.discriminatedUnion('kind', [
  z.object({
    kind: z.literal('published'),
    authors: z.array(z.string().min(1)).min(1),
    year: z.number().int().min(1500).max(2100),
    title: z.string().min(1),
    venue: z.string().min(1),
    note: z.string().optional(),
  }),
  z.object({ kind: z.literal('common-practice'), note: z.string().optional() }),
  z.object({ kind: z.literal('from-memory'), note: z.string().min(1) }),
]);

/** A count's source, as stored in definitions and records. */
export type CountSource = z.infer<typeof countSourceSchema>;
