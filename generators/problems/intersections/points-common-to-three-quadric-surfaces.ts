import { defineProblem } from '../../../src/atlas/definition.ts';
import { monomialExponents } from '../shared/monomials.ts';
import { coefficientsOf, linearForm, product, sum, type NumericPolynomial } from '../shared/numeric-polynomial.ts';
import { surfaceTripleProblem } from './surface-triple.ts';

const [X, Y, Z] = [linearForm([1, 0, 0]), linearForm([0, 1, 0]), linearForm([0, 0, 1])];
const k = (c: number): NumericPolynomial => linearForm([0, 0, 0], c);
/** x² − 1, y² − 2.25, z² − 0.64: their common zeros are the 8 corners (±1, ±1.5, ±0.8) of a box. */
const box = [sum(product(X, X), k(-1)), sum(product(Y, Y), k(-2.25)), sum(product(Z, Z), k(-0.64))];

/**
 * Each demo surface is a combination of the three box quadrics (rows of an invertible matrix, so the box corners
 * are the common points) plus small terms of our own that move the points off the box and the surfaces off
 * special position: an ellipsoid and two hyperboloids.
 */
function surface(weights: readonly number[], extra: NumericPolynomial): number[] {
  return coefficientsOf(sum(...box.map((b, i) => product(b, k(weights[i]!))), extra), monomialExponents(3, 2));
}

export default defineProblem(surfaceTripleProblem({
  slug: 'points-common-to-three-quadric-surfaces',
  degree: 2,
  noun: 'quadric',
  genericSeed: 20261108,
  frame: 2,
  demo: {
    id: 'glass-shells',
    label: 'Three glass shells',
    description: 'A light artist hangs three curved glass shells, an ellipsoid and two hyperboloids, through one another in a room and sets a crystal at every point where all three meet. All $8$ common points are real, near the corners of a box $2 \\times 3 \\times 1.6$ units.',
    seed: 67,
    surfaces: [
      surface([1, 1, 1], sum(product(X, Y, k(0.05)), linearForm([0.1, 0, -0.05]))),
      surface([1, -1, 0.5], sum(product(Y, Z, k(-0.08)), linearForm([0, 0.07, 0.02]))),
      surface([0.4, 1, -1], sum(product(X, Z, k(0.06)), linearForm([-0.04, 0, 0.09]))),
    ],
  },
}));
