import { defineProblem, type ComplexInput } from '../../../src/atlas/definition.ts';
import type { SpaceItem } from '../../../src/atlas/space-figure.ts';
import { clearestSight } from '../../../src/plots/clearest-sight.ts';
import { coefficientNames, monomialExponents } from '../shared/monomials.ts';
import { polynomial } from '../shared/form.ts';
import { gradientOnChart } from '../shared/gradient.ts';
import { genericInstance } from '../shared/generic-instance.ts';
import { coefficientsOf, linearForm, product, sum } from '../shared/numeric-polynomial.ts';
import { boxEdges } from '../shared/space-box.ts';
import { spaceSections } from '../shared/space-sections.ts';
import { euclideanDistanceDegreePaper } from './ed-degree-source.ts';

const exponents = monomialExponents(3, 2);
const names = coefficientNames('q', 3, 2);
const FRAME = 2.2;

// Demo: an egg-shaped shell, the ellipsoid x²/4 + y²/2.25 + z²/1.2 = 1 with small mixed and linear terms of our own
// (0.1xy − 0.06yz + 0.05x) so that its axes are not the coordinate axes, seen from a lamp at (0.3, −0.2, 0.15)
// near its middle, inside the surface of its centres of curvature, where all 6 normals through a point are real.
const [X, Y, Z] = [linearForm([1, 0, 0]), linearForm([0, 1, 0]), linearForm([0, 0, 1])];
const k = (c: number) => linearForm([0, 0, 0], c);
const shell = coefficientsOf(sum(product(X, X, k(1 / 4)), product(Y, Y, k(1 / 2.25)), product(Z, Z, k(1 / 1.2)), product(X, Y, k(0.1)), product(Y, Z, k(-0.06)), linearForm([0.05, 0, 0], -1)), exponents);
const demoParameters: Record<string, ComplexInput> = Object.fromEntries([...shell.map((c, m) => [names[m]!, c] as const), ['a', 0.3] as const, ['b', -0.2] as const, ['c', 0.15] as const]);

/** The quadric's value at a point, from real parameters. */
const valueAt = (q: Readonly<Record<string, number>>) => (x: number, y: number, z: number): number =>
  exponents.reduce((s, [i, j, l], m) => s + q[names[m]!]! * x ** i! * y ** j! * z ** l!, 0);

const configuration = (q: Readonly<Record<string, number>>): SpaceItem[] => [
  ...boxEdges(FRAME, 'construction', 'the cube from −2.2 to 2.2'),
  ...spaceSections(valueAt(q), [-0.9, -0.45, 0, 0.45, 0.9], FRAME, 'given', 'sections of the quadric'),
  { shape: 'dot', at: [q.a!, q.b!, q.c!], layer: 'given', label: 'the point' },
];

export default defineProblem({
  slug: 'euclidean-distance-degree-of-a-quadric-surface',
  title: 'The 6 critical distances from a point to a quadric surface',
  family: 'distance-and-optimisation',
  tags: ['Euclidean distance degree', 'critical points', 'nearest point', 'optimisation', 'quadric surfaces', '3-space', 'Lagrange multipliers'],
  statement: 'Given a general quadric surface $f(x, y, z) = 0$ in 3-space ($f$ of degree $2$ with $10$ coefficients) and a general point $(a, b, c)$, find every critical point of the squared distance $(x - a)^2 + (y - b)^2 + (z - c)^2$ on the surface: the points where the line to $(a, b, c)$ is normal to the surface. For general data there are exactly $6$, the Euclidean distance degree of a general quadric surface. For an ellipsoid and a point near its centre all $6$ are real.',
  formulation: {
    unknowns: ['x', 'y', 'z', 'lambda'],
    parameters: [...names, 'a', 'b', 'c'],
    groups: [['x', 'y', 'z'], ['lambda']],
    equations: (u, q, ops) => {
      const coefficients = names.map((n) => q[n]!);
      const point = [u.x!, u.y!, u.z!];
      const gradient = gradientOnChart(ops, coefficients, exponents, 2, point);
      return [
        ...[q.a!, q.b!, q.c!].map((given, i) => ops.sub(ops.sub(point[i]!, given), ops.mul(u.lambda!, gradient[i]!))),
        polynomial(ops, coefficients, exponents, point),
      ];
    },
    description: [
      'Lagrange’s condition: $(x - a, y - b, z - c) = \\lambda \\nabla f$ and $f = 0$, with the multiplier $\\lambda$ as a fourth unknown.',
      'Three equations of degree $2$ ($\\lambda$ times a linear gradient) and $f$ of degree $2$: Bézout bound $16$;',
      'with the groups $\\{x, y, z\\}$ and $\\{\\lambda\\}$ (bidegrees $(1, 1)$ three times and $(2, 0)$) the two-homogeneous bound is $6$, the true count, and the solver uses it.',
      'Solutions are stored as the points $(x, y, z)$; $\\lambda$ is dropped.',
    ].join(' '),
    coordinates: { names: ['x', 'y', 'z'], map: (p) => p.slice(0, 6) },
  },
  trueCount: {
    value: 6,
    source: {
      ...euclideanDistanceDegreePaper,
      note: 'A general quadric hypersurface in n-space has Euclidean distance degree 2n, 6 for a surface in 3-space (the case d = 2 of the paper’s formula d·((d − 1)ⁿ − 1)/(d − 2), read as its limit 2n). Volume, issue, pages and DOI as the publisher’s page for the article gives them; the proposition and page that state the formula were not re-read.',
    },
  },
  excessNote: 'The total-degree count $16$ exceeds $6$ by $10$, all at infinity. Homogenise with $(x : y : z : \\lambda : w)$ and write $f = Q + L + k$ with $Q$ quadratic of matrix $A$: on the hyperplane $w = 0$ the top-degree terms are $-2\\lambda A (x, y, z)^{\\mathsf T}$ and $Q(x, y, z)$, which vanish on the conic $\\lambda = Q = 0$ and at the point where only $\\lambda$ is nonzero. The surplus paths end there (in our total-degree run on the generic instance: $10$ at infinity, none failed). Keeping $\\lambda$ in a group of its own removes the surplus: the two-homogeneous start has exactly $6$ paths. For special quadrics the count drops: a sphere has Euclidean distance degree $2$, the nearest and the farthest point.',
  instances: [
    genericInstance('A random complex quadric and point', 20261113, 'All 10 coefficients and the point (a, b, c)'),
    {
      id: 'lamp-in-a-shell',
      kind: 'demo',
      label: 'A lamp inside an egg-shaped shell',
      description: 'A lamp hangs at $(0.3, -0.2, 0.15)$ inside an egg-shaped glass shell, the ellipsoid $x^2/4 + y^2/2.25 + z^2/1.2 + 0.1xy - 0.06yz + 0.05x = 1$. A ray from the lamp comes straight back only where it meets the shell at a right angle, at the critical points of the distance: all $6$ are real, the nearest and the farthest among them.',
      seed: 89,
      parameters: demoParameters,
    },
  ],
  solver: { kind: 'multihomogeneous' },
  drawing: {
    kind: 'space',
    projection: 'The quadric is drawn by five horizontal sections inside the cube from −2.2 to 2.2 on each axis (edges dashed), and each real critical point is joined to the given point.',
    sight: (_, items) => clearestSight(items.filter((i) => i.shape === 'dot')),
    configuration,
    solution: ([x, y, z], q): SpaceItem[] => [
      { shape: 'stick', from: [q.a!, q.b!, q.c!], to: [x!, y!, z!], layer: 'normals' },
      { shape: 'dot', at: [x!, y!, z!], layer: 'solution' },
    ],
  },
});
