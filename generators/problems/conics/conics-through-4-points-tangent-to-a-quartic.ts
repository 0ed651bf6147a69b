import { defineProblem } from '../../../src/atlas/definition.ts';
import { monomialExponents } from '../shared/monomials.ts';
import { coefficientsOf } from '../shared/numeric-polynomial.ts';
import { fourIslandsQuartic } from './four-islands-quartic.ts';
import { conicCurveTangencyProblem } from './conic-curve-tangency-problem.ts';

/**
 * Demo quartic: four ovals (fourIslandsQuartic). The best of a random search over 1,500 placements of four points in
 * [−2, 2]² (rounded to 0.1): 16 real conics, the most the search met; every buoy is at least 0.12 from a shore.
 */
const lagoon = coefficientsOf(fourIslandsQuartic(), monomialExponents(2, 4));

export default defineProblem(conicCurveTangencyProblem({
  slug: 'conics-through-4-points-tangent-to-a-quartic',
  title: 'Conics through 4 points and tangent to a quartic',
  points: 4,
  lines: 0,
  degree: 4,
  curve: 'quartic',
  genericSeed: 20261207,
  demo: {
    id: 'lagoon-buoys',
    label: 'A sailing course through four buoys among four islands',
    description: 'A sailing instructor anchors four buoys in a lagoon with four small islands, whose shores together form one quartic curve, and looks for courses (any conic) that round all four buoys and just skim a shore (units: hundreds of metres). Of the $20$ conics, $16$ are real, each drawn with its point of contact.',
    seed: 93,
    points: [[-1.4, -0.2], [-0.4, -0.4], [-0.8, -0.1], [-1.7, -0.4]],
    lines: [],
    curve: lagoon,
    view: { xMin: -3, xMax: 3, yMin: -3, yMax: 3 },
  },
}));
