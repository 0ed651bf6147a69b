import { z } from 'astro/zod';
import { SLUG_PATTERN } from './slug.ts';

/**
 * The frontmatter of a generated problem page, content/problems/<slug>.mdx. `recordVersion` is the number of
 * history entries of the record (one per publication); `bezoutBound` and `trueCount` repeat the record's first instance.
 */
export const pageFrontmatterSchema = z.object({
  slug: z.string().regex(SLUG_PATTERN),
  title: z.string().min(1),
  family: z.string().min(1),
  tags: z.array(z.string()),
  bezoutBound: z.number().int().positive(),
  trueCount: z.number().int().nonnegative().nullable(),
  recordVersion: z.number().int().positive(),
  engineVersion: z.string().min(1),
});

/** The frontmatter of a problem page. */
export type PageFrontmatter = z.infer<typeof pageFrontmatterSchema>;
