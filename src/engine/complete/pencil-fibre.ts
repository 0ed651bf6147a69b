import { discoverByMonodromy, type MonodromyNodes } from '../monodromy/discover.ts';
import { randomGamma, type LegTracker } from '../parameter/route.ts';
import type { RandomSource } from '../random.ts';
import type { PathCounts } from './path-counts.ts';
import { traceDefect } from './trace-defect.ts';
import type { TracePencil } from './trace-pencil.ts';

/** How the completion of a pencil fibre went: the fibre at λ₁, the trace defect at every saturation, and path counts. */
export interface PencilCompletion extends PathCounts {
  /** True when the trace defect at some saturation was at most the tolerance. */
  readonly linear: boolean;
  /** The fibre at λ₁ when the trace was linear, else the largest node fibre reached. */
  readonly fibre: readonly Float64Array[];
  /** The defect at each saturation of the graph; null when the three fibres differed in size (a failed or jumped path). */
  readonly defects: readonly (number | null)[];
  /** λ-points used (nodes) and edges. */
  readonly nodes: number;
  readonly edges: number;
}

/** Budgets of completePencilFibre. */
export interface PencilCompletionOptions {
  readonly tolerance: number;
  /** Nodes at most (each added node is joined to the first two by one edge). */
  readonly maxNodes: number;
  /** Stop (not linear) after this many added nodes in a row left the fibre size unchanged. */
  readonly quietNodes: number;
  readonly maxPaths: number;
  readonly sameTolerance: number;
}

/** Shortest distance allowed between two λ-nodes: nearly equal λs would hide the trace's curvature in round-off. */
const MIN_SIDE = 0.02;

/**
 * Completes the fibre at λ₁ that `starts` begin, by monodromy in the λ-plane (discoverByMonodromy: nodes λ₁ and two
 * random λs joined pairwise by two gamma-arc edges; at each saturation a further random node joined to the first two),
 * and runs the trace test at each saturation on the first three nodes: there every fibre is closed under every edge,
 * so the three node fibres are transports of one another and T(λᵢ) = Σ c·X over node i's fibre (no extra paths).
 */
export async function completePencilFibre(
  pencil: TracePencil, track: LegTracker, starts: readonly Float64Array[], lambda1: Float64Array, random: RandomSource, options: PencilCompletionOptions,
): Promise<PencilCompletion> {
  const defects: (number | null)[] = [];
  let accepted: readonly Float64Array[] | null = null;
  const drawn: Float64Array[] = [lambda1];
  const result = await discoverByMonodromy({
    track, random, seed: { parameters: lambda1, solutions: starts },
    drawNode: (r) => { const q = drawLambda(r, drawn); drawn.push(q); return q; },
    extraNodes: 2, edgesPerPair: 2, joinEdges: 1,
    maxNodes: options.maxNodes, confirmations: options.quietNodes, maxPaths: options.maxPaths, stallPaths: Infinity,
    tolerance: options.sameTolerance,
    accept: (nodes) => {
      const defect = nodeDefect(pencil, nodes);
      defects.push(defect);
      if (defect === null || defect > options.tolerance) return false;
      accepted = nodes.solutions[0]!;
      return true;
    },
  });
  const s = result.stats;
  return {
    linear: accepted !== null, fibre: accepted ?? result.solutions, defects,
    nodes: s.nodes, edges: s.edges, paths: s.paths, failedPaths: s.failedPaths, jumps: s.jumps, unresolvedJumps: s.unresolvedJumps,
  };
}

/**
 * A λ-node q = r·g: g complex standard normal, r log-uniform in [10^−1.5, 10^0.5], drawn again while it lies within
 * 0.02 of a node drawn before. Measured: branch values of φ lie at |λ| ≈ 0.003…10 (two conics, circles); with loops
 * through such points fibres completed in fewer loops than with unit-scale points or triangles around λ₁, and wider
 * ranges ([10^−3, 10^2]) or joining new nodes to their nearest neighbours did no better.
 */
function drawLambda(random: RandomSource, drawn: readonly Float64Array[]): Float64Array {
  const q = new Float64Array(2);
  do {
    const r = 10 ** (-1.5 + 2 * random.next());
    random.gaussianComplex(q, 0);
    q[0] = r * q[0]!; q[1] = r * q[1]!;
  } while (drawn.some((d) => Math.hypot(d[0]! - q[0]!, d[1]! - q[1]!) < MIN_SIDE));
  return q;
}

/** The trace defect over the first three nodes (relative to the largest Σ|c·X|), or null unless their fibres have one size. */
function nodeDefect(pencil: TracePencil, nodes: MonodromyNodes): number | null {
  if (nodes.solutions.length < 3) return null;
  const size = nodes.solutions[0]!.length;
  if (nodes.solutions[1]!.length !== size || nodes.solutions[2]!.length !== size) return null;
  const lambdas = new Float64Array(6), traces = new Float64Array(6), one = new Float64Array(2);
  let scale = 0;
  for (let k = 0; k < 3; k++) {
    lambdas.set(nodes.parameters[k]!, 2 * k);
    let sum = 0;
    for (const z of nodes.solutions[k]!) {
      one[0] = 0; one[1] = 0;
      pencil.addTraced(z, one);
      traces[2 * k] = traces[2 * k]! + one[0]!; traces[2 * k + 1] = traces[2 * k + 1]! + one[1]!;
      sum += Math.hypot(one[0]!, one[1]!);
    }
    scale = Math.max(scale, sum);
  }
  return traceDefect(lambdas, traces, scale);
}

/**
 * The raw trace verdict on a fibre as it is (no completion): the fibre is carried from λ₁ to two random λ-nodes
 * (one gamma-arc leg each) and the defect of the three traces returned; null when a path did not end regular.
 */
export async function transportDefect(
  pencil: TracePencil, track: LegTracker, fibre: readonly Float64Array[], lambda1: Float64Array, random: RandomSource,
): Promise<{ defect: number | null; paths: number; failedPaths: number }> {
  const drawn: Float64Array[] = [lambda1];
  const parameters = [lambda1], solutions = [fibre];
  let failedPaths = 0;
  for (let k = 0; k < 2; k++) {
    const q = drawLambda(random, drawn);
    drawn.push(q);
    const ends = await track({ from: lambda1, to: q, gamma: randomGamma(random) }, fibre, false);
    failedPaths += ends.filter((e) => e.outcome !== 'regular').length;
    parameters.push(q);
    solutions.push(ends.filter((e) => e.outcome === 'regular').map((e) => e.point));
  }
  return { defect: nodeDefect(pencil, { parameters, solutions }), paths: 2 * fibre.length, failedPaths };
}
