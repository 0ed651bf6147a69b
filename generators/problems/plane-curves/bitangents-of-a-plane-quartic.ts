import { defineProblem, type ComplexInput } from '../../../src/atlas/definition.ts';
import type { FigureItem } from '../../../src/atlas/figure.ts';
import type { ExprNode } from '../../../src/engine/expr/node.ts';
import { coefficientNames, monomialExponents } from '../shared/monomials.ts';
import { substitute } from '../shared/univariate.ts';
import type { PlaneWindow } from '../shared/contour.ts';
import { planeCurveItems } from '../shared/plane-curve-items.ts';
import { genericInstance } from '../shared/generic-instance.ts';
import { clipLine } from '../shared/segment.ts';
import { coefficientsOf, linearForm, product, sum } from '../shared/numeric-polynomial.ts';

const exponents = monomialExponents(2, 4);
const names = coefficientNames('c', 2, 4);
const view: PlaneWindow = { xMin: -3.2, xMax: 3.2, yMin: -3.2, yMax: 3.2 };

/**
 * Demo quartic in the spirit of Plücker's example: two crossing ellipses E₁, E₂ (semi-axes 2 × 1.1 and 1.2 × 2.1)
 * turned by 0.3 rad about (0.2, −0.1); the curve E₁·E₂ + 0.04 = 0 splits into four ovals near the four lunes
 * where exactly one ellipse is negative. The turn keeps every bitangent away from the vertical.
 */
function demoQuartic(): number[] {
  const [cos, sin] = [Math.cos(0.3), Math.sin(0.3)];
  const X = linearForm([cos, sin], -(cos * 0.2 + sin * -0.1));
  const Y = linearForm([-sin, cos], -(-sin * 0.2 + cos * -0.1));
  const ellipse = (a: number, b: number) => sum(product(X, X, linearForm([0, 0], 1 / (a * a))), product(Y, Y, linearForm([0, 0], 1 / (b * b))), linearForm([0, 0], -1));
  return coefficientsOf(sum(product(ellipse(2, 1.1), ellipse(1.2, 2.1)), linearForm([0, 0], 0.04)), exponents);
}

const demoParameters: Record<string, ComplexInput> = Object.fromEntries(demoQuartic().map((c, m) => [names[m]!, c]));

const curve = (q: Readonly<Record<string, number>>): FigureItem[] => planeCurveItems(q, names, exponents, view, 'the quartic', 220);

export default defineProblem({
  slug: 'bitangents-of-a-plane-quartic',
  title: 'The 28 bitangents of a plane quartic',
  family: 'plane-curves',
  tags: ['plane curves', 'bitangents', 'quartic', 'Plücker formulas', 'excess intersection'],
  statement:
    'Find every line tangent to a general plane quartic $f(x, y) = \\sum c_{ij} x^i y^j = 0$ ($i + j \\le 4$) at two points. A smooth quartic has exactly $28$ bitangents; a real one has $28$, $16$, $8$ or $4$ real ones, and all $28$ are real when the curve has four ovals.',
  formulation: {
    unknowns: ['m', 'k', 'alpha', 'beta'],
    parameters: names,
    groups: [['m', 'k'], ['alpha', 'beta']],
    equations: (u, q, ops) => {
      // q(x) = f(x, mx + k) = Σ q_i x^i must equal q₄·(x² + αx + β)²: the line touches the curve where x² + αx + β = 0.
      const inX = substitute(ops, names.map((n) => q[n]!), exponents, [[null, ops.constant(1)], [u.k!, u.m!]]);
      const [q0, q1, q2, q3, q4] = inX.map((c, i) => {
        if (!c) throw new Error(`bitangents-of-a-plane-quartic: the coefficient of x^${i} vanished identically`);
        return c;
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
      'A non-vertical line $y = mx + k$ is a bitangent when $q(x) = f(x, mx + k)$ is a constant times a square, $q(x) = q_4(m)\\,(x^2 + \\alpha x + \\beta)^2$;',
      'the roots of $x^2 + \\alpha x + \\beta$ are the two points of contact. Comparing the coefficients of $x^3, x^2, x, 1$ gives four equations of degrees $5, 6, 6, 6$ in $(m, k, \\alpha, \\beta)$:',
      'Bézout bound $1080$; with the groups $\\{m, k\\}$ and $\\{\\alpha, \\beta\\}$ (degrees $(4, 1), (4, 2), (4, 2), (4, 2)$) the two-homogeneous bound is $288$.',
    ].join(' '),
  },
  trueCount: {
    value: 28,
    source: {
      kind: 'published',
      authors: ['J. Plücker'],
      year: 1839,
      title: 'Theorie der algebraischen Curven',
      venue: 'Adolph Marcus, Bonn',
      note: 'Plücker’s formulas (1834) give ½d(d − 2)(d − 3)(d + 3) = 28 bitangents for d = 4; his 1839 book has the quartic with four ovals and 28 real bitangents. Details from memory.',
    },
  },
  excessNote: 'PENDING',
  instances: [
    genericInstance('A random complex quartic', 20260108, 'All 15 coefficients'),
    {
      id: 'stained-glass',
      kind: 'demo',
      label: 'A quartic with four ovals',
      description: 'A stained-glass designer outlines four leaf-shaped panes with one quartic curve, the product of two crossing ellipses nudged by a small constant, and wants every straight lead line that touches the outline twice. All $28$ bitangents are real.',
      seed: 29,
      parameters: demoParameters,
    },
  ],
  drawing: {
    window: () => view,
    configuration: curve,
    solution: ([m, k, alpha, beta]) => {
      const items: FigureItem[] = [];
      const segment = clipLine(0, k!, 1, m!, view);
      if (segment) items.push({ shape: 'polyline', points: segment, closed: false, layer: 'solution' });
      const disc = alpha! * alpha! - 4 * beta!;
      if (disc >= 0) for (const x of [(-alpha! + Math.sqrt(disc)) / 2, (-alpha! - Math.sqrt(disc)) / 2]) items.push({ shape: 'point', x, y: m! * x + k!, layer: 'tangency' });
      return items;
    },
  },
});
