import { z } from 'astro/zod';

/** Bibliographic fields for a BibTeX entry of a published source: a journal article or a book. */
export const bibFieldsSchema = z.discriminatedUnion('type', [
  z.object({ type: z.literal('article'), journal: z.string().min(1), volume: z.string().min(1).optional(), number: z.string().min(1).optional(), pages: z.string().min(1).optional() }),
  z.object({ type: z.literal('book'), publisher: z.string().min(1).optional(), address: z.string().min(1).optional() }),
]);

/**
 * Where a true count comes from: a published work (authors, year, title, venue; optionally a DOI or a stable link,
 * each checked before it is written down, and fields for its BibTeX entry), or an honest admission that the value
 * is common practice without a source, or recalled from memory and not re-read.
 */
export const countSourceSchema = z.discriminatedUnion('kind', [
  z.object({
    kind: z.literal('published'),
    authors: z.array(z.string().min(1)).min(1),
    year: z.number().int().min(1500).max(2100),
    title: z.string().min(1),
    venue: z.string().min(1),
    note: z.string().optional(),
    doi: z.string().regex(/^10\.\d{4,9}\/\S+$/, { error: 'a DOI looks like 10.1234/…' }).optional(),
    url: z.url({ protocol: /^https$/ }).optional(),
    bib: bibFieldsSchema.optional(),
  }),
  z.object({ kind: z.literal('common-practice'), note: z.string().optional() }),
  z.object({ kind: z.literal('from-memory'), note: z.string().min(1) }),
]);

/** A count's source, as stored in definitions and records. */
export type CountSource = z.infer<typeof countSourceSchema>;
