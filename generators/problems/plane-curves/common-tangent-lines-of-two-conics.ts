import { defineProblem, type ComplexInput } from '../../../src/atlas/definition.ts';
import type { FigureItem } from '../../../src/atlas/figure.ts';
import { coefficientNames, monomialExponents } from '../shared/monomials.ts';
import { genericInstance } from '../shared/generic-instance.ts';
import { coefficientsOf } from '../shared/numeric-polynomial.ts';
import { ellipseForm } from '../shared/ellipse-form.ts';
import { fitWindow } from '../shared/fit-window.ts';
import { fultonCurves } from '../shared/fulton-curves.ts';

type Six = [number, number, number, number, number, number];
const exponents = monomialExponents(2, 2);
const pNames = coefficientNames('p', 2, 2);
const qNames = coefficientNames('q', 2, 2);

/** The symmetric matrix of ax² + bxy + cy² + dx + ey + f (coefficients in that order), entries as given. */
function conicMatrix<T>([a, b, c, d, e, f]: readonly T[], half: (v: T) => T): T[][] {
  return [[a!, half(b!), half(d!)], [half(b!), c!, half(e!)], [half(d!), half(e!), f!]];
}

/** The point of contact of the line ℓ = (u, v, 1) with the conic: adj(C)·ℓ in affine coordinates (null at infinity). */
function contactPoint(coefficients: readonly number[], u: number, v: number): [number, number] | null {
  const m = conicMatrix(coefficients, (x) => x / 2);
  const cofactor = (i: number, j: number): number => {
    const [r0, r1] = [0, 1, 2].filter((k) => k !== i) as [number, number];
    const [c0, c1] = [0, 1, 2].filter((k) => k !== j) as [number, number];
    return ((i + j) % 2 === 0 ? 1 : -1) * (m[r0]![c0]! * m[r1]![c1]! - m[r0]![c1]! * m[r1]![c0]!);
  };
  const p = [0, 1, 2].map((i) => cofactor(i, 0) * u + cofactor(i, 1) * v + cofactor(i, 2));
  return Math.abs(p[2]!) > 1e-12 * Math.hypot(...p) ? [p[0]! / p[2]!, p[1]! / p[2]!] : null;
}

// Demo: two oval medallions of our own, semi-axes 1.6 × 1 turned 0.4 rad about (2, 3) and 1.2 × 0.7 turned −0.5 rad
// about (5.5, 2.2), placed away from the origin so that no common tangent passes near it (the chart misses those lines).
const demo = { p: coefficientsOf(ellipseForm(1.6, 1, 0.4, 2, 3), exponents), q: coefficientsOf(ellipseForm(1.2, 0.7, -0.5, 5.5, 2.2), exponents) };
const demoParameters: Record<string, ComplexInput> = Object.fromEntries([...pNames.map((n, m) => [n, demo.p[m]!] as const), ...qNames.map((n, m) => [n, demo.q[m]!] as const)]);
const conics = (q: Readonly<Record<string, number>>): FigureItem[] => [
  { shape: 'conic', coefficients: pNames.map((n) => q[n]!) as Six, layer: 'given', label: 'first conic' },
  { shape: 'conic', coefficients: qNames.map((n) => q[n]!) as Six, layer: 'given', label: 'second conic' },
];

export default defineProblem({
  slug: 'common-tangent-lines-of-two-conics',
  title: 'The 4 common tangent lines of two conics',
  family: 'plane-curves',
  tags: ['plane curves', 'tangent lines', 'duality', 'dual conic', 'conics', 'Bézout bound exact'],
  statement: 'Find every line tangent to both of two general plane conics $p(x, y) = 0$ and $q(x, y) = 0$. There are exactly $4$: the dual curves of the two conics are conics in the plane of lines, and they meet in $2 \\cdot 2 = 4$ points. Two disjoint real ovals have $4$ real common tangents, two crossing and two not.',
  formulation: {
    unknowns: ['u', 'v'],
    parameters: [...pNames, ...qNames],
    equations: (w, c, ops) => {
      const line = [w.u!, w.v!, ops.constant(1)];
      const bordered = (names: readonly string[]) => {
        const m = conicMatrix(names.map((n) => c[n]!), (x) => ops.mul(0.5, x));
        return ops.det([...m.map((row, i) => [...row, line[i]!]), [...line, ops.constant(0)]]);
      };
      return [bordered(pNames), bordered(qNames)];
    },
    description: [
      'A line is written $u x + v y + 1 = 0$, a chart of the dual plane that misses only the lines through the origin.',
      'It is tangent to the conic with symmetric matrix $C$ when $\\ell^{\\mathsf T} \\operatorname{adj}(C)\\, \\ell = 0$ for $\\ell = (u, v, 1)$, computed as minus the bordered determinant $\\det \\begin{pmatrix} C & \\ell \\\\ \\ell^{\\mathsf T} & 0 \\end{pmatrix}$: one quadric in $(u, v)$ per conic, Bézout bound $4$, attained.',
    ].join(' '),
  },
  trueCount: {
    value: 4,
    source: {
      ...fultonCurves,
      note: 'Bézout’s theorem for plane curves, applied in the dual plane: the tangent lines of a smooth conic form a conic there (its equation is the adjugate matrix), and two general conics meet in 4 points. The duality step is classical (Poncelet, Plücker; from memory).',
    },
  },
  realMaximum: { value: 4, citation: 'common practice: two disjoint real ellipses, each outside the other, have four real common tangents' },
  excessNote: 'None: the two dual conics meet transversally in $4$ points of the dual plane, and for general conics none of the common tangents passes through the origin, the one line of the chart’s complement where solutions could hide. In special position the count drops by coincidence: two conics tangent to each other share that tangent twice.',
  instances: [
    genericInstance('Two random complex conics', 20261107, 'All 12 coefficients'),
    {
      id: 'two-medallions',
      kind: 'demo',
      label: 'Two oval medallions',
      description: 'A sign painter frames two oval medallions on a shop board, one $3.2$ by $2$ units, one $2.4$ by $1.4$, and joins them with the straight strokes that touch both. All $4$ common tangents are real: two outer strokes and two that cross between the medallions.',
      seed: 61,
      parameters: demoParameters,
    },
  ],
  drawing: {
    projection: 'Drawn in the (x, y)-plane of the conics, with equal scales on both axes.',
    window: (q, items) => fitWindow([...conics(q), ...(items ?? []).filter((i) => i.shape !== 'line')], 0.12),
    configuration: conics,
    solution: ([u, v], q): FigureItem[] => [
      { shape: 'line', a: u!, b: v!, c: 1, layer: 'solution' },
      ...[pNames, qNames].flatMap((names) => {
        const point = contactPoint(names.map((n) => q[n]!), u!, v!);
        return point ? [{ shape: 'point' as const, x: point[0], y: point[1], layer: 'tangency' }] : [];
      }),
    ],
  },
});
