import { defineProblem } from '../../../src/atlas/definition.ts';
import { classProblem } from './class-problem.ts';

// Demo data in the order x⁵, x⁴y, …, 1 (monomials by falling degree): the product of five real lines
// x + 0.15y − 1.4, 0.2x + y − 1.2, x − 0.9y + 1.3, 0.95x + y + 1.5, −0.3x + y + 1.6 plus 0.1·g, rounded to 4
// decimals. The cubic g takes at each of the ten crossings the sign that makes both tangents from the floodlight
// to the rounded crossing real (solved as 10 interpolation conditions), so that all 20 tangents are real; found by
// our own sign argument near a crossing c·L₁L₂ + 0.1·g(node) = 0, checked by solving.
export default defineProblem(classProblem({
  slug: 'tangent-lines-from-a-point-to-a-quintic',
  degree: 5,
  noun: 'quintic',
  genericSeed: 20261205,
  view: { xMin: -4.6, xMax: 6.4, yMin: -4.2, yMax: 3.4 },
  demo: {
    id: 'floodlight-among-hedges',
    label: 'A floodlight among five hedges',
    description: 'A floodlight stands at $(0.1, 0.2)$ in a park crossed by five straight hedges. The gardener rounds off every crossing, each to its own side, so that the hedges become one quintic curve. Every edge of shadow on the lawn is a line from the light grazing a hedge: all $20$ tangents are real, two at each rounded crossing.',
    seed: 67,
    coefficients: [-0.057, -0.1123, 0.9739, 0.3834, -0.8647, -0.135, 0.5617, 0.4256, 0.8319, -0.4111, 1.1985, -0.7552, 0.283, 0.6807, 1.12, -3.8242, -0.5373, -5.0117, 1.7601, -1.7898, 5.3825],
    point: [0.1, 0.2],
  },
}));
