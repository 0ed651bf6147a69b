import { defineProblem, type ComplexInput, type ProblemDefinition } from '../../../src/atlas/definition.ts';
import type { FigureItem } from '../../../src/atlas/figure.ts';
import { coefficientNames, monomialExponents } from '../shared/monomials.ts';
import { polynomial } from '../shared/form.ts';
import { gradientOnChart } from '../shared/gradient.ts';
import type { PlaneWindow } from '../shared/contour.ts';
import { planeCurveItems } from '../shared/plane-curve-items.ts';
import { genericInstance } from '../shared/generic-instance.ts';
import { coefficientsOf } from '../shared/numeric-polynomial.ts';
import { fourLobedQuartic } from '../shared/four-lobed-quartic.ts';
import { pluckerBook } from './plucker-book.ts';

const exponents = monomialExponents(2, 4);
const names = coefficientNames('c', 2, 4);
const view: PlaneWindow = { xMin: -3.2, xMax: 3.2, yMin: -3.2, yMax: 3.2 };

/**
 * The demo: the four-lobed quartic E₁·E₂ = 0.1 of the quartic flex page, seen from a lamp at (−0.8, 2.6) above it: on a
 * 0.2 grid of lamp positions in the window no point saw more than 8 real tangents, and this one sees 8 well apart.
 */
const demoQuartic = coefficientsOf(fourLobedQuartic(), exponents);
const lamp = [-0.8, 2.6] as const;

const demoParameters: Record<string, ComplexInput> = Object.fromEntries([...demoQuartic.map((c, m) => [names[m]!, c] as const), ['a', lamp[0]] as const, ['b', lamp[1]] as const]);

const definition: ProblemDefinition = {
  slug: 'tangent-lines-from-a-point-to-a-quartic',
  title: 'The 12 tangent lines from a point to a plane quartic',
  family: 'plane-curves',
  tags: ['plane curves', 'tangent lines', 'class of a curve', 'polar curve', 'Plücker formulas', 'quartic', 'Bézout bound exact'],
  statement: 'Find every line through a general point $(a, b)$ of the plane that is tangent to a general plane quartic $f(x, y) = \\sum c_{ij} x^i y^j = 0$ ($i + j \\le 4$). There are exactly $d(d - 1) = 12$: the class of a smooth quartic, the degree of its dual curve.',
  formulation: {
    unknowns: ['x', 'y'],
    parameters: [...names, 'a', 'b'],
    equations: (u, q, ops) => {
      const c = names.map((n) => q[n]!);
      const [fx, fy, fz] = gradientOnChart(ops, c, exponents, 4, [u.x!, u.y!]);
      return [polynomial(ops, c, exponents, [u.x!, u.y!]), ops.add(ops.mul(q.a!, fx!), ops.mul(q.b!, fy!), fz!)];
    },
    description: [
      'The unknown is the point of contact $(x, y)$. The tangent at a point of the curve passes through $(a, b)$ exactly when the point lies on the polar curve of $(a, b)$, $a F_x + b F_y + F_z = 0$, where $F(x, y, z)$ is the homogenised quartic (Euler’s relation turns the tangent’s equation into this).',
      'On the chart $z = 1$: $f = 0$ of degree $4$ and the polar of degree $3$, Bézout bound $12$, attained.',
      'Solutions are stored as the points of contact; each tangent line is the line through $(a, b)$ and its point.',
    ].join(' '),
  },
  trueCount: {
    value: 12,
    source: {
      ...pluckerBook,
      note: 'The class d(d − 1) of a curve of degree d without singular points (the number of its tangents through a general point), 12 for d = 4, is the first of Plücker’s formulas; it was found before him by Poncelet and Gergonne through polars (from memory). Page numbers not re-read.',
    },
  },
  excessNote: 'None: the polar cubic of a general point meets a general quartic transversally in $12$ finite points, none on the line at infinity, so every path of the total-degree homotopy ends at a point of contact. For special data the excess is real: from a point on the curve, the polar passes through that point and the tangent there counts twice; a bitangent through the point counts twice as well, since both of its points of contact solve.',
  instances: [
    genericInstance('A random complex quartic and point', 20261106, 'All 15 coefficients and the point (a, b)'),
    {
      id: 'lamp-above-a-screen',
      kind: 'demo',
      label: 'A lamp above a four-lobed screen',
      description: 'A lamp hangs at $(-0.8, 2.6)$ above a frosted glass screen whose outline is the four-lobed quartic $E_1 E_2 = 0.1$ (two crossing ellipses, as on the flex page), with a clear oval window in its middle. Each straight edge of light and shadow on the floor is a tangent line from the lamp to an outline. Of the $12$ tangents, $8$ are real.',
      seed: 59,
      parameters: demoParameters,
    },
  ],
  drawing: {
    projection: 'Drawn in the (x, y)-plane of the curve itself, with equal scales on both axes; the curve is traced numerically from its equation.',
    window: () => view,
    configuration: (q) => [...planeCurveItems(q, names, exponents, view, 'the quartic', 220), { shape: 'point', x: q.a!, y: q.b!, layer: 'given', label: 'the point' }],
    solution: ([x, y], q): FigureItem[] => [
      { shape: 'line', a: y! - q.b!, b: q.a! - x!, c: x! * q.b! - y! * q.a!, layer: 'solution' },
      { shape: 'point', x: x!, y: y!, layer: 'tangency' },
    ],
  },
};

export default defineProblem(definition);
