import { z } from 'astro/zod';

/** Non-finite numbers travel as null (JSON has no Infinity); doubles otherwise round-trip exactly. */
const looseNumber = z.number().nullable().transform((v) => v ?? Infinity);

const endSchema = z.object({
  outcome: z.enum(['regular', 'singular', 'excess', 'at-infinity', 'failed']),
  point: z.array(looseNumber),
  residual: looseNumber,
  condition: looseNumber,
  windingNumber: z.number(),
  steps: z.number(),
  rejectedSteps: z.number(),
  retries: z.number(),
  failure: z.enum(['step-underflow', 'step-budget', 'no-convergence', 'non-finite']).optional(),
  direction: z.literal(true).optional(),
  retrack: z.object({ reason: z.enum(['jump', 'failed', 'undecided']), precision: z.enum(['double', 'double-double']), changed: z.boolean() }).optional(),
});

/**
 * A part file (`solve … --shard k/n --out part.json`): the path ends of batch k of n of every instance, exact
 * doubles, with what identifies the solve (target, definition hash, engine version, seed per instance).
 */
export const partSchema = z.object({
  format: z.literal('atlas-solve-part'),
  formatVersion: z.literal(2),
  target: z.string().min(1),
  slug: z.string(),
  definitionHash: z.string(),
  engineVersion: z.string(),
  shard: z.object({ index: z.number().int().nonnegative(), count: z.number().int().positive() }),
  instances: z.array(z.object({
    id: z.string(),
    seed: z.number().int().nonnegative(),
    bezoutBound: z.number().int().positive(),
    multihomogeneousBound: z.number().int().positive().nullable(),
    startSystem: z.enum(['total-degree', 'multihomogeneous']),
    ends: z.array(endSchema),
  })),
});

/** A parsed part file (non-finite numbers restored to Infinity). */
export type SolvePart = z.output<typeof partSchema>;

/** A part file as written (non-finite numbers as null). */
export type SolvePartFile = z.input<typeof partSchema>;
