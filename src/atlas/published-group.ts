import { z } from 'astro/zod';

/**
 * A published monodromy (Galois) group of a problem's solutions: its name in TeX-free words ('W(E₆)', 'S₉'), its
 * order as decimal digits, and the citation in words (authors, year, venue).
 */
export const publishedGroupSchema = z.object({
  name: z.string().min(1),
  order: z.string().regex(/^[1-9][0-9]*$/, { error: 'the order is written as decimal digits' }),
  citation: z.string().min(1),
});

export type PublishedGroup = z.infer<typeof publishedGroupSchema>;
