import { defineProblem } from '../../../src/atlas/definition.ts';
import { monomialExponents } from '../shared/monomials.ts';
import { coefficientsOf } from '../shared/numeric-polynomial.ts';
import { fourLobedQuartic } from '../shared/four-lobed-quartic.ts';
import { planeCurveDistanceProblem } from './plane-curve-distance-problem.ts';

/**
 * Demo quartic: the four-lobed quartic E₁·E₂ = 0.1 of the flex page (a dented outer oval around a convex inner
 * one). On a 0.2 grid of points in [−1.6, 1.6]² the most real critical points, all 16, occur near the middle; the point
 * (−0.1, −0.1) is one of them.
 */
const cross = coefficientsOf(fourLobedQuartic(), monomialExponents(2, 4));

export default defineProblem(planeCurveDistanceProblem({
  slug: 'euclidean-distance-degree-of-a-plane-quartic',
  degree: 4,
  title: 'The 16 critical distances from a point to a plane quartic',
  curve: 'a general plane quartic',
  tags: ['quartic'],
  genericSeed: 20261112,
  realNote: 'For real data the number of real ones is even, like $16$.',
  view: { xMin: -3.2, xMax: 3.2, yMin: -3.2, yMax: 3.2 },
  demo: {
    id: 'fountain-in-a-pond',
    label: 'A fountain in a four-lobed pond',
    description: 'A gardener sets a fountain at $(-0.1, -0.1)$ on the small island in the middle of a four-lobed pond; the island’s shore and the pond’s dented outer shore together form the quartic $E_1 E_2 = 0.1$ of two crossing ellipses. Straight jets from the fountain must meet the water’s edge at a right angle; every such point is a critical point of the distance. All $16$ are real.',
    seed: 83,
    coefficients: cross,
    point: [-0.1, -0.1],
  },
}));
