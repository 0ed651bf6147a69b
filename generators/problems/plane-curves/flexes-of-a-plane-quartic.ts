import { defineProblem } from '../../../src/atlas/definition.ts';
import { monomialExponents } from '../shared/monomials.ts';
import { coefficientsOf, linearForm, product, sum } from '../shared/numeric-polynomial.ts';
import { ellipseForm } from '../shared/ellipse-form.ts';
import { flexProblem } from './flex-problem.ts';

/**
 * Demo quartic: E₁·E₂ = 0.1 for two crossing ellipses (semi-axes 2.2 × 1 turned 0.3 rad, 1.1 × 2 turned 0.25 rad,
 * centres near the origin). The curve hugs the outline of their union, a four-armed cross whose four concave corners
 * each carry two flexes, and the outline of their common part, a convex oval: 8 real flexes, Klein's maximum.
 */
const cross = sum(product(ellipseForm(2.2, 1, 0.3, 0.1, -0.1), ellipseForm(1.1, 2, 0.25, -0.1, 0.05)), linearForm([0, 0], -0.1));

export default defineProblem(flexProblem({
  slug: 'flexes-of-a-plane-quartic',
  degree: 4,
  noun: 'quartic',
  genericSeed: 20261101,
  realNote: 'When the quartic is real, at most $8$ of them, a third, are real (Klein), and $8$ occur.',
  view: { xMin: -3, xMax: 3, yMin: -3, yMax: 3 },
  demo: {
    id: 'four-armed-biscuit',
    label: 'A four-armed biscuit cutter',
    description: 'A baker bends one strip of steel into a four-armed biscuit cutter, traced by the quartic $E_1 E_2 = 0.1$ for two crossing ellipses $E_1 = 0$, $E_2 = 0$, with an oval hole where the ellipses overlap. Where the strip turns from bulging out to curving in it must be bent the other way: at the flexes. Of the $24$ flexes, $8$ are real, two in each concave corner of the cross; the convex hole has none.',
    seed: 31,
    coefficients: coefficientsOf(cross, monomialExponents(2, 4)),
  },
}));
