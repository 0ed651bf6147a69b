import type { PolynomialSystem } from '../expr/node.ts';
import { createPointIndex } from '../parameter/point-index.ts';
import { randomGamma } from '../parameter/route.ts';
import { trackRoute } from '../parameter/track-route.ts';
import { backToStart } from './back-to-start.ts';
import type { TrackingPool } from '../pool/job.ts';
import { createRandom } from '../random.ts';
import type { TrackerSettings } from '../track/settings.ts';
import { compiledLegTracker } from './compiled-leg-tracker.ts';
import { completePencilFibre, transportDefect } from './pencil-fibre.ts';
import type { FibreAtStart } from './pencil-ends.ts';
import type { PathCounts } from './path-counts.ts';
import type { RecoveredSolution } from './recovered.ts';
import { createTracePencil, type PencilHyperplane } from './trace-pencil.ts';

/**
 * Default acceptance bound on the relative trace defect. Measured (engine README): complete pencil fibres 1e-17…5e-14
 * (8–114 points) and 1.2e-13 (708 points); incomplete ones at least 1.5e-4 (8–40 points), 2.8e-6 (114), 1.8e-7 (550)
 * and 8.2e-7 (708). 1e-9 leaves ≥ 2 orders of magnitude on either side; accepted defects grow and refused ones shrink
 * with the fibre, so fibres far beyond 10³ points need it measured again.
 */
export const TRACE_TOLERANCE = 1e-9;

/** Options of runTraceTest. */
export interface TraceTestOptions {
  /** Seeds v, b, c, a, λ₁, the λ-nodes and every gamma. Same seed ⇒ same report. */
  readonly seed: number;
  /** Acceptance bound on the relative defect (default TRACE_TOLERANCE). */
  readonly tolerance?: number;
  /**
   * λ-nodes at most (default 200), one added per saturation that left the trace nonlinear; stop (incomplete) after
   * `quietNodes` (default 40) added nodes in a row that left the fibre unchanged, or after `maxPaths` paths (default
   * 2 000 000). Measured: the last few points of a fibre can take many nodes (circles tangent to three circles, real
   * demo: up to 91 nodes for 40 points; median 25–90 paths per fibre point over 12 seeds).
   */
  readonly maxNodes?: number;
  readonly quietNodes?: number;
  readonly maxPaths?: number;
  /**
   * Indices of the parameters the line p₀ + s·v moves (default all). Moving fewer shrinks the pencil fibre: on the
   * 36-conic rung (3 points, 2 conics) all 18 parameters gave about 550 points, one conic's 6 gave 114, one point's 2
   * gave 156. 'complete' then speaks for the components of the smaller family's curve (see runTraceTest).
   */
  readonly moving?: readonly number[];
  /**
   * The form a (default 'generic'). Measured: 'coordinate' (x_k − κh) gives the same or a smaller fibre (circles: 32 or
   * 40 points against 40) but on the conic ladder's tangency formulation its hyperplane part at λ = 0 has singular
   * points (40–100 paths back to λ = 0 failed per run), which 'generic' never showed.
   */
  readonly hyperplane?: PencilHyperplane;
  /** false: no monodromy completion; the trace of the given set's transport alone decides (default true). */
  readonly completion?: boolean;
  readonly pool?: TrackingPool;
  readonly settings?: Partial<TrackerSettings>;
  /** Relative tolerance for two points to be the same (default 1e-8). */
  readonly sameTolerance?: number;
}

/** The verdict of runTraceTest and the numbers behind it. */
export interface TraceTestReport extends PathCounts {
  readonly verdict: 'complete' | 'incomplete' | 'not-applicable';
  /** One sentence saying why. */
  readonly reason: string;
  readonly seed: number;
  readonly hyperplane: PencilHyperplane;
  readonly tolerance: number;
  /** Distinct points of the given set. */
  readonly given: number;
  /** The last loop's relative trace defect (null: no loop had complete transports, or not applicable). */
  readonly defect: number | null;
  /** The defect at each saturation of the λ-graph (or of the one transport, without completion). */
  readonly defects: readonly (number | null)[];
  /** Points of the pencil fibre reached at λ₁ (d + e when complete). */
  readonly pencilFibre: number;
  /** Where the fibre landed when tracked back to λ = 0 (null unless the trace was linear). */
  readonly atStart: FibreAtStart | null;
  /** Given solutions not met again at λ = 0 (must be 0 for 'complete'). */
  readonly givenMissed: number;
  /** Affine solutions at p₀ the given set lacked, Newton-refined, sorted by rounded coordinates. */
  readonly recovered: RecoveredSolution[];
  readonly rejected: number;
  /** λ-points and gamma-arc edges of the completion graph. */
  readonly nodes: number;
  readonly edges: number;
}

/**
 * Decides numerically whether `solutions` (nonsingular solutions of the square system at `parameters` = p₀) are all
 * of them, by the trace test (Leykin–Rodriguez–Sottile, Arnold Math. J. 4, 2018; linear traces: Sommese–Verschelde–
 * Wampler, 2001–2002, venue from memory), and recovers the missing ones. Construction:
 *
 * Homogenise X = (x, h), F̂(X; p) with each equation of its degree in x (parameters have degree 0). With random
 * v ∈ ℂᵐ, b, c ∈ ℂⁿ⁺¹ and a (x_k − κh, or generic), the curve C = {(X, s): F̂(X; p₀ + s·v) = 0, b·X = 1} carries
 * φ = s·(a·X), and G_λ = [F̂(X; p₀ + s·v); b·X − 1; s·(a·X) − λ] is square in (X, s).
 *
 * Claim: on any union of whole components Γ of the closure of C in Pⁿ × P¹ on which φ is not constant, the trace
 * T(λ) = Σ_{φ = λ} c·X is affine-linear. Proof: there φ = (s₁/s₀)(a·X)/(b·X) and ψ = (c·X)/(b·X) are rational and
 * T is the trace of ψ under the finite map φ: Γ → P¹, a rational function of λ with poles only under poles of ψ.
 * ψ has poles only on b·X = 0, where (b generic, so s ∉ {0, ∞} and a·X ≠ 0 at those finitely many points) φ has a
 * pole as well: T has no finite pole, so it is a polynomial. At a point q over λ = ∞ with pole orders e_q of φ and
 * m_q of ψ, the e_q branches through q add up to a series in λ of order ≤ m_q/e_q; m_q = 0 where s = ∞ (b·X ≠ 0
 * there for generic b) and m_q = 1 ≤ e_q on b·X = 0, so deg T ≤ 1. For a subset of a fibre that is not a union of
 * whole monodromy orbits of φ the trace is not linear (LRS 2018), so a linear trace (to round-off) accepts the set.
 *
 * Start: at λ = 0 the solutions are the projective fibre at p₀ on s = 0 (W lifted to X = (x, 1)/b·(x, 1)) and
 * E = {a·X = 0}. At a lifted w, ∂G/∂(X, s) has last row (0, a·X) (s = 0), so det = (a·X)·det[∂F̂/∂X; b]; by Euler
 * ∂F̂/∂X·X = 0 and rank ∂F̂/∂X = n (w nonsingular), so its kernel is ℂX, and b·X = 1 makes [∂F̂/∂X; b] invertible:
 * w is a nonsingular start whenever a·X ≠ 0, which the random κ (or a) ensures.
 *
 * Procedure: W is tracked from λ = 0 to a random λ₁; monodromy in the λ-plane (loops λ₁ → λ₂ → λ₃ → λ₁ over a graph
 * of gamma-arc edges, Duff et al. 2019) completes the fibre at λ₁, and at each saturation the traces at λ₁, λ₂, λ₃
 * give the defect (pencil-fibre.ts); once it is at most the tolerance the fibre is tracked back to λ = 0, and its
 * s = 0 ends are the fibre at p₀ (pencil-ends.ts):
 * those not in W are recovered (Newton on F at p₀). 'complete' needs a linear trace, every given solution met again,
 * no failed, singular or unclear end at λ = 0 and no unresolved jump. What it certifies: W ∪ recovered holds every
 * affine solution on the components of C that W reaches; for a family with an irreducible solution variety (transitive
 * monodromy) that is every solution at p₀. Systems without parameters get 'not-applicable'; an empty `solutions` throws
 * RangeError.
 */
export async function runTraceTest(system: PolynomialSystem, parameters: Float64Array, solutions: readonly Float64Array[], options: TraceTestOptions): Promise<TraceTestReport> {
  const n = system.unknowns.length, m = system.parameters.length;
  const tolerance = options.tolerance ?? TRACE_TOLERANCE, hyperplane = options.hyperplane ?? 'generic';
  const same = options.sameTolerance ?? 1e-8;
  const given = createPointIndex(n, same);
  for (const x of solutions) if (given.find(x) < 0) given.add(x);
  const base = {
    seed: options.seed, hyperplane, tolerance, given: given.size, defect: null, defects: [], pencilFibre: 0, atStart: null, givenMissed: 0,
    recovered: [], rejected: 0, nodes: 0, edges: 0, paths: 0, failedPaths: 0, jumps: 0, unresolvedJumps: 0,
  };
  if (m === 0) return { verdict: 'not-applicable', reason: 'The system has no parameters, so there is no family to move along.', ...base };
  if (given.size === 0) throw new RangeError('runTraceTest needs at least one known solution');
  const random = createRandom(options.seed);
  const pencil = createTracePencil(system, parameters, given.points, random, hyperplane, options.moving);
  const track = await compiledLegTracker(pencil.compiled, options.pool, options.settings);
  const lambda1 = new Float64Array(2);
  random.gaussianComplex(lambda1, 0);
  const out = await trackRoute(track, [{ from: new Float64Array(2), to: lambda1, gamma: randomGamma(random) }], given.points.map((x) => pencil.lift(x)), same);
  const starts = createPointIndex(n + 2, same);
  for (const e of out.ends) if (e.outcome === 'regular' && starts.find(e.point) < 0) starts.add(e.point);
  const first = { paths: out.ends.length + out.jumpRetracks, failedPaths: out.ends.filter((e) => e.outcome !== 'regular').length, jumps: out.jumpRetracks, unresolvedJumps: out.duplicates };
  if (options.completion === false) {
    const raw = await transportDefect(pencil, track, starts.points, lambda1, random);
    const linear = raw.defect !== null && raw.defect <= tolerance;
    const counts = { ...first, defect: raw.defect, defects: [raw.defect], pencilFibre: starts.size, paths: first.paths + raw.paths, failedPaths: first.failedPaths + raw.failedPaths };
    return linear
      ? { verdict: 'complete', reason: `Without completion the trace of the ${starts.size} transported points is linear (relative defect ${raw.defect!.toExponential(2)} ≤ ${tolerance}): they are whole orbits.`, ...base, ...counts }
      : { verdict: 'incomplete', reason: `Without completion the trace of the ${starts.size} transported points is not linear (relative defect ${raw.defect === null ? 'unknown: a path failed' : raw.defect.toExponential(2)} > ${tolerance}).`, ...base, ...counts };
  }
  const completion = await completePencilFibre(pencil, track, starts.points, lambda1, random, {
    tolerance, maxNodes: options.maxNodes ?? 200, quietNodes: options.quietNodes ?? 40, maxPaths: options.maxPaths ?? 2_000_000, sameTolerance: same,
  });
  const counts = {
    defect: completion.defects.length > 0 ? completion.defects[completion.defects.length - 1]! : null,
    defects: completion.defects,
    pencilFibre: completion.fibre.length,
    nodes: completion.nodes,
    edges: completion.edges,
    paths: first.paths + completion.paths,
    failedPaths: first.failedPaths + completion.failedPaths,
    jumps: first.jumps + completion.jumps,
    unresolvedJumps: first.unresolvedJumps + completion.unresolvedJumps,
  };
  if (!completion.linear) {
    const why = counts.defect === null ? 'no saturation had three fibres of one size' : `the trace stayed nonlinear (relative defect ${counts.defect.toExponential(2)} > ${tolerance})`;
    return { verdict: 'incomplete', reason: `After ${completion.nodes} λ-nodes and ${completion.edges} edges ${why}; the pencil fibre reached ${completion.fibre.length} points.`, ...base, ...counts };
  }

  const back = await backToStart(pencil, track, completion.fibre, lambda1, random, system, parameters, given, same);
  const report = {
    ...base, ...counts, atStart: back.atStart, givenMissed: back.givenMissed, recovered: back.recovered, rejected: back.rejected,
    paths: counts.paths + back.paths,
    failedPaths: counts.failedPaths + back.atStart.failed,
    jumps: counts.jumps + back.jumps,
    unresolvedJumps: counts.unresolvedJumps + back.duplicates,
  };
  const linearText = `the trace is linear (relative defect ${counts.defect!.toExponential(2)} ≤ ${tolerance}) on a pencil fibre of ${completion.fibre.length} points`;
  if (back.faults.length > 0) return { verdict: 'incomplete', reason: `Although ${linearText}, ${back.faults.join('; ')}.`, ...report };
  return { verdict: 'complete', reason: `With ${completion.nodes} λ-nodes and ${completion.edges} edges ${linearText}; ${back.atStart.solutions} solutions at p₀, ${back.recovered.length} of them recovered.`, ...report };
}
