import { defineProblem } from '../../../src/atlas/definition.ts';
import { monomialExponents } from '../shared/monomials.ts';
import { coefficientsOf, linearForm, product, sum } from '../shared/numeric-polynomial.ts';
import { fourLobedQuartic } from '../shared/four-lobed-quartic.ts';
import { flexProblem } from './flex-problem.ts';

/**
 * Demo quintic: (E₁·E₂ − 0.1)·L + 0.02 + 0.003·xy(x − y)(x + 2y)(x − y/2), the four-lobed quartic of the quartic
 * page times the line L: x + 0.3y + 0.2 = 0, smoothed where they cross and bent at infinity so that its top form is
 * general. Chosen among a few such smoothings for its many real flexes: 13 of 45 (Klein's bound is 15).
 */
const quintic = sum(
  product(fourLobedQuartic(), linearForm([1, 0.3], 0.2)),
  linearForm([0, 0], 0.02),
  product(linearForm([1, 0]), linearForm([0, 1]), linearForm([1, -1]), linearForm([1, 2]), linearForm([1, -0.5]), linearForm([0, 0], 0.003)),
);

export default defineProblem(flexProblem({
  slug: 'flexes-of-a-plane-quintic',
  degree: 5,
  noun: 'quintic',
  genericSeed: 20261102,
  realNote: 'When the quintic is real, at most $15$ of them, a third, are real (Klein).',
  view: { xMin: -3.2, xMax: 3.2, yMin: -3.2, yMax: 3.2 },
  demo: {
    id: 'pond-and-causeway',
    label: 'A four-lobed pond and its causeway',
    description: 'A park keeper smooths the shore of a four-lobed pond cut by a straight causeway into one quintic curve: the pond’s quartic outline times the causeway’s line, plus small terms that round off the crossings. Reeds are planted where the shore changes from bulging to hollow, at the real flexes: $13$ of the $45$.',
    seed: 41,
    coefficients: coefficientsOf(quintic, monomialExponents(2, 5)),
  },
}));
