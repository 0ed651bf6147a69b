import { defineProblem } from '../../../src/atlas/definition.ts';
import { monomialExponents } from '../shared/monomials.ts';
import { coefficientsOf, linearForm, product, sum, type NumericPolynomial } from '../shared/numeric-polynomial.ts';
import { surfaceTripleProblem } from './surface-triple.ts';

const [X, Y, Z] = [linearForm([1, 0, 0]), linearForm([0, 1, 0]), linearForm([0, 0, 1])];
const k = (c: number): NumericPolynomial => linearForm([0, 0, 0], c);
/** (x + 1.5)x(x − 1.2), (y + 1)(y − 0.2)(y − 1.4), (z + 1.3)(z − 0.1)(z − 1.1): common zeros, a 3 × 3 × 3 grid. */
const grid = [
  product(sum(X, k(1.5)), X, sum(X, k(-1.2))),
  product(sum(Y, k(1)), sum(Y, k(-0.2)), sum(Y, k(-1.4))),
  product(sum(Z, k(1.3)), sum(Z, k(-0.1)), sum(Z, k(-1.1))),
];

/**
 * Each demo surface is a combination of the three grid cubics (rows of an invertible matrix, so the 27 grid points are
 * the common points) plus small terms of our own that bend the surfaces out of that special position.
 */
function surface(weights: readonly number[], extra: NumericPolynomial): number[] {
  return coefficientsOf(sum(...grid.map((g, i) => product(g, k(weights[i]!))), extra), monomialExponents(3, 3));
}

export default defineProblem(surfaceTripleProblem({
  slug: 'points-common-to-three-cubic-surfaces',
  degree: 3,
  noun: 'cubic',
  genericSeed: 20261109,
  frame: 2,
  demo: {
    id: 'folded-sheets',
    label: 'Three folded sheets',
    description: 'A sculptor bends three thin metal sheets into wavy cubic surfaces that pass through one another inside a block, and puts a rivet wherever all three meet. All $27$ common points are real, near a $3 \\times 3 \\times 3$ grid.',
    seed: 71,
    surfaces: [
      surface([1, 0.6, 0.3], sum(product(X, Y, Z, k(0.04)), product(X, X, k(0.05)))),
      surface([0.5, -1, 0.7], sum(product(Y, Y, Z, k(-0.03)), linearForm([0.02, 0, -0.03]))),
      surface([-0.4, 0.5, 1], sum(product(X, Z, Z, k(0.05)), product(Y, Z, k(0.04)))),
    ],
  },
}));
