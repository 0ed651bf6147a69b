// Problems with published counts and their complete solution sets, shared by the completeness tests.
import type { PolynomialSystem } from '../../../src/engine/expr/node.ts';
import type { ProblemDefinition } from '../../../src/atlas/definition.ts';
import { systemOf } from '../../../src/atlas/system-of.ts';
import { parametersOf } from '../../../src/atlas/parameters-of.ts';
import { solveSystem } from '../../../src/engine/solve/solve-system.ts';
import twoConics from '../../../generators/problems/intersections/points-common-to-two-conics.ts';
import twoCubics from '../../../generators/problems/intersections/points-common-to-two-cubics.ts';
import apollonius from '../../../generators/problems/circles/circles-tangent-to-three-circles.ts';
import { readCommittedTangencySet } from '../../../generators/problems/conics/tangency-store.ts';
import { tangencySystem } from '../../../generators/problems/conics/tangency-system.ts';

/** A parametric system at an instance with all its solutions. */
export interface SolvedInstance {
  readonly label: string;
  readonly system: PolynomialSystem;
  readonly parameters: Float64Array;
  readonly solutions: readonly Float64Array[];
}

/** A definition's instance solved by the engine's total-degree homotopy (seed 1); the count is checked by the caller. */
export async function solvedInstance(definition: ProblemDefinition, instanceId: string): Promise<SolvedInstance> {
  const system = systemOf(definition);
  const parameters = parametersOf(definition, definition.instances.find((i) => i.id === instanceId)!);
  const report = await solveSystem(system, parameters, { seed: 1 });
  return { label: `${definition.slug} (${instanceId})`, system, parameters, solutions: report.solutions.map((s) => s.point) };
}

/** Points common to two conics: 4 (Bézout 1779; Fulton, Algebraic Curves, 1969). */
export const twoConicsGeneric = (): Promise<SolvedInstance> => solvedInstance(twoConics, 'generic');
export const twoConicsDemo = (): Promise<SolvedInstance> => solvedInstance(twoConics, 'two-running-tracks');
/** Points common to two cubics: 9 (Bézout). */
export const twoCubicsGeneric = (): Promise<SolvedInstance> => solvedInstance(twoCubics, 'generic');
/** Circles tangent to three circles: 8 (Viète 1600; Drechsler–Sterz 1999). */
export const apolloniusGeneric = (): Promise<SolvedInstance> => solvedInstance(apollonius, 'generic');

/**
 * Conics through 3 points tangent to 2 conics: 36 (Chasles 1864; Bashelor–Ksir–Traves 2008), the committed generic
 * set in the tangency-point formulation (found by monodromy and stored; its count is checked by the caller).
 */
export function ladderThirtySix(): SolvedInstance {
  const set = readCommittedTangencySet(3);
  return { label: 'conics through 3 points tangent to 2 conics (stored set)', system: tangencySystem(set.shape, set.chart), parameters: set.parameters, solutions: set.solutions };
}

/** The solutions without those at the given indices, and the removed ones. */
export function without(solutions: readonly Float64Array[], drop: readonly number[]): { kept: Float64Array[]; dropped: Float64Array[] } {
  return { kept: solutions.filter((_, i) => !drop.includes(i)), dropped: drop.map((i) => solutions[i]!) };
}

/** Largest relative distance from each expected point to the nearest of `found` (Infinity when counts differ). */
export function farthest(found: readonly Float64Array[], expected: readonly Float64Array[]): number {
  if (found.length !== expected.length) return Infinity;
  let worst = 0;
  for (const e of expected) {
    let best = Infinity;
    for (const f of found) {
      let d = 0, size = 0;
      for (let i = 0; i < e.length; i++) { d = Math.max(d, Math.abs(e[i]! - f[i]!)); size = Math.max(size, Math.abs(e[i]!)); }
      best = Math.min(best, d / (1 + size));
    }
    worst = Math.max(worst, best);
  }
  return worst;
}
