import { defineProblem, type ComplexInput } from '../../../src/atlas/definition.ts';
import type { FigureItem } from '../../../src/atlas/figure.ts';
import type { ExprNode } from '../../../src/engine/expr/node.ts';
import { coefficientNames, monomialExponents } from '../shared/monomials.ts';
import { substitute } from '../shared/univariate.ts';
import type { PlaneWindow } from '../shared/contour.ts';
import { planeCurveItems } from '../shared/plane-curve-items.ts';
import { genericInstance } from '../shared/generic-instance.ts';
import { normalizeByLargest } from '../shared/normalize.ts';
import { imageLine, type ComplexMatrix2 } from '../shared/complex-chart.ts';
import { coefficientsOf, linearForm, product, sum } from '../shared/numeric-polynomial.ts';

const exponents = monomialExponents(2, 4);
const names = coefficientNames('c', 2, 4);
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

const demoParameters: Record<string, ComplexInput> = Object.fromEntries(demoQuartic().map((c, m) => [names[m]!, c]));

const curve = (q: Readonly<Record<string, number>>): FigureItem[] => planeCurveItems(q, names, exponents, view, 'the quartic', 220);

/** The fixed complex chart of lines: (x, y) = A·(X, Y) with lines Y = mX + k; our own arbitrary non-real numbers. */
export const lineChart: ComplexMatrix2 = [[1, 0], [0.35, 0.55], [-0.25, 0.45], [1, 0]];

/**
 * The real points where the real line ux + vy + w = 0 touches the quartic, read off its restriction
 * q(t) = f(P + tD) = q₄(t² + αt + β)², α = q₃/(2q₄), β = (q₂/q₄ − α²)/2 (no solving); none if they are not real.
 */
function contactPoints(q: Readonly<Record<string, number>>, u: number, v: number, w: number): [number, number][] {
  const n = u * u + v * v;
  if (!(n > 0)) return [];
  const [px, py, dx, dy] = [(-w * u) / n, (-w * v) / n, -v, u];
  const x = linearForm([dx], px), y = linearForm([dy], py);
  const restricted = sum(...exponents.map(([i, j], m) => product(linearForm([0], q[names[m]!]!), ...Array(i!).fill(x), ...Array(j!).fill(y))));
  const [q4, q3, q2] = ['4', '3', '2'].map((k) => restricted.get(k) ?? 0) as [number, number, number];
  if (Math.abs(q4) < 1e-12) return [];
  const alpha = q3 / (2 * q4), beta = (q2 / q4 - alpha * alpha) / 2, disc = alpha * alpha - 4 * beta;
  if (disc < 0) return [];
  return [(-alpha + Math.sqrt(disc)) / 2, (-alpha - Math.sqrt(disc)) / 2].map((t) => [px + t * dx, py + t * dy]);
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
    parameters: names,
    groups: [['m', 'k'], ['alpha', 'beta']],
    equations: (u, q, ops) => {
      // On the line, (x, y) = A·(t, mt + k); q(t) = f(x, y) = Σ q_i t^i must equal q₄·(t² + αt + β)².
      const c = (z: readonly [number, number]) => ops.constant(z[0], z[1]);
      const [a11, a12, a21, a22] = lineChart;
      const x = [ops.mul(c(a12), u.k!), ops.add(c(a11), ops.mul(c(a12), u.m!))];
      const y = [ops.mul(c(a22), u.k!), ops.add(c(a21), ops.mul(c(a22), u.m!))];
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
      'Lines are charted as $Y = mX + k$ in complex coordinates $(X, Y)$ with $(x, y) = A\\,(X, Y)$ for a fixed complex matrix $A$ of our own, so that no real line is at infinity of the chart.',
      'The line is a bitangent when $q(t) = f(A\\,(t,\\ mt + k))$ is a constant times a square, $q(t) = q_4(m)\\,(t^2 + \\alpha t + \\beta)^2$, the roots of $t^2 + \\alpha t + \\beta$ marking the two points of contact.',
      'Comparing the coefficients of $t^3, t^2, t, 1$ gives four equations of degrees $5, 6, 6, 6$ in $(m, k, \\alpha, \\beta)$: Bézout bound $1080$;',
      'with the groups $\\{m, k\\}$ and $\\{\\alpha, \\beta\\}$ (degrees $(4, 1), (4, 2), (4, 2), (4, 2)$) the two-homogeneous bound is $288$, which the solver uses.',
      'Solutions are stored as the line $ux + vy + w = 0$, scaled so that its largest coefficient is $1$.',
    ].join(' '),
    coordinates: {
      names: ['u', 'v', 'w'],
      map: (x) => normalizeByLargest(imageLine(lineChart, [x[0]!, x[1]!], [x[2]!, x[3]!])),
    },
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
  excessNote: [
    'The naive counts, $1080$ (total degree) and $288$ (two-homogeneous), far exceed $28$; the surplus lies at infinity of the charts.',
    'When $q_4(m) = 0$ the line runs in an asymptotic direction of the curve, $q$ drops degree, and $q = q_4\\,(t^2 + \\alpha t + \\beta)^2$ can only be met in the limit with $\\alpha$ or $\\beta$ infinite;',
    'lines escaping to infinity in the $(m, k)$ chart give more limits of the same kind. In our runs on random quartics all $260$ surplus paths of the two-homogeneous start, and all $1052$ of the total-degree start, end at infinity; the record counts them.',
  ].join(' '),
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
  solver: { kind: 'multihomogeneous' },
  drawing: {
    window: () => view,
    configuration: curve,
    solution: ([u, v, w], q) => [
      { shape: 'line', a: u!, b: v!, c: w!, layer: 'solution' },
      ...contactPoints(q, u!, v!, w!).map(([x, y]): FigureItem => ({ shape: 'point', x, y, layer: 'tangency' })),
    ],
  },
});
