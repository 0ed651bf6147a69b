import { z } from 'astro/zod';
import { publishedGroupSchema } from './published-group.ts';
import { realMaximumSchema } from './exploration.ts';
import { countSourceSchema } from './source.ts';
import { ladderMembershipSchema } from './ladder-membership.ts';
import { SLUG_PATTERN, describeValue } from './slug.ts';

const text = z.string().trim().min(1, { error: 'must not be empty' });
const name = z.string().regex(/^[A-Za-z_][A-Za-z0-9_]*$/, { error: 'must be an identifier (letters, digits, _)' });
const fn = z.custom<(...args: never[]) => unknown>((v) => typeof v === 'function', {
  error: (issue) => `must be a function, got ${describeValue(issue.input)}`,
});
const slugLike = z.string().regex(SLUG_PATTERN, { error: 'must be lowercase words joined by hyphens (a-z, 0-9, -)' });

/** A finite real number, or a pair [re, im] of finite numbers. */
export const complexInputSchema = z.custom<number | [number, number]>(
  (v) =>
    (typeof v === 'number' && Number.isFinite(v)) ||
    (Array.isArray(v) && v.length === 2 && v.every((x) => typeof x === 'number' && Number.isFinite(x))),
  { error: (issue) => `must be finite: a number or [re, im], got ${describeValue(issue.input)}` },
);

/**
 * The data fields of a ProblemDefinition (src/atlas/definition.ts) as a zod schema; functions are only checked to
 * be functions. Extra fields are allowed (strategies may add their own). Cross-field checks live in
 * validate-definition.ts.
 */
export const definitionSchema = z.object({
  slug: slugLike,
  title: text,
  family: slugLike,
  tags: z.array(text),
  statement: text,
  formulation: z.object({
    unknowns: z.array(name).min(1, { error: 'needs at least one unknown' }),
    parameters: z.array(name),
    equations: fn,
    groups: z.array(z.array(name).min(1)).min(1).optional(),
    description: text,
    coordinates: z.object({ names: z.array(text).min(1), map: fn }).optional(),
  }),
  trueCount: z.object({ value: z.number().int().nonnegative().nullable(), source: countSourceSchema }),
  excessNote: text,
  caution: text.optional(),
  publishedGroup: publishedGroupSchema.optional(),
  realMaximum: realMaximumSchema.optional(),
  instances: z
    .array(
      z.object({
        id: slugLike,
        kind: z.enum(['generic', 'demo']),
        label: text,
        description: z.string(),
        seed: z.number().int().nonnegative().max(2 ** 32 - 1),
        parameters: z.record(z.string(), complexInputSchema).optional(),
      }),
    )
    .min(1, { error: 'needs at least one instance' }),
  solver: z.looseObject({ kind: text }).optional(),
  reads: z.array(text.refine((f) => f.startsWith('/'), { error: 'must be an absolute path' })).optional(),
  // A plane drawing has a window; a drawing in 3-space (kind 'space') has a sight instead.
  drawing: z
    .object({ kind: z.literal('space').optional(), window: fn.optional(), sight: fn.optional(), configuration: fn, solution: fn, projection: text.optional() })
    .superRefine((d, ctx) => {
      const needed = d.kind === 'space' ? 'sight' : 'window';
      if (d[needed] === undefined) ctx.addIssue({ code: 'custom', path: [needed], message: `missing (a ${d.kind === 'space' ? 'drawing in 3-space' : 'plane drawing'} needs it)` });
    })
    .optional(),
  ladders: z.array(ladderMembershipSchema).optional(),
});
