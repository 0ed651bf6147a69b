import { z } from 'astro/zod';

/** The version of the exploration file format (content/explorations/<slug>.json). */
export const EXPLORATION_SCHEMA_VERSION = 1;

/** A published bound or example for the number of real solutions, with its citation in words. */
export const realMaximumSchema = z.object({ value: z.number().int().nonnegative(), citation: z.string().min(1) });

/**
 * How many solutions can be real, as the explorer saw it: the distribution of certified real counts over random real
 * instances (standard normal parameters, seeded), the best instance found by sampling and a hill climb in the real
 * parameters, and the published maximum when the definition names one. Samples whose solution set did not carry over
 * completely (a failed or jumped route, or a solution not certified) are counted apart, never in the distribution.
 */
export const explorationSchema = z.object({
  schemaVersion: z.literal(EXPLORATION_SCHEMA_VERSION),
  slug: z.string().regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/),
  engineVersion: z.string().min(1),
  definitionHash: z.string().regex(/^[0-9a-f]{64}$/),
  seed: z.number().int().nonnegative(),
  /** Solutions carried from the generic instance to every sample (its found count). */
  degree: z.number().int().positive(),
  samples: z.number().int().positive(),
  incompleteSamples: z.number().int().nonnegative(),
  distribution: z.array(z.object({ real: z.number().int().nonnegative(), samples: z.number().int().positive() })),
  climbSteps: z.number().int().nonnegative(),
  /** The climb's accepted moves: step, move size, certified real count reached. */
  climb: z.array(z.object({ step: z.number().int().nonnegative(), scale: z.number().positive(), real: z.number().int().nonnegative() })),
  best: z.object({
    real: z.number().int().nonnegative(),
    origin: z.string().min(1),
    parameters: z.record(z.string(), z.number()),
  }),
  realMaximum: realMaximumSchema.nullable(),
});

export type Exploration = z.infer<typeof explorationSchema>;
export type RealMaximum = z.infer<typeof realMaximumSchema>;
