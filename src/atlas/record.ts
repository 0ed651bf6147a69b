import { z } from 'astro/zod';
import { publishedGroupSchema } from './published-group.ts';
import { countSourceSchema } from './source.ts';
import { figureSchema } from './figure.ts';
import { spaceFigureSchema } from './space-figure.ts';
import { ladderMembershipSchema } from './ladder-membership.ts';

/** The record format's version; bump it on any incompatible change and teach the reader to migrate. */
export const RECORD_SCHEMA_VERSION = 1;

/** A complex number as [re, im], each rounded to fixed significant digits by the writer. */
export const complexSchema = z.tuple([z.number(), z.number()]);

/** One solution of one instance, in the coordinates named by the record's `coordinates`. */
export const solutionSchema = z.object({
  values: z.array(complexSchema),
  /** Backward error max_i |f_i(x)| / |f_i|(|x|) after refinement (scale-free; f_i evaluated with every term's modulus below). */
  residual: z.number().nonnegative(),
  /** Condition estimate of the Jacobian at the solution; null when singular (infinite). */
  condition: z.number().positive().nullable(),
  /** Multiplicity estimate (1 for nonsingular). */
  multiplicity: z.number().int().positive(),
  real: z.boolean(),
  certified: z.boolean(),
  certifiedReal: z.boolean(),
});

/** What the solver's review of the path ends did (total-degree and multihomogeneous solves). */
export const retrackStatsSchema = z.object({
  /** Paths re-tracked because their nonsingular end coincided with another path's (a path jump). */
  jumpPaths: z.number().int().nonnegative(),
  /** Of those, paths whose re-track ended at a different point. */
  recoveredJumps: z.number().int().nonnegative(),
  /** Paths still sharing a nonsingular end with another after every re-track. */
  unresolvedJumps: z.number().int().nonnegative(),
  /** Paths re-tracked in double-double precision because they failed or ended undecided in double precision. */
  extendedPaths: z.number().int().nonnegative(),
  /** Of those, paths the re-track decided. */
  extendedDecided: z.number().int().nonnegative(),
});

/** How the paths of one solve ended; the five outcomes add up to `tracked`. */
export const pathStatsSchema = z
  .object({
    tracked: z.number().int().nonnegative(),
    nonsingular: z.number().int().nonnegative(),
    singular: z.number().int().nonnegative(),
    /** Paths ending on a positive-dimensional solution set (where the naive count's excess goes); 0 in records before it was counted. */
    excess: z.number().int().nonnegative().default(0),
    atInfinity: z.number().int().nonnegative(),
    failed: z.number().int().nonnegative(),
    failures: z.record(z.string(), z.number().int().nonnegative()),
    stepsMedian: z.number().nonnegative(),
    stepsMax: z.number().int().nonnegative(),
    retries: z.number().int().nonnegative(),
    retracks: retrackStatsSchema.optional(),
  })
  .refine((p) => p.nonsingular + p.singular + p.excess + p.atInfinity + p.failed === p.tracked, {
    error: 'path outcomes do not add up to the paths tracked',
  });

/** The count ladder of one instance: naive bound, true count, and what was found and proven. */
export const countsSchema = z.object({
  bezoutBound: z.number().int().positive(),
  multihomogeneousBound: z.number().int().positive().nullable(),
  trueCount: z.number().int().nonnegative().nullable(),
  found: z.number().int().nonnegative(),
  certified: z.number().int().nonnegative(),
  certifiedDistinct: z.number().int().nonnegative(),
  real: z.number().int().nonnegative(),
  certifiedReal: z.number().int().nonnegative(),
  /**
   * True only for a generic instance whose certified distinct solutions are all its solutions: by the published
   * count (certifiedDistinct equals it) or, where no count is published, by the trace test (every found solution
   * certified distinct and the trace test's verdict 'complete'); `completeBy` says which.
   */
  complete: z.boolean(),
  completeBy: z.enum(['published count', 'trace test']).nullable().default(null),
});

/** Monodromy recovery after the solve (loops seeded with the found solutions; see src/engine/complete). */
export const recoveryCheckSchema = z.object({
  /** 'saturated': quiet loops ran out; 'loop-budget': stopped by the loop budget; 'not-applicable': no parameters; 'skipped': too large for the budget. */
  verdict: z.enum(['saturated', 'loop-budget', 'not-applicable', 'skipped']),
  loops: z.number().int().nonnegative(),
  paths: z.number().int().nonnegative(),
  failedPaths: z.number().int().nonnegative(),
  /** Solutions the loops found that the solve had missed (they are among `solutions`). */
  recovered: z.number().int().nonnegative(),
});

/** The trace test (Leykin–Rodriguez–Sottile 2018) on the found set; see src/engine/complete/trace-test.ts. */
export const traceCheckSchema = z.object({
  /** 'complete': the trace is linear over a completed pencil fibre; 'incomplete': not confirmed (not linear, or budget spent). */
  verdict: z.enum(['complete', 'incomplete', 'not-applicable', 'skipped']),
  reason: z.string(),
  /** The relative trace defect (null when none was measured). */
  defect: z.number().nonnegative().nullable(),
  /** Points of the pencil fibre reached. */
  fibre: z.number().int().nonnegative(),
  paths: z.number().int().nonnegative(),
  recovered: z.number().int().nonnegative(),
});

/** The completeness checks of one instance that need no published count. */
export const completenessSchema = z.object({ recovery: recoveryCheckSchema, trace: traceCheckSchema });

/**
 * The monodromy group of a generic instance's solution set as random loops saw it: the permutations of the loops that
 * closed generate a subgroup of the monodromy group, so `order` is a lower bound and a 'symmetric' verdict a proof
 * (Jordan's theorem or the exact order by Schreier–Sims); cycle types are the most frequent ones seen.
 */
export const monodromyGroupSchema = z.object({
  seed: z.number().int().nonnegative(),
  loops: z.number().int().nonnegative(),
  closedLoops: z.number().int().nonnegative(),
  degree: z.number().int().positive(),
  /** Exact order of the generated group (decimal digits), null above the exact-order limit. */
  order: z.string().regex(/^[0-9]+$/).nullable(),
  verdict: z.enum(['symmetric', 'alternating', 'intransitive', 'order', 'undecided']),
  transitive: z.boolean(),
  primitive: z.boolean(),
  /** The largest prime p such that some loop has a power that is a p-cycle (Jordan's witness), or null. */
  primeCycle: z.number().int().positive().nullable(),
  oddLoop: z.boolean(),
  cycleTypes: z.array(z.object({ type: z.string().min(1), count: z.number().int().positive() })),
});

/** The solve of one instance of a problem. */
export const instanceResultSchema = z.object({
  id: z.string().regex(/^[a-z0-9-]+$/),
  kind: z.enum(['generic', 'demo']),
  label: z.string().min(1),
  description: z.string(),
  seed: z.number().int().nonnegative(),
  method: z.string().min(1),
  parameters: z.record(z.string(), complexSchema),
  counts: countsSchema,
  paths: pathStatsSchema,
  solutions: z.array(solutionSchema),
  /** A plane figure, or a figure in 3-space (`kind: 'space'`) that the page lets the reader turn. */
  figure: z.union([figureSchema, spaceFigureSchema]).nullable(),
  /** Plain-language notes the engine produced (why a count falls short, what was retried). */
  notes: z.array(z.string()),
  /** Completeness checks without a published count (absent in records written before they existed). */
  completeness: completenessSchema.optional(),
  /** The monodromy group seen by random loops (generic instances with few enough solutions; absent otherwise). */
  monodromyGroup: monodromyGroupSchema.optional(),
});

/** One entry of a record's history: when it was replaced, by which engine, and what changed. */
export const historyEntrySchema = z.object({
  date: z.string().regex(/^\d{4}-\d{2}-\d{2}$/),
  engineVersion: z.string().min(1),
  change: z.string().min(1),
});

/** The solve record of one problem, written to content/records/<slug>.json. */
export const solveRecordSchema = z.object({
  schemaVersion: z.literal(RECORD_SCHEMA_VERSION),
  slug: z.string().regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/),
  title: z.string().min(1),
  family: z.string().min(1),
  tags: z.array(z.string()),
  statement: z.string().min(1),
  excessNote: z.string().min(1),
  caution: z.string().nullable(),
  /** The published monodromy group, when the definition names one (absent otherwise). */
  publishedGroup: publishedGroupSchema.optional(),
  trueCount: z.number().int().nonnegative().nullable(),
  source: countSourceSchema,
  /** The ladders the problem is a rung of (records before this field: absent). */
  ladders: z.array(ladderMembershipSchema).optional(),
  formulation: z.object({
    unknowns: z.array(z.string()),
    parameters: z.array(z.string()),
    equationDegrees: z.array(z.number().int().nonnegative()),
    groups: z.array(z.array(z.string())).nullable(),
    description: z.string(),
  }),
  /** Names of the values stored per solution (the solution's documented chart). */
  coordinates: z.array(z.string()),
  engineVersion: z.string().min(1),
  definitionHash: z.string().regex(/^[0-9a-f]{16,64}$/),
  instances: z.array(instanceResultSchema).min(1),
  history: z.array(historyEntrySchema),
});

export type Solution = z.infer<typeof solutionSchema>;
export type PathStats = z.infer<typeof pathStatsSchema>;
export type RetrackStats = z.infer<typeof retrackStatsSchema>;
export type Counts = z.infer<typeof countsSchema>;
export type Completeness = z.infer<typeof completenessSchema>;
export type MonodromyGroup = z.infer<typeof monodromyGroupSchema>;
export type InstanceResult = z.infer<typeof instanceResultSchema>;
export type HistoryEntry = z.infer<typeof historyEntrySchema>;
export type SolveRecord = z.infer<typeof solveRecordSchema>;
