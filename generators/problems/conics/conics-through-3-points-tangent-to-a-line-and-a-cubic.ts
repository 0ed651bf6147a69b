import { defineProblem } from '../../../src/atlas/definition.ts';
import { monomialExponents } from '../shared/monomials.ts';
import { coefficientsOf } from '../shared/numeric-polynomial.ts';
import { ovalCubicForm } from '../shared/oval-cubic-form.ts';
import { conicCurveTangencyProblem } from './conic-curve-tangency-problem.ts';

/**
 * Demo cubic: the pond-and-creek cubic of the four-point page. Points and line: the best of a random search (points in
 * [−2.2, 2.2]², lines ux + y + w = 0 with |u| ≤ 1, |w| ≤ 2.2, all rounded to 0.1) over placements whose points keep 0.2
 * from the curve and are not nearly collinear: 14 real conics. Nearly collinear points near the curve gave up to 16.
 */
const pond = coefficientsOf(ovalCubicForm([-1.6, -0.4, 1.2], 1.2, 0.15, 0.35, 0, 0), monomialExponents(2, 3));

export default defineProblem(conicCurveTangencyProblem({
  slug: 'conics-through-3-points-tangent-to-a-line-and-a-cubic',
  title: 'Conics through 3 points and tangent to a line and a cubic',
  points: 3,
  lines: 1,
  degree: 3,
  curve: 'cubic',
  genericSeed: 20261208,
  demo: {
    id: 'garden-wall',
    label: 'A garden path by a wall and a pond',
    description: 'A landscape gardener wants a curved gravel path (any conic) that passes three fountains, just touches a straight garden wall, and just touches the water’s edge, a cubic curve made of a round pond beside a long creek bank (units: tens of metres). Of the $24$ conics, $14$ are real, each drawn with its points of contact with the wall and the water.',
    seed: 97,
    points: [[2.2, 1.4], [1.7, 2], [-2.1, -0.5]],
    lines: [[0.9, 1, -0.7]],
    curve: pond,
    view: { xMin: -3.5, xMax: 3.5, yMin: -3.5, yMax: 3.5 },
  },
}));
