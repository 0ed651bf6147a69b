import { defineProblem } from '../../../src/atlas/definition.ts';
import { planeCurveDistanceProblem } from './plane-curve-distance-problem.ts';

// Demo cubic −x³ + 0.1x²y + 0.15y³ + 0.3xy + y² + 4x + 0.2y − 0.5 = 0 in the order x³, x²y, xy², y³, x², xy, y², x, y, 1
// (its cubic part has three distinct non-isotropic directions, as a general cubic's has). On a 0.25 grid of points in
// [−3, 3]² no position gave more than 7 real critical points; the origin is one that gives 7.
export default defineProblem(planeCurveDistanceProblem({
  slug: 'euclidean-distance-degree-of-a-plane-cubic',
  degree: 3,
  title: 'The 9 critical distances from a point to a plane cubic',
  curve: 'a general plane cubic',
  tags: ['cubic'],
  genericSeed: 20261111,
  realNote: 'For real data the number of real ones is odd, like $9$.',
  view: { xMin: -3.5, xMax: 4.5, yMin: -4.5, yMax: 4.5 },
  demo: {
    id: 'hut-and-trail',
    label: 'A hut beside a winding trail',
    description: 'A ranger’s hut stands at the origin near a trail laid out along a cubic curve. The points where a straight track from the hut meets the trail at a right angle are the critical points of the distance, the nearest point among them. Of the $9$, $7$ are real.',
    seed: 79,
    coefficients: [-1, 0.1, 0, 0.15, 0, 0.3, 1, 4, 0.2, -0.5],
    point: [0, 0],
  },
}));
