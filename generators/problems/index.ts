import type { ProblemDefinition } from '../../src/atlas/definition.ts';
import circlesTangentToThreeCircles from './circles/circles-tangent-to-three-circles.ts';

/** Every problem of the atlas, in the order the home page lists them. Slugs are permanent. */
export const problems: readonly ProblemDefinition[] = [
  circlesTangentToThreeCircles,
];
