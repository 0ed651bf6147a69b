import { defineProblem, type ComplexInput } from '../../../src/atlas/definition.ts';
import type { FigureItem } from '../../../src/atlas/figure.ts';
import { fitWindow } from '../shared/fit-window.ts';
import { genericInstance } from '../shared/generic-instance.ts';
import { storedSetReads, storedSetSolver } from '../shared/stored-set.ts';
import { chartedToShown } from './charted-map.ts';
import { kontsevichNumbers } from './kontsevich-numbers.ts';
import { MAP_SET_SEEDS, mapStoreSpec } from './map-store.ts';
import { parametrisedMapFormulation } from './parametrised-map.ts';
import { realMapCoefficients, realMapPolylines } from './real-map-polylines.ts';

const DEGREE = 4;
const COUNT = Number(kontsevichNumbers(DEGREE)[DEGREE - 1]);
const points = Array.from({ length: 3 * DEGREE - 1 }, (_, k) => k + 1);
const store = mapStoreSpec(DEGREE, MAP_SET_SEEDS[DEGREE]!, COUNT);

// Demo data (metres): eleven waypoints over a sports field for a light-painting drone, chosen by a search over our own
// random layouts (quartic-demo-search.ts, seeds 1–5: 240, 244, 253, 126 and 254 real; seed 3 kept: 253 real with all
// 620 found, where seed 5 lost 4 paths).
const waypoints: readonly (readonly [number, number])[] = [[9, 3.5], [-4.5, 12], [3.5, -2], [-14, 10.5], [5.5, -7.5], [15.5, 9.5], [1.5, 10], [-16.5, -0.5], [11.5, 2.5], [0, 7], [13.5, 4.5]];
const demoParameters: Record<string, ComplexInput> = Object.fromEntries(waypoints.flatMap(([x, y], i) => [[`px${i + 1}`, x], [`py${i + 1}`, y]]));

function givenPoints(q: Readonly<Record<string, number>>): FigureItem[] {
  return points.map((i) => ({ shape: 'point', x: q[`px${i}`]!, y: q[`py${i}`]!, layer: 'given', label: `point ${i}` }));
}

const view = (q: Readonly<Record<string, number>>) => fitWindow(givenPoints(q), 0.3);

export default defineProblem({
  slug: 'rational-quartics-through-11-points',
  title: 'Rational quartics through 11 points',
  family: 'rational-curves',
  tags: ['rational curves', 'Kontsevich numbers', 'Gromov–Witten invariants', 'plane curves', 'monodromy'],
  statement: [
    'Given eleven general points in the plane, find every rational quartic curve through them: a curve of degree $4$ with three nodes (crossings, isolated points, or a pair of complex conjugate ones), so that it can be traced by one polynomial map $t \\mapsto [x(t) : y(t) : z(t)]$ of degree $4$.',
    `There are exactly $${COUNT}$ over the complex numbers.`,
    'The number is Kontsevich’s $N_4$, from his recursion for the numbers $N_d$ of rational plane curves of degree $d$ through $3d - 1$ general points; the generator evaluates the recursion to obtain this page’s count.',
  ].join(' '),
  formulation: parametrisedMapFormulation(DEGREE, [
    'The unknowns describe the map $\\varphi(t) = P_1 + c_1 t + c_2 t^2 + c_3 t^3 + \\lambda P_3 t^4$, where $P_i = (x_i, y_i, 1)$ is point $i$ and $c_3 = \\mu P_2 - P_1 - c_1 - c_2 - \\lambda P_3$, so that $\\varphi(0) = P_1$, $\\varphi(1) = \\mu P_2$ and the leading coefficient is $\\lambda P_3$ (so $t = \\infty$ goes to point $3$): eight unknowns $\\lambda, \\mu, c_1, c_2$ for the map, and one parameter value $t_i$ for each of points $4, \\dots, 11$.',
    'Point $i$ lies on the curve when $x(t_i) - x_i\\, z(t_i) = y(t_i) - y_i\\, z(t_i) = 0$: sixteen equations of degree $5$ (linear in the map, quartic in $t_i$) in sixteen unknowns.',
    'Fixing where three of the points sit ($t = 0, 1, \\infty$) and the scale ($\\varphi(0)$ equal to $P_1$, not a multiple) removes the reparametrisations $t \\mapsto (at + b)/(ct + d)$ and the rescaling of $\\varphi$: a general point of a rational quartic is a smooth point with a single preimage, so each curve is one solution, counted once.',
    'Bézout bound $5^{16} = 152587890625$; with the map and each $t_i$ as separate variable groups the multihomogeneous bound is $8^8 = 16777216$, both far beyond what a start-system run can afford.',
    `So the page is solved by monodromy instead (Duff et al. 2019): a random complex map and random $t_i$ first, the points on it second, then loops in the space of points until the ${COUNT} maps were found; this set is stored with the generator, and every instance is reached from it by one parameter homotopy.`,
    'The paths are tracked in random charts, in double-double arithmetic: $\\varphi(0) = \\alpha P_1$ with a random linear normalisation of $(\\alpha, \\lambda, \\mu, c_1, c_2)$, and each $t_i$ as a pair $(s_i : u_i)$ with a random linear normalisation; the table shows $\\lambda / \\alpha$, …, $t_i = u_i / s_i$.',
  ].join(' ')),
  trueCount: {
    value: COUNT,
    source: {
      kind: 'published',
      authors: ['M. Kontsevich', 'Yu. Manin'],
      year: 1994,
      title: 'Gromov–Witten classes, quantum cohomology, and enumerative geometry',
      venue: 'Communications in Mathematical Physics 164 (1994), 525–562',
      bib: { type: 'article', journal: 'Communications in Mathematical Physics', volume: '164', pages: '525--562' },
      note: 'The recursion for N_d; N_4 = 620 follows from N_1 = 1, N_2 = 1, N_3 = 12. The number 620 was also obtained by Zeuthen in the nineteenth century (from memory, not re-read).',
    },
  },
  excessNote: [
    `Neither naive count was run: the ${COUNT} maps come from monodromy, so this account is read off the equations, not measured.`,
    'The surplus of both bounds lies on degenerate maps with a base point: if $\\varphi(t_0) = 0$ for some $t_0$ (its image is then a curve of lower degree), then $t_i = t_0$ satisfies both equations of point $i$ whatever the point is.',
    'With the map in $\\mathbb{P}^8$ (its scale $\\alpha$ at $t = 0$ restored), the maps vanishing at a given $t_0$ form a $\\mathbb{P}^5$, so putting every $t_i$ at $t_0$ gives a six-dimensional family of false solutions, and there are mixed ones in which some points sit at a base point and the others on a lower-degree image through them.',
    'The three fixed values are special cases of it: $t_i = 0$, $1$ or $\\infty$ forces $\\alpha$, $\\mu$ or $\\lambda$ to vanish, that is a base point there.',
    'The total-degree count, which homogenises all sixteen unknowns together, has far more at infinity: there the top-degree part of each equation is $\\lambda t_i^4 (x_3 - x_i)$ or $\\lambda t_i^4 (y_3 - y_i)$, and all of them vanish on the fourteen-dimensional part $\\lambda = 0$ of the hyperplane at infinity. The multihomogeneous count keeps the map and each $t_i$ apart, which removes that, but still meets the base-point families.',
    'Near such a degeneration a genuine solution is badly scaled: when the preimages of most points crowd around $t = 1$ or $t = \\infty$, $\\mu$ or $\\lambda$ is tiny and some $t_i$ are in the hundreds (we measured conditions up to $10^{15}$ with $\\alpha = 1$ and $t_i$ affine at random complex points), which is why the paths are tracked in the random charts described above.',
    'The certificates are checked on the equations shown here ($\\alpha = 1$, $t_i$ affine), where that scaling remains: on the drone waypoints $9$ of the $620$ maps ($8$ of them real), with conditions between $3 \\cdot 10^{12}$ and $7 \\cdot 10^{14}$ in the tracked charts, are found and solve to a residual below $10^{-10}$, but the Krawczyk test in binary64 intervals does not prove them.',
  ].join(' '),
  solver: storedSetSolver(store, { toShown: (x) => chartedToShown(DEGREE, x) }),
  reads: storedSetReads(store),
  instances: [
    genericInstance('Eleven random complex points', 20261211, 'The coordinates of the eleven points'),
    {
      id: 'drone-waypoints',
      kind: 'demo',
      label: 'A light-painting drone through eleven waypoints',
      description: 'A light-painting drone is to trace one closed quartic stroke over a sports field (units: metres) through eleven waypoints marked on the grass, a curve that may cross itself up to three times. Every real rational quartic through the waypoints is a candidate stroke; each is drawn from its parametrisation (isolated real nodes, where two complex branches meet, are not drawn).',
      seed: 23,
      parameters: demoParameters,
    },
  ],
  drawing: {
    projection: 'Drawn in the plane of the points, with equal scales on both axes; each quartic is sampled from its parametrisation over the real projective line.',
    window: (q) => view(q),
    configuration: givenPoints,
    solution: (values, q) => realMapPolylines(realMapCoefficients(DEGREE, values, q), view(q))
      .map((path): FigureItem => ({ shape: 'polyline', points: path, closed: false, layer: 'solution', label: 'a rational quartic' })),
  },
});
