import { defineProblem } from '../../../src/atlas/definition.ts';
import { monomialExponents } from '../shared/monomials.ts';
import { coefficientsOf } from '../shared/numeric-polynomial.ts';
import { ellipseForm } from '../shared/ellipse-form.ts';
import { planeCurveDistanceProblem } from './plane-curve-distance-problem.ts';

export default defineProblem(planeCurveDistanceProblem({
  slug: 'euclidean-distance-degree-of-an-ellipse',
  degree: 2,
  title: 'The 4 critical distances from a point to an ellipse',
  curve: 'a general ellipse',
  tags: ['ellipse', 'conics', 'evolute'],
  genericSeed: 20261110,
  realNote: 'For a real ellipse, $4$ are real when the point lies inside the evolute (the astroid-shaped curve of centres of curvature) and $2$ when it lies outside.',
  view: { xMin: -3.4, xMax: 3.4, yMin: -2.6, yMax: 2.6 },
  demo: {
    id: 'lagoon-island',
    label: 'An island in an oval lagoon',
    description: 'A swimmer rests on a small island at $(0.4, 0.25)$ in a lagoon whose shore is the ellipse with semi-axes $3$ and $2$, turned by $0.2$ rad. The shore points she can swim to straight at a right angle to the shore are the critical points: the nearest, the farthest and two more. The island lies inside the evolute, so all $4$ are real.',
    seed: 73,
    coefficients: coefficientsOf(ellipseForm(3, 2, 0.2, 0, 0), monomialExponents(2, 2)),
    point: [0.4, 0.25],
  },
}));
