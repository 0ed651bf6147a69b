import { defineProblem } from '../../../src/atlas/definition.ts';
import { monomialExponents } from '../shared/monomials.ts';
import { coefficientsOf } from '../shared/numeric-polynomial.ts';
import { ovalCubicForm } from '../shared/oval-cubic-form.ts';
import { conicCurveTangencyProblem } from './conic-curve-tangency-problem.ts';

/**
 * Demo cubic: an oval over X ∈ [−1.6, −0.4] beside an open arm from X = 1.2 (frame turned 0.35 rad about the origin).
 * Four points of our own: two inside the oval, two beyond it, each at least 0.27 from the curve. Random searches over
 * several thousand placements (rounded to 0.1, two of the points drawn near the oval) met no more than 10 real conics
 * with every point at least 0.15 from the curve; all 12 real occurred only with a point within 0.04 of it.
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
    description: 'A skating coach sets two cones on a frozen pond and two on the frozen marsh beyond it, and asks for figure patterns (any conic: ellipse, parabola or hyperbola) through all four cones that just graze an ice edge; the pond’s rim and a long creek bank beside it together form one cubic curve (units: tens of metres). Of the $12$ conics, $10$ are real, each drawn with its point of contact.',
    seed: 91,
    points: [[-0.8, -0.6], [-1.3, -0.3], [0.1, -1.1], [0.9, -1.3]],
    lines: [],
    curve: pond,
    view: { xMin: -3.5, xMax: 3.5, yMin: -3.5, yMax: 3.5 },
  },
}));
