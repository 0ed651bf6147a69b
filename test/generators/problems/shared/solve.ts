import { isSpaceDrawing, type DrawingDefinition, type InstanceDefinition, type ProblemDefinition } from '../../../../src/atlas/definition.ts';
import { systemOf } from '../../../../src/atlas/system-of.ts';
import { parametersOf } from '../../../../src/atlas/parameters-of.ts';
import { type SolveReport, solveSystem } from '../../../../src/engine/index.ts';
import { coordinatesOf, isRealValues } from '../../../../generators/pipeline/coordinates-of.ts';
import { figureItemSchema, type FigureItem } from '../../../../src/atlas/figure.ts';
import { spaceItemSchema, type SpaceItem } from '../../../../src/atlas/space-figure.ts';

/** A solve of one instance with the problem's own start system, and the real count judged in its coordinates. */
export interface SolvedInstance {
  readonly report: SolveReport;
  readonly real: number;
}

/** Solves an instance (path seed = instance seed) with the definition's solver choice, or the given start system. */
export async function solveInstance(definition: ProblemDefinition, instance: InstanceDefinition, start?: 'total-degree' | 'multihomogeneous'): Promise<SolvedInstance> {
  const report = await solveSystem(systemOf(definition), parametersOf(definition, instance), {
    seed: instance.seed,
    start: start ?? (definition.solver?.kind === 'multihomogeneous' ? 'multihomogeneous' : 'total-degree'),
  });
  const real = report.solutions.filter((s) => isRealValues(coordinatesOf(definition, s.point, definition.slug))).length;
  return { report, real };
}

/** A random complex instance of the problem drawn from `seed`. */
export function randomInstance(seed: number): InstanceDefinition {
  return { id: `random-${seed}`, kind: 'generic', label: 'random', description: 'random complex parameters', seed };
}

/** The seeds 1 … n, for it.each tables over random instances. */
export function seeds(n: number): number[] {
  return Array.from({ length: n }, (_, i) => i + 1);
}

/** The demo instance with the given id (throws when absent, naming the problem). */
export function demoInstance(definition: ProblemDefinition, id: string): InstanceDefinition {
  const instance = definition.instances.find((i) => i.id === id);
  if (!instance) throw new Error(`${definition.slug}: no instance "${id}"`);
  return instance;
}

/**
 * Splits test seeds into those checked strictly and those that currently fail through a known engine issue,
 * reported to the engine's owner with the seed as a minimal failing case; the latter run as skipped tests so the
 * gap stays visible in every test report.
 */
export function splitSeeds(all: readonly number[], engineIssues: readonly number[] = []): { checked: number[]; skipped: number[] } {
  return { checked: all.filter((s) => !engineIssues.includes(s)), skipped: all.filter((s) => engineIssues.includes(s)) };
}

/**
 * The drawing of every real solution of a solved demo instance (real parts of its stored coordinates, as the
 * writer draws them), each item checked against the figure schema; throws naming the problem on a bad item.
 */
export function drawnRealSolutions(definition: ProblemDefinition, instance: InstanceDefinition, solved: SolvedInstance): (FigureItem | SpaceItem)[][] {
  const params = Object.fromEntries(Object.entries(instance.parameters ?? {}).map(([k, v]) => [k, typeof v === 'number' ? v : v[0]]));
  return solved.report.solutions
    .map((s) => coordinatesOf(definition, s.point, definition.slug))
    .filter((values) => isRealValues(values))
    .map((values) => {
      const items = definition.drawing!.solution(Array.from(values).filter((_, i) => i % 2 === 0), params);
      const schema = isSpaceDrawing(definition.drawing!) ? spaceItemSchema : figureItemSchema;
      for (const item of items) if (!schema.safeParse(item).success) throw new Error(`${definition.slug}: bad figure item ${JSON.stringify(item)}`);
      return items;
    });
}

/** A definition's plane drawing; throws naming the problem when it has none or draws in 3-space. */
export function planeDrawing(definition: ProblemDefinition): DrawingDefinition {
  const drawing = definition.drawing;
  if (!drawing || isSpaceDrawing(drawing)) throw new Error(`${definition.slug}: no plane drawing`);
  return drawing;
}

/** The largest residual ‖F(x)‖∞ / (1 + ‖x‖∞) over a report's found solutions (0 when none): every found solution must solve. */
export function worstResidual(report: SolveReport): number {
  return Math.max(0, ...report.solutions.map((s) => s.residual));
}
