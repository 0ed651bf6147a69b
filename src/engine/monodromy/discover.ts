import type { PathEnd } from '../homotopy.ts';
import type { RandomSource } from '../random.ts';
import type { ParameterLeg } from '../parameter/gamma-arc.ts';
import { createPointIndex, type PointIndex } from '../parameter/point-index.ts';
import { randomGamma, randomParameterPoint, reverseLeg, type LegTracker } from '../parameter/route.ts';

/**
 * Why discovery stopped: the known count was reached, the caller's acceptance test passed, a whole added node brought
 * nothing new, or a budget ran out.
 */
export type MonodromyStop = 'known-count' | 'accepted' | 'saturated' | 'stalled' | 'path-budget' | 'node-budget';

/** Every node's parameters and solutions (packed complex), as handed to an acceptance test. */
export interface MonodromyNodes {
  readonly parameters: readonly Float64Array[];
  readonly solutions: readonly (readonly Float64Array[])[];
}

/** What monodromy discovery needs: a leg tracker, a solution-first seed, a random source, and optional counts and budgets. */
export interface MonodromyOptions {
  readonly track: LegTracker;
  /** A start pair built solution-first: parameters (packed complex) and one solution for them (or several: `solutions`). */
  readonly seed: { readonly parameters: Float64Array; readonly solution?: Float64Array; readonly solutions?: readonly Float64Array[] };
  /** Draws the parameters of a new node (default: randomParameterPoint, complex standard normal). */
  readonly drawNode?: (random: RandomSource) => Float64Array;
  /**
   * Called whenever every known solution has travelled every edge (the graph is saturated), before a node is added:
   * true stops discovery with 'accepted' (a trace test, say).
   */
  readonly accept?: (nodes: MonodromyNodes) => boolean;
  readonly random: RandomSource;
  /** The published generic count, when known: discovery stops as soon as one node holds that many. */
  readonly expected?: number;
  /** Random parameter points besides the seed's at the start (default 1) and edges between every pair (default 4). */
  readonly extraNodes?: number;
  readonly edgesPerPair?: number;
  /**
   * When no untravelled edge is left, a new random node joined by `joinEdges` (default 1) edges to each of the first
   * two nodes is added (new loops outside the complex line of the first two, whose loops can miss branch points), at
   * most `maxNodes` nodes in all (default 6); 'saturated' once `confirmations` added nodes in a row left the largest
   * solution count unchanged.
   */
  readonly maxNodes?: number;
  readonly joinEdges?: number;
  /** How many added nodes in a row must leave the count unchanged before 'saturated' (default 2). */
  readonly confirmations?: number;
  /** Stop after this many paths (default 40·expected or 100 000) or this many paths without a new solution (default ∞ when expected is given, else 2000). */
  readonly maxPaths?: number;
  readonly stallPaths?: number;
  /** Largest number of paths per round (default 1024), so that discovery stops soon after the count is reached. */
  readonly roundSize?: number;
  /** Relative tolerance for two solutions to be the same (default 1e-8). */
  readonly tolerance?: number;
}

/** The solutions found at the best node, why discovery stopped, and path statistics that add up. */
export interface MonodromyResult {
  readonly stop: MonodromyStop;
  /** The node with the most solutions: its parameters and solutions (packed complex). */
  readonly parameters: Float64Array;
  readonly solutions: Float64Array[];
  readonly stats: {
    readonly paths: number;
    readonly failedPaths: number;
    /** Pairs of starts that landed on the same end (each pair re-tracked once with safe settings). */
    readonly jumps: number;
    /** Jumps that safe re-tracking did not resolve (neither correspondence recorded). */
    readonly unresolvedJumps: number;
    readonly rounds: number;
    /** Parameter points and edges used. */
    readonly nodes: number;
    readonly edges: number;
    readonly steps: number[];
  };
}

interface Edge { readonly a: number; readonly b: number; readonly leg: ParameterLeg; readonly back: ParameterLeg; readonly forward: Map<number, number>; readonly backward: Map<number, number>; }
interface Task { readonly edge: number; readonly reversed: boolean; readonly start: number; }

/**
 * Monodromy solving (Duff–Hill–Jensen–Lee–Leykin–Sommars, IMA J. Numer. Anal. 39, 2019): nodes are the seed's
 * parameters and random complex parameter points, joined pairwise by several gamma-trick edges. Every new solution at a
 * node is sent once along every incident edge it has not travelled (in either direction); ends that are new are added
 * to the far node. Two starts landing on the same end are a path jump: both are re-tracked with safe settings.
 */
export async function discoverByMonodromy(options: MonodromyOptions): Promise<MonodromyResult> {
  const { track, seed, random, expected } = options;
  const seedSolutions = seed.solutions ?? (seed.solution ? [seed.solution] : []);
  if (seedSolutions.length === 0) throw new RangeError('monodromy discovery needs a seed solution');
  const n = seedSolutions[0]!.length / 2, np = seed.parameters.length / 2;
  const drawNode = options.drawNode ?? ((r: RandomSource) => randomParameterPoint(np, r));
  const tolerance = options.tolerance ?? 1e-8;
  const maxPaths = options.maxPaths ?? (expected !== undefined ? 40 * expected : 100_000);
  const stallPaths = options.stallPaths ?? (expected !== undefined ? Infinity : 2000);
  const roundSize = options.roundSize ?? 1024;
  const nodes: { parameters: Float64Array; index: PointIndex }[] = [];
  const edges: Edge[] = [];
  const queue: Task[] = [];
  const addNode = (parameters: Float64Array, edgesEach: number, neighbours: readonly number[]): void => {
    const b = nodes.length;
    nodes.push({ parameters, index: createPointIndex(n, tolerance) });
    for (const a of neighbours) {
      for (let e = 0; e < edgesEach; e++) {
        const leg: ParameterLeg = { from: nodes[a]!.parameters, to: parameters, gamma: randomGamma(random) };
        edges.push({ a, b, leg, back: reverseLeg(leg), forward: new Map(), backward: new Map() });
        const k = edges.length - 1;
        nodes[a]!.index.points.forEach((_, j) => queue.push({ edge: k, reversed: false, start: j }));
      }
    }
  };
  addNode(seed.parameters, 0, []);
  for (let k = 0; k < (options.extraNodes ?? 1); k++) addNode(drawNode(random), options.edgesPerPair ?? 4, nodes.map((_, i) => i));
  const tried = new Set<string>();
  const addSolution = (node: number, x: Float64Array): number => {
    const j = nodes[node]!.index.add(x);
    edges.forEach((e, k) => {
      if (e.a === node) queue.push({ edge: k, reversed: false, start: j });
      if (e.b === node) queue.push({ edge: k, reversed: true, start: j });
    });
    return j;
  };
  for (const x of seedSolutions) if (nodes[0]!.index.find(x) < 0) addSolution(0, x);
  let paths = 0, failedPaths = 0, jumps = 0, unresolvedJumps = 0, rounds = 0, sinceNew = 0;
  const steps: number[] = [];
  const best = (): number => nodes.reduce((b, node, i) => (node.index.size > nodes[b]!.index.size ? i : b), 0);
  let countWhenAdded = -1, fruitless = 0;
  const done = (): MonodromyStop | null => {
    if (expected !== undefined && nodes[best()]!.index.size >= expected) return 'known-count';
    if (queue.length === 0) {
      if (options.accept?.({ parameters: nodes.map((v) => v.parameters), solutions: nodes.map((v) => v.index.points) })) return 'accepted';
      const most = nodes[best()]!.index.size;
      fruitless = most === countWhenAdded ? fruitless + 1 : 0;
      if (fruitless >= (options.confirmations ?? 2)) return 'saturated';
      if (nodes.length >= (options.maxNodes ?? 6)) return 'node-budget';
      countWhenAdded = most;
      addNode(drawNode(random), options.joinEdges ?? 1, [0, 1]);
    }
    if (sinceNew >= stallPaths) return 'stalled';
    if (paths >= maxPaths) return 'path-budget';
    return null;
  };
  let stop: MonodromyStop | null;
  while ((stop = done()) === null) {
    rounds++;
    const round = queue.splice(0, roundSize).filter((t) => {
      const key = `${t.edge}:${t.reversed ? 1 : 0}:${t.start}`;
      const e = edges[t.edge]!;
      if (tried.has(key) || (t.reversed ? e.backward : e.forward).has(t.start)) return false;
      tried.add(key);
      return true;
    });
    const groups = new Map<string, Task[]>();
    for (const t of round) {
      const key = `${t.edge}:${t.reversed}`;
      const g = groups.get(key);
      if (g === undefined) groups.set(key, [t]);
      else g.push(t);
    }
    const batches = [...groups.values()];
    const results = await Promise.all(batches.map((g) => {
      const e = edges[g[0]!.edge]!, from = g[0]!.reversed ? e.b : e.a;
      return track(g[0]!.reversed ? e.back : e.leg, g.map((t) => nodes[from]!.index.points[t.start]!), false);
    }));
    for (let bi = 0; bi < batches.length; bi++) {
      const g = batches[bi]!, ends = results[bi]!;
      const e = edges[g[0]!.edge]!, reversed = g[0]!.reversed;
      const from = reversed ? e.b : e.a, to = reversed ? e.a : e.b;
      const there = reversed ? e.backward : e.forward, back = reversed ? e.forward : e.backward;
      for (let i = 0; i < g.length; i++) {
        const start = g[i]!.start, end = ends[i]!;
        paths++; sinceNew++; steps.push(end.steps);
        if (end.outcome !== 'regular') { failedPaths++; continue; }
        const j = nodes[to]!.index.find(end.point);
        if (j < 0) {
          const k = addSolution(to, end.point.slice());
          there.set(start, k); back.set(k, start); sinceNew = 0;
          continue;
        }
        const other = back.get(j);
        if (other === undefined || other === start) { there.set(start, j); back.set(j, start); continue; }
        // Path jump: two starts on one end. Re-track both with safe settings; keep only what then disagrees.
        jumps++;
        there.delete(other); back.delete(j);
        const pair = [nodes[from]!.index.points[other]!, nodes[from]!.index.points[start]!];
        const safe = await track(reversed ? e.back : e.leg, pair, true);
        paths += 2; steps.push(safe[0]!.steps, safe[1]!.steps);
        const landed = safe.map((s) => (s.outcome === 'regular' ? nodes[to]!.index.find(s.point) : -2));
        if (safe.every((s) => s.outcome === 'regular') && !sameEnd(safe[0]!, safe[1]!, n, tolerance)) {
          [other, start].forEach((st, q) => {
            let k = landed[q]!;
            if (k === -1) { k = addSolution(to, safe[q]!.point.slice()); sinceNew = 0; }
            if (!back.has(k)) { there.set(st, k); back.set(k, st); }
          });
        } else {
          unresolvedJumps++;
        }
      }
    }
  }
  const b = best();
  return {
    stop,
    parameters: nodes[b]!.parameters,
    solutions: [...nodes[b]!.index.points],
    stats: { paths, failedPaths, jumps, unresolvedJumps, rounds, nodes: nodes.length, edges: edges.length, steps },
  };
}

function sameEnd(x: PathEnd, y: PathEnd, n: number, tolerance: number): boolean {
  const index = createPointIndex(n, tolerance);
  index.add(x.point);
  return index.find(y.point) === 0;
}
