import { defineProblem } from '../../../src/atlas/definition.ts';
import { curvePairProblem } from './curve-pair.ts';

// Coefficients in the order x³, x²y, xy², y³, x², xy, y², x, y, 1.
export default defineProblem(curvePairProblem({
  slug: 'points-common-to-two-cubics',
  degree: 3,
  noun: 'cubic',
  genericSeed: 20260103,
  view: { xMin: -3.2, xMax: 3.2, yMin: -3.2, yMax: 3.2 },
  demo: {
    id: 'woven-threads',
    label: 'Two wavy threads on a loom',
    description: 'A textile designer draws two wavy threads, each close to three parallel strands: $x^3 - 4x + 0.1xy + 0.3y - 0.2 = 0$ runs roughly up and down, $y^3 - 4y + 0.3x + 0.1 = 0$ roughly across. Every crossing is a knot; there are nine.',
    p: [1, 0, 0, 0, 0, 0.1, 0, -4, 0.3, -0.2],
    q: [0, 0, 0, 1, 0, 0, 0, 0.3, -4, 0.1],
  },
}));
