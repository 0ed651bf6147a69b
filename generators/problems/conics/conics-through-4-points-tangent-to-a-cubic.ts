import { defineProblem } from '../../../src/atlas/definition.ts';
import { monomialExponents } from '../shared/monomials.ts';
import { coefficientsOf } from '../shared/numeric-polynomial.ts';
import { ovalCubicForm } from '../shared/oval-cubic-form.ts';
import { conicCurveTangencyProblem } from './conic-curve-tangency-problem.ts';

/**
 * Demo cubic: an oval over X ∈ [−1.6, −0.4] beside an open arm from X = 1.2 (frame turned 0.35 rad about the origin).
 * Four points of our own: two inside the oval, two beyond it, each at least 0.28 from the curve. Random searches over
 * thousands of placements (rounded to 0.1) met no more than 8 real conics while every point kept 0.2 from the curve and no
 * three points were nearly collinear; 10 or 12 real occurred only with nearly collinear points or a point within 0.04 of it.
 */
const pond = coefficientsOf(ovalCubicForm([-1.6, -0.4, 1.2], 1.2, 0.15, 0.35, 0, 0), monomialExponents(2, 3));

export default defineProblem(conicCurveTangencyProblem({
  slug: 'conics-through-4-points-tangent-to-a-cubic',
  title: 'Conics through 4 points and tangent to a cubic',
  points: 4,
  lines: 0,
  degree: 3,
  curve: 'cubic',
  genericSeed: 20261206,
  demo: {
    id: 'skating-cones',
    label: 'Skating figures through four cones by a frozen pond',
    description: 'A skating coach sets two cones on a frozen pond and two on the frozen marsh beyond it, and asks for figure patterns (any conic: ellipse, parabola or hyperbola) through all four cones that just graze an ice edge; the pond’s rim and a long creek bank beside it together form one cubic curve (units: tens of metres). Of the $12$ conics, $8$ are real, each drawn with its point of contact.',
    seed: 91,
    points: [[-0.6, -0.4], [-1.1, -0.6], [0.5, 1], [-0.3, 1.7]],
    lines: [],
    curve: pond,
    view: { xMin: -3.5, xMax: 3.5, yMin: -3.5, yMax: 3.5 },
  },
}));
