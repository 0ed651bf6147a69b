// The engine's public API (browser-safe: the Node worker backend loads lazily from pool/shared-pool.ts).
export type { ExprNode, ExprKind, PolynomialSystem } from './expr/node.ts';
export type { Homotopy, LinearSolver, PathEnd, PathOutcome, FailureReason } from './homotopy.ts';
export { ENGINE_VERSION } from './version.ts';
export { createRandom, type RandomSource } from './random.ts';
export { compileSystem, compiledFromSource, type CompiledEquations, type SystemShape, type SystemEvaluator } from './compile/compile-system.ts';
export { createDenseLU, type DenseSolver } from './linalg/dense-lu.ts';
export { createTracker, INFINITY_ACCURACY_FACTOR, type Tracker } from './track/tracker.ts';
export { DEFAULT_TRACKER_SETTINGS, stricterSettings, type TrackerSettings } from './track/settings.ts';
export { parameterHomotopy } from './homotopies/parameter-homotopy.ts';
export { withProjectiveGroups } from './homotopies/projective-groups.ts';
export { createHomotopy as createCompiledHomotopy, COMPILED_HOMOTOPY_MODULE, type CompiledHomotopyArgs } from './homotopies/compiled-module.ts';
export { planHomotopy, type HomotopyPlan } from './start/plan.ts';
export { solveSystem, shardRange, collectSolutions, isRealPoint, bezoutBound, multihomogeneousBound } from './solve/solve-system.ts';
export type { SolveOptions, FoundSolution, PathStatistics, SolveReport, SolveBounds } from './solve/types.ts';
export { createAffineTools, type AffineTools } from './solve/affine.ts';
export { sharedPool, closeSharedPool } from './pool/shared-pool.ts';
export type { PathJob, TrackingPool } from './pool/job.ts';
export { trackBatch, trackStarts } from './pool/track-batch.ts';
