import { defineProblem } from '../../../src/atlas/definition.ts';
import { monomialExponents } from '../shared/monomials.ts';
import { coefficientsOf } from '../shared/numeric-polynomial.ts';
import { fourLobedQuartic } from '../shared/four-lobed-quartic.ts';
import { flexProblem } from './flex-problem.ts';

/** Demo quartic: the four-lobed quartic, 8 real flexes (two at each of its four dents), Klein's maximum for quartics. */
const cross = fourLobedQuartic();

export default defineProblem(flexProblem({
  slug: 'flexes-of-a-plane-quartic',
  degree: 4,
  noun: 'quartic',
  genericSeed: 20261101,
  realNote: 'When the quartic is real, at most $8$ of them, a third, are real (Klein), and $8$ occur.',
  view: { xMin: -3, xMax: 3, yMin: -3, yMax: 3 },
  demo: {
    id: 'four-lobed-biscuit',
    label: 'A four-lobed biscuit cutter',
    description: 'A baker bends one strip of steel into a four-lobed biscuit cutter, traced by the quartic $E_1 E_2 = 0.1$ for two crossing ellipses $E_1 = 0$, $E_2 = 0$, with an oval hole where the ellipses overlap. Where the strip turns from bulging out to curving in it must be bent the other way: at the flexes. Of the $24$ flexes, $8$ are real, two at each of the four dents between the lobes; the convex hole has none.',
    seed: 31,
    coefficients: coefficientsOf(cross, monomialExponents(2, 4)),
  },
}));
