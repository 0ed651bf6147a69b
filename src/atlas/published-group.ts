import { z } from 'astro/zod';

/**
 * A published monodromy (Galois) group of a problem's solutions: its name in TeX-free words ('W(E₆)', 'S₉'), the
 * citation in words (authors, year, venue), and either its order as decimal digits or, for a full symmetric group
 * too large to write out (S₃₂₆₄ has an order of 10 000 digits), the number of letters it acts on (`symmetricOn`).
 * Exactly one of the two is given.
 */
export const publishedGroupSchema = z.object({
  name: z.string().min(1),
  order: z.string().regex(/^[1-9][0-9]*$/, { error: 'the order is written as decimal digits' }).optional(),
  symmetricOn: z.number().int().min(2).optional(),
  citation: z.string().min(1),
}).refine((g) => (g.order === undefined) !== (g.symmetricOn === undefined), { error: 'give exactly one of order (decimal digits) and symmetricOn (the degree of a full symmetric group)' });

export type PublishedGroup = z.infer<typeof publishedGroupSchema>;
