import { linearForm, product, scale, sum, type NumericPolynomial } from './numeric-polynomial.ts';

/**
 * The cubic (s + b·X)·Y² − (X − r₁)(X − r₂)(X − r₃) in (x, y), where (X, Y) are the coordinates of (x, y) in a frame
 * turned by `angle` radians about (cx, cy). With r₁ < r₂ < r₃, s > 0 and a small bend b > 0 its real points near the
 * frame's origin are an oval over [r₁, r₂] and an open branch from X = r₃ on; b ≠ 0 gives three distinct points at
 * infinity (b = 0 would put a flex there, with the line at infinity as its tangent). Exact up to binary64 rounding.
 */
export function ovalCubicForm(roots: readonly [number, number, number], s: number, bend: number, angle: number, cx: number, cy: number): NumericPolynomial {
  const [cos, sin] = [Math.cos(angle), Math.sin(angle)];
  const X = linearForm([cos, sin], -(cos * cx + sin * cy));
  const Y = linearForm([-sin, cos], -(-sin * cx + cos * cy));
  const shifted = roots.map((r) => sum(X, linearForm([0, 0], -r)));
  return sum(product(sum(linearForm([0, 0], s), scale(X, bend)), Y, Y), scale(product(...shifted), -1));
}
