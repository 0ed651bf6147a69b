import { linearForm, product, sum, type NumericPolynomial } from './numeric-polynomial.ts';

/**
 * The quadratic X²/a² + Y²/b² − 1 in (x, y), where (X, Y) are the coordinates of (x, y) in a frame turned by
 * `angle` radians about the centre (cx, cy): negative inside the ellipse with those semi-axes, zero on it.
 */
export function ellipseForm(a: number, b: number, angle: number, cx: number, cy: number): NumericPolynomial {
  const [cos, sin] = [Math.cos(angle), Math.sin(angle)];
  const X = linearForm([cos, sin], -(cos * cx + sin * cy));
  const Y = linearForm([-sin, cos], -(-sin * cx + cos * cy));
  return sum(product(X, X, linearForm([0, 0], 1 / (a * a))), product(Y, Y, linearForm([0, 0], 1 / (b * b))), linearForm([0, 0], -1));
}
