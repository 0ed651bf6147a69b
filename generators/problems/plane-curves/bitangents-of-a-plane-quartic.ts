import { defineProblem, type ComplexInput } from '../../../src/atlas/definition.ts';
import type { FigureItem } from '../../../src/atlas/figure.ts';
import type { ExprNode } from '../../../src/engine/index.ts';
import { coefficientNames, monomialExponents } from '../shared/monomials.ts';
import { substitute } from '../shared/univariate.ts';
import type { PlaneWindow } from '../shared/contour.ts';
import { planeCurveItems } from '../shared/plane-curve-items.ts';
import { genericInstance } from '../shared/generic-instance.ts';
import { coefficientsOf, linearForm, product, sum } from '../shared/numeric-polynomial.ts';
import { pluckerBook } from './plucker-book.ts';

const exponents = monomialExponents(2, 4);
const names = coefficientNames('c', 2, 4);
/** The line chart (x, y) = A·(t, mt + k) with A = [[1, −σ], [σ, 1]] (a scaled rotation when σ is real). */
const chartNames = ['sigma'] as const;
const view: PlaneWindow = { xMin: -3.2, xMax: 3.2, yMin: -3.2, yMax: 3.2 };

/**
 * Demo quartic in the spirit of Plücker's example: two crossing ellipses E₁, E₂ (semi-axes 2 × 1.1 and 1.2 × 2.1)
 * turned by 0.3 rad about (0.2, −0.1); the curve E₁·E₂ + 0.04 = 0 splits into four ovals near the four lunes
 * where exactly one ellipse is negative.
 */
function demoQuartic(): number[] {
  const [cos, sin] = [Math.cos(0.3), Math.sin(0.3)];
  const X = linearForm([cos, sin], -(cos * 0.2 + sin * -0.1));
  const Y = linearForm([-sin, cos], -(-sin * 0.2 + cos * -0.1));
  const ellipse = (a: number, b: number) => sum(product(X, X, linearForm([0, 0], 1 / (a * a))), product(Y, Y, linearForm([0, 0], 1 / (b * b))), linearForm([0, 0], -1));
  return coefficientsOf(sum(product(ellipse(2, 1.1), ellipse(1.2, 2.1)), linearForm([0, 0], 0.04)), exponents);
}

/**
 * The demo's line chart: σ = tan(−0.12), a rotation by −0.12 rad (times a scale), so that the chart's missing
 * direction (the image of the t = 0 axis, at about 83° from the x-axis) lies midway in the widest gap between
 * the directions of the demo's 28 bitangents (measured: 14° from the nearest), keeping every slope m small.
 * Real, so real lines have real chart coordinates and can be certified real.
 */
const demoChart = [Math.tan(-0.12)];

const demoParameters: Record<string, ComplexInput> = Object.fromEntries([
  ...demoQuartic().map((c, m) => [names[m]!, c] as const),
  ...chartNames.map((n, i) => [n, Number(demoChart[i]!.toFixed(12))] as const),
]);

/** A second demo: one convex oval, x⁴ + 1.3y⁴ + 0.4x²y² + 0.3x³ − 0.2xy² + 0.1xy + 0.05x = 1, chart σ = 0.2. */
const ovalParameters: Record<string, ComplexInput> = Object.fromEntries([
  ...names.map((n) => [n, ({ c40: 1, c04: 1.3, c22: 0.4, c30: 0.3, c12: -0.2, c11: 0.1, c10: 0.05, c00: -1 } as Record<string, number>)[n] ?? 0] as const),
  ['sigma', 0.2] as const,
]);

const curve = (q: Readonly<Record<string, number>>): FigureItem[] => planeCurveItems(q, names, exponents, view, 'the quartic', 220);

/** The point A·(t, mt + k) of the plane, for a real chart A read from the parameters. */
function pointOnLine(q: Readonly<Record<string, number>>, m: number, k: number, t: number): [number, number] {
  const Y = m * t + k;
  return [t - q.sigma! * Y, q.sigma! * t + Y];
}

export default defineProblem({
  slug: 'bitangents-of-a-plane-quartic',
  title: 'The 28 bitangents of a plane quartic',
  family: 'plane-curves',
  tags: ['plane curves', 'bitangents', 'quartic', 'Plücker formulas', 'excess intersection'],
  statement:
    'Find every line tangent to a general plane quartic $f(x, y) = \\sum c_{ij} x^i y^j = 0$ ($i + j \\le 4$) at two points. A smooth quartic has exactly $28$ bitangents; a real one has $28$, $16$, $8$ or $4$ real ones, and all $28$ are real when the curve has four ovals.',
  formulation: {
    unknowns: ['m', 'k', 'alpha', 'beta'],
    parameters: [...names, ...chartNames],
    groups: [['m', 'k'], ['alpha', 'beta']],
    equations: (u, q, ops) => {
      // On the line, (x, y) = A·(t, mt + k); q(t) = f(x, y) = Σ q_i t^i must equal q₄·(t² + αt + β)².
      // x = t − σ(mt + k), y = σt + (mt + k), as polynomials in t.
      const x = [ops.neg(ops.mul(q.sigma!, u.k!)), ops.sub(1, ops.mul(q.sigma!, u.m!))];
      const y = [u.k!, ops.add(q.sigma!, u.m!)];
      const inT = substitute(ops, names.map((n) => q[n]!), exponents, [x, y]);
      const [q0, q1, q2, q3, q4] = inT.map((coefficient, i) => {
        if (!coefficient) throw new Error(`bitangents-of-a-plane-quartic: the coefficient of t^${i} vanished identically`);
        return coefficient;
      }) as [ExprNode, ExprNode, ExprNode, ExprNode, ExprNode];
      const a = u.alpha!, b = u.beta!;
      return [
        ops.sub(q3, ops.mul(2, a, q4)),
        ops.sub(q2, ops.mul(ops.add(ops.pow(a, 2), ops.mul(2, b)), q4)),
        ops.sub(q1, ops.mul(2, a, b, q4)),
        ops.sub(q0, ops.mul(ops.pow(b, 2), q4)),
      ];
    },
    description: [
      'Lines are charted as the points $A\\,(t,\\ mt + k)$ with $A = \\begin{pmatrix} 1 & -\\sigma \\\\ \\sigma & 1 \\end{pmatrix}$, where $\\sigma$ is part of the instance: random complex for generic instances, so that no line is special; for the demo a real value of our own, a rotation that keeps every real bitangent at a small slope.',
      'The line is a bitangent when $q(t) = f(A\\,(t,\\ mt + k))$ is a constant times a square, $q(t) = q_4(m)\\,(t^2 + \\alpha t + \\beta)^2$, the roots of $t^2 + \\alpha t + \\beta$ marking the two points of contact.',
      'Comparing the coefficients of $t^3, t^2, t, 1$ gives four equations of degrees $5, 6, 6, 6$ in $(m, k, \\alpha, \\beta)$: Bézout bound $1080$;',
      'with the groups $\\{m, k\\}$ and $\\{\\alpha, \\beta\\}$ (degrees $(4, 1), (4, 2), (4, 2), (4, 2)$) the two-homogeneous bound is $288$, which the solver uses.',
      'Solutions are stored in these chart coordinates $(m, k, \\alpha, \\beta)$.',
    ].join(' '),
  },
  trueCount: {
    value: 28,
    source: {
      ...pluckerBook,
      note: 'The book’s formula for the double tangents of a curve of degree d without singular points, ½d(d − 2)(d² − 9), gives 28 for d = 4 (p. 211, as Cayley cites it in 1849; seen in his Collected Mathematical Papers, vol. 1, p. 446). Zeuthen (1873) sorted the real smooth quartics into six types, and the type fixes the number of real bitangents (as the companion page of Plaumann, Sturmfels and Vinzant’s paper on quartics and their bitangents states). From memory, not re-read: that the book shows a quartic with four ovals and 28 real bitangents, its publisher (Adolph Marcus), and the real counts 28, 16, 8, 4 themselves.',
    },
  },
  publishedGroup: { name: 'Sp(6, 2), the symplectic group over the field of two elements', order: '1451520', citation: 'C. Jordan, Traité des substitutions et des équations algébriques, Gauthier-Villars, Paris 1870; J. Harris, Galois groups of enumerative problems, Duke Math. J. 46 (1979) 685–724' },
  realMaximum: { value: 28, citation: 'J. Plücker, Theorie der algebraischen Curven, Bonn 1839: a quartic of four ovals has all 28 bitangents real; real counts 28, 16, 8, 4 (Zeuthen 1873)' },
  excessNote: [
    'The naive counts, $1080$ (total degree) and $288$ (two-homogeneous), far exceed $28$; the surplus lies at infinity of the charts.',
    'When $q_4(m) = 0$ the line runs in an asymptotic direction of the curve, $q$ drops degree, and $q = q_4\\,(t^2 + \\alpha t + \\beta)^2$ can only be met in the limit with $\\alpha$ or $\\beta$ infinite;',
    'lines escaping to infinity in the $(m, k)$ chart give more limits of the same kind. In our runs on random quartics all $260$ surplus paths of the two-homogeneous start, and all $1052$ of the total-degree start, end at infinity; the record counts them.',
  ].join(' '),
  instances: [
    genericInstance('A random complex quartic', 20260108, 'All 15 coefficients and the chart parameter σ'),
    {
      id: 'stained-glass',
      kind: 'demo',
      label: 'A quartic with four ovals',
      description: 'A stained-glass designer outlines four leaf-shaped panes with one quartic curve, the product of two crossing ellipses nudged by a small constant, and wants every straight lead line that touches the outline twice. All $28$ bitangents are real.',
      seed: 29,
      parameters: demoParameters,
    },
    {
      id: 'single-oval',
      kind: 'demo',
      label: 'A single convex oval',
      description: 'The designer’s second pane is one convex oval, $x^4 + 1.3y^4 + 0.4x^2y^2 + 0.3x^3 - 0.2xy^2 + 0.1xy + 0.05x = 1$. Only $4$ of its $28$ bitangents are real, the least a real quartic can have, and each touches the curve at two complex conjugate points, so none touches the visible oval.',
      seed: 37,
      parameters: ovalParameters,
    },
  ],
  solver: { kind: 'multihomogeneous' },
  drawing: {
      projection: 'Drawn in the (x, y)-plane of the curve itself, with equal scales on both axes; the curve is traced numerically from its equation.',
    window: () => view,
    configuration: curve,
    solution: ([m, k, alpha, beta], q) => {
      const [p0, p1] = [pointOnLine(q, m!, k!, 0), pointOnLine(q, m!, k!, 1)];
      const [dx, dy] = [p1[0] - p0[0], p1[1] - p0[1]];
      const items: FigureItem[] = [{ shape: 'line', a: dy, b: -dx, c: dx * p0[1] - dy * p0[0], layer: 'solution' }];
      const disc = alpha! * alpha! - 4 * beta!;
      if (disc >= 0) {
        for (const t of [(-alpha! + Math.sqrt(disc)) / 2, (-alpha! - Math.sqrt(disc)) / 2]) {
          const [x, y] = pointOnLine(q, m!, k!, t);
          items.push({ shape: 'point', x, y, layer: 'tangency' });
        }
      }
      return items;
    },
  },
});
