import { describe, expect, it } from 'vitest';
import { exprBuilders as ops } from '../../../../src/engine/index.ts';
import { homogeneousExponents } from '../../../../generators/problems/shared/homogeneous-monomials.ts';
import { restrictForm } from '../../../../generators/problems/shared/restrict-form.ts';
import { substitute } from '../../../../generators/problems/shared/univariate.ts';
import { evaluate, type C } from './evaluate.ts';

// restrictForm must give the same coefficients in s as the plain substitution (our own refactoring check).
describe('restricting a form with shared products', () => {
  it.each([[3, 3], [4, 4], [5, 5]])('in %i variables of degree %i: the same polynomial in s as substitute', (n, d) => {
    const exponents = homogeneousExponents(n, d);
    const c = exponents.map((_, m) => ops.param(`c${m}`, m));
    const u = Array.from({ length: 2 * n }, (_, k) => ops.unknown(`u${k}`, k));
    const line = Array.from({ length: n }, (_, i) => [u[2 * i]!, u[2 * i + 1]!]);
    const shared = restrictForm(ops, c, exponents, line), plain = substitute(ops, c, exponents, line);
    const x: C[] = u.map((_, k) => [Math.cos(k + 1), Math.sin(2 * k + 1)]);
    const p: C[] = c.map((_, m) => [Math.sin(m + 0.5), Math.cos(3 * m)]);
    expect(shared).toHaveLength(d + 1);
    shared.forEach((node, k) => {
      const [a, b] = [evaluate(node!, x, p), evaluate(plain[k]!, x, p)];
      expect(Math.hypot(a[0] - b[0], a[1] - b[1])).toBeLessThan(1e-10 * (1 + Math.hypot(...b)));
    });
  });
});
