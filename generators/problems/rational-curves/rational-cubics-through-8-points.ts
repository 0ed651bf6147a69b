import { defineProblem, type ComplexInput } from '../../../src/atlas/definition.ts';
import type { FigureItem } from '../../../src/atlas/figure.ts';
import { fitWindow } from '../shared/fit-window.ts';
import { genericInstance } from '../shared/generic-instance.ts';
import { planeCurveItems } from '../shared/plane-curve-items.ts';
import { kontsevichNumbers } from './kontsevich-numbers.ts';
import { CUBIC_EXPONENTS, CUBIC_NAMES, UNKNOWN_COEFFICIENTS, cubicAt, cubicCoefficients, cubicGradient } from './nodal-cubic.ts';

const points = [1, 2, 3, 4, 5, 6, 7, 8] as const;
const pointNames = points.flatMap((i) => [`px${i}`, `py${i}`]);

// Demo data (metres): eight stakes in a lawn, chosen (by a search over our own random layouts) so that all twelve
// rational cubics through them are real.
const stakes: readonly (readonly [number, number])[] = [[-0.5, 0.7], [-3.7, -1.1], [1, 4.3], [0.8, -0.2], [-1.8, -4.6], [2.1, 0.1], [-1.6, 0.9], [-0.4, -0.5]];
const demoParameters: Record<string, ComplexInput> = Object.fromEntries(stakes.flatMap(([x, y], i) => [[`px${i + 1}`, x], [`py${i + 1}`, y]]));

function givenPoints(q: Readonly<Record<string, number>>): FigureItem[] {
  return points.map((i) => ({ shape: 'point', x: q[`px${i}`]!, y: q[`py${i}`]!, layer: 'given', label: `point ${i}` }));
}

const view = (q: Readonly<Record<string, number>>) => fitWindow(givenPoints(q), 0.35);

export default defineProblem({
  slug: 'rational-cubics-through-8-points',
  title: 'Rational cubics through 8 points',
  family: 'rational-curves',
  tags: ['rational curves', 'nodal cubics', 'Kontsevich numbers', 'Gromov–Witten invariants', 'plane curves'],
  statement: [
    'Given eight general points in the plane, find every rational cubic curve through them: a cubic with a node (a crossing or an isolated point), so that it can be traced by one polynomial map $t \\mapsto [x(t) : y(t) : z(t)]$ of degree $3$.',
    'There are exactly $12$ over the complex numbers.',
    `The number is Kontsevich’s $N_3$: his recursion gives the numbers $N_d$ of rational plane curves of degree $d$ through $3d - 1$ general points, ${kontsevichNumbers(6).map((n, d) => `$N_${d + 1} = ${n}$`).join(', ')}, and the generator evaluates it to obtain this page’s count.`,
  ].join(' '),
  formulation: {
    unknowns: [...UNKNOWN_COEFFICIENTS, 'x', 'y'],
    parameters: pointNames,
    groups: [UNKNOWN_COEFFICIENTS, ['x', 'y']],
    equations: (u, q, ops) => {
      const c = cubicCoefficients(u, ops);
      return [
        ...points.map((i) => cubicAt(ops, c, q[`px${i}`]!, q[`py${i}`]!)),
        ...cubicGradient(ops, c, u.x!, u.y!),
      ];
    },
    description: [
      'The unknowns are the cubic $f = x^3 + \\sum c_{ij} x^i y^j$ (nine coefficients, the one of $x^3$ fixed to $1$) and its node $(x, y)$.',
      'Passing through the eight points gives eight linear equations; the node gives the three partial derivatives of the homogenised cubic, $F_x = F_y = F_z = 0$ on the chart $z = 1$, each linear in the coefficients and quadratic in $(x, y)$.',
      'Total degree: Bézout bound $1^8 \\cdot 3^3 = 27$; with the coefficients and the node as two variable groups the two-homogeneous bound is $3 \\cdot 2^2 = 12$, exact.',
      'We chose this implicit formulation over a parametrised map $t \\mapsto [x(t) : y(t) : z(t)]$ fixed at three of the points: that one has ten equations of degree $4$ (Bézout bound $4^{10} = 1048576$; with the curve and each point’s parameter value as separate groups, $6^5 = 7776$), far beyond what a total-degree run can afford.',
      'The parametrised form serves as an independent check in the generator’s tests instead: solved by monodromy from a solution-first seed (a random map first, then points on it), discovery stops at $12$ maps without being told the count, and those maps trace exactly the $12$ cubics found here through the same points.',
    ].join(' '),
  },
  trueCount: {
    value: Number(kontsevichNumbers(3)[2]),
    source: {
      kind: 'published',
      authors: ['M. Kontsevich', 'Yu. Manin'],
      year: 1994,
      title: 'Gromov–Witten classes, quantum cohomology, and enumerative geometry',
      venue: 'Communications in Mathematical Physics 164(3) (1994), 525–562',
      doi: '10.1007/BF02101490',
      bib: { type: 'article', journal: 'Communications in Mathematical Physics', volume: '164', number: '3', pages: '525--562' },
      note: 'The recursion for N_d; N_3 = 12 was known classically as the number of singular members of the pencil of cubics through eight points, 3(d − 1)² for d = 3. Volume and pages as the journal’s first page shows them (a scan of it was seen), the issue as zbMATH gives it, the DOI as a reference list that cites the article gives it.',
    },
  },
  excessNote: [
    'The eight linear equations leave a line of cubics $f_0 + \\lambda f_1$ (the pencil of cubics through the eight points; all its members also pass through a ninth base point), so the problem is really three equations $\\nabla F = 0$ of degree $1$ in $\\lambda$ and $2$ in the node: total degree $27$, true count $12$.',
    'The $15$ surplus paths go to infinity. Homogenising $(\\lambda, x, y)$ together, each equation becomes $w \\cdot A + \\lambda \\cdot B$ with quadrics $A$, $B$; at infinity ($w = 0$) it reduces to $\\lambda B = 0$, which holds on the whole line $w = \\lambda = 0$ (the node runs off faster than $\\lambda$ grows) and at the point where $\\lambda$ alone is infinite.',
    'Keeping $\\lambda$ and the node in separate projective spaces ($\\mathbb{P}^1 \\times \\mathbb{P}^2$) removes that line and that point, and the two-homogeneous start tracks exactly $12$ paths.',
  ].join(' '),
  solver: { kind: 'multihomogeneous' },
  instances: [
    genericInstance('Eight random complex points', 20261208, 'The coordinates of the eight points'),
    {
      id: 'garden-hose',
      kind: 'demo',
      label: 'A garden hose through eight stakes',
      description: 'A gardener has pushed eight stakes into a lawn (units: metres) and wants to lay a long hose through all of them in a cubic curve with a single crossing, the kind of loop a hose makes when it is flipped over once. Every real rational cubic through the stakes is a candidate: its loop point is marked (for some curves it is an isolated real point, where two complex branches cross).',
      seed: 19,
      parameters: demoParameters,
    },
  ],
  drawing: {
    projection: 'Drawn in the plane of the points, with equal scales on both axes; each cubic is traced numerically from its equation and its node is marked.',
    window: (q) => view(q),
    configuration: givenPoints,
    solution: (values, q) => {
      const record: Record<string, number> = { [CUBIC_NAMES[0]!]: 1 };
      UNKNOWN_COEFFICIENTS.forEach((n, m) => (record[n] = values[m]!));
      const curve = planeCurveItems(record, CUBIC_NAMES, CUBIC_EXPONENTS, view(q), 'a rational cubic', 200).map((item): FigureItem => ({ ...item, layer: 'solution' }));
      const [x, y] = values.slice(UNKNOWN_COEFFICIENTS.length);
      return [...curve, { shape: 'point', x: x!, y: y!, layer: 'node', label: 'node' }];
    },
  },
});
