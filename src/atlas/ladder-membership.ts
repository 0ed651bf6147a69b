import { z } from 'astro/zod';
import { SLUG_PATTERN } from './slug.ts';

/**
 * A problem's place on a ladder of problems that differ by one condition at a time (conics through p points and
 * tangent to 5 − p conics, p = 5, …, 0): the ladder's id and title, and the rung (the p of this problem).
 */
export const ladderMembershipSchema = z.object({
  id: z.string().regex(SLUG_PATTERN),
  title: z.string().min(1),
  rung: z.number().int().nonnegative(),
});

/** A problem's place on a ladder. */
export type LadderMembership = z.infer<typeof ladderMembershipSchema>;
