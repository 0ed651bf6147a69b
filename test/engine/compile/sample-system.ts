import type { PolynomialSystem } from '../../../src/engine/expr/node.ts';
import { add, constant, det, mul, neg, param, pow, sub, unknown } from '../../../src/engine/expr/build.ts';

/**
 * A test system of our own from the expression builders: three unknowns, two parameters, a subtree used three times,
 * a fifth power, a determinant, a complex constant and x⁰. Shared by the compiler's and the double-double tests.
 */
export const x0 = unknown('x', 0), x1 = unknown('y', 1), x2 = unknown('z', 2);
export const a = param('a', 0), b = param('b', 1);
export const shared = add(mul(a, x0, x1), pow(x2, 3), constant(0.5, -2));
export const sampleSystem: PolynomialSystem = {
  unknowns: ['x', 'y', 'z'],
  parameters: ['a', 'b'],
  equations: [
    sub(mul(shared, shared), mul(b, x0)),
    add(pow(sub(x0, x1), 5), neg(mul(b, b, x2)), det([[x0, x1, 1], [a, x2, b], [1, 2, x0]])),
    add(mul(constant(0, 1), shared, x1), pow(x0, 0), mul(3, a)),
  ],
};
