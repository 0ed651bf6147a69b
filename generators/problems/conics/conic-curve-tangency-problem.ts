import type { ComplexInput, ProblemDefinition } from '../../../src/atlas/definition.ts';
import type { FigureItem } from '../../../src/atlas/figure.ts';
import type { ExprNode } from '../../../src/engine/index.ts';
import { coefficientNames, monomialExponents } from '../shared/monomials.ts';
import { polynomial } from '../shared/form.ts';
import { gradientOnChart } from '../shared/gradient.ts';
import type { PlaneWindow } from '../shared/contour.ts';
import { planeCurveItems } from '../shared/plane-curve-items.ts';
import { genericInstance } from '../shared/generic-instance.ts';
import { normalizeByLargest } from '../shared/normalize.ts';
import { CONIC_LETTERS } from './conic-names.ts';
import { characteristicNumbers, tangencyQuadric } from './point-line-conditions.ts';
import { lineContactPoint, type ConicCoefficients } from './conic-geometry.ts';
import { PLANE_PROJECTION } from './ladder-source.ts';
import { classAndOrderSource } from './class-and-order-source.ts';

/** A real demo of our own: points (x, y), lines (u, v, w) meaning ux + vy + w = 0, the curve's coefficients (monomialExponents order), its view. */
export interface ConicCurveDemo {
  readonly id: string;
  readonly label: string;
  readonly description: string;
  readonly seed: number;
  readonly points: readonly (readonly [number, number])[];
  readonly lines: readonly (readonly [number, number, number])[];
  readonly curve: readonly number[];
  readonly view: PlaneWindow;
}

/** What distinguishes one "conics through p points, tangent to l lines and to one curve of degree d" page (p + l = 4). */
export interface ConicCurveSpec {
  readonly slug: string;
  readonly title: string;
  readonly points: number;
  readonly lines: number;
  readonly degree: number;
  /** The curve's name ("cubic"). */
  readonly curve: string;
  readonly genericSeed: number;
  readonly demo: ConicCurveDemo;
}

/** Our own fixed real chart of the P⁵ of conics for demos (generic instances draw it at random). */
const DEMO_CHART = [0.29, -0.23, 0.31, 0.14, -0.19, 1] as const;
const CHART_NAMES = CONIC_LETTERS.map((l) => `h${l}`);

/** The published count m·N(p + 1, l) + d·N(p, l + 1) with class m = d(d − 1) (Chasles's rule), and the equations' bounds. */
export function conicCurveCounts(points: number, lines: number, degree: number): { count: number; total: number; twoGroup: number; atInfinity: number } {
  if (points + lines !== 4 || points < 0 || lines < 0 || degree < 2) throw new RangeError(`conics and a curve: need p + l = 4 and d ≥ 2 (p = ${points}, l = ${lines}, d = ${degree})`);
  const cls = degree * (degree - 1);
  const count = cls * characteristicNumbers[points + 1]! + degree * characteristicNumbers[points]!;
  const twoGroup = 2 ** lines * degree * (degree + 2);
  return { count, total: 2 ** lines * 3 * degree * (degree + 1), twoGroup, atInfinity: twoGroup - count };
}

/** Keeps the conic's six coefficients scaled by their largest (real conics become real) and the contact point as it is. */
function shownCoordinates(x: Float64Array): Float64Array {
  const out = new Float64Array(16);
  out.set(normalizeByLargest(x.subarray(0, 12)));
  out.set(x.subarray(12, 16), 12);
  return out;
}

/**
 * The problem "conics through p general points, tangent to l general lines (p + l = 4) and to a general plane curve of
 * degree d": unknowns the conic's coefficients (in an affine chart of P⁵) and the contact point (x, y); solved from the
 * two-homogeneous start system of the groups {a … f}, {x, y}.
 */
export function conicCurveTangencyProblem(spec: ConicCurveSpec): ProblemDefinition {
  const { points: p, lines: l, degree: d, demo } = spec;
  const { count, total, twoGroup, atInfinity } = conicCurveCounts(p, l, d);
  if (demo.points.length !== p || demo.lines.length !== l) throw new RangeError(`${spec.slug}: the demo needs ${p} points and ${l} lines`);
  const exponents = monomialExponents(2, d);
  const curveNames = coefficientNames('g', 2, d);
  if (demo.curve.length !== curveNames.length) throw new RangeError(`${spec.slug}: the demo curve needs ${curveNames.length} coefficients`);
  const pointIndices = Array.from({ length: p }, (_, i) => i + 1);
  const lineIndices = Array.from({ length: l }, (_, j) => j + 1);
  const parameters: Record<string, ComplexInput> = {};
  CHART_NAMES.forEach((n, m) => (parameters[n] = DEMO_CHART[m]!));
  demo.points.forEach(([x, y], i) => Object.assign(parameters, { [`x${i + 1}`]: x, [`y${i + 1}`]: y }));
  demo.lines.forEach(([u, v, w], j) => Object.assign(parameters, { [`u${j + 1}`]: u, [`v${j + 1}`]: v, [`w${j + 1}`]: w }));
  curveNames.forEach((n, m) => (parameters[n] = demo.curve[m]!));
  const configuration = (q: Readonly<Record<string, number>>): FigureItem[] => [
    ...planeCurveItems(q, curveNames, exponents, demo.view, `the ${spec.curve}`, 220),
    ...lineIndices.map((j): FigureItem => ({ shape: 'line', a: q[`u${j}`]!, b: q[`v${j}`]!, c: q[`w${j}`]!, layer: 'given', label: `line ${j}` })),
    ...pointIndices.map((i): FigureItem => ({ shape: 'point', x: q[`x${i}`]!, y: q[`y${i}`]!, layer: 'given', label: `point ${i}` })),
  ];
  const through = `through ${p} general points $(x_i, y_i)$`;
  const line = l === 1 ? ', tangent to a general line $u_1 x + v_1 y + w_1 = 0$' : '';
  const cls = d * (d - 1);
  const nMu = characteristicNumbers[p + 1]!, nNu = characteristicNumbers[p]!;
  const others = l === 0 ? `${p} points` : `${p} points and ${l} line`;
  return {
    slug: spec.slug,
    title: spec.title,
    family: 'conics',
    tags: ['conics', 'tangency', 'characteristic numbers', 'Chasles', 'class of a curve', spec.curve + 's', 'excess intersection'],
    statement: [
      `Find every plane conic $ax^2 + bxy + cy^2 + dx + ey + f = 0$ ${through}${line} and tangent to a general plane ${spec.curve} $g(x, y) = \\sum g_{ij} x^i y^j = 0$ ($i + j \\le ${d}$).`,
      `There are $${count}$ over the complex numbers. By Chasles’s rule a curve of degree $n$ and class $m$ imposes on conics the condition $m\\mu + n\\nu$, where $\\mu$ is "through a point" and $\\nu$ "tangent to a line"; a smooth ${spec.curve} has class $m = ${d}(${d} - 1) = ${cls}$,`,
      `and the conics through ${others} number $${nMu}$ with one more point and $${nNu}$ with one more line, so the count is $${cls} \\cdot ${nMu} + ${d} \\cdot ${nNu} = ${count}$.`,
    ].join(' '),
    formulation: {
      unknowns: [...CONIC_LETTERS, 'x', 'y'],
      parameters: [...CHART_NAMES, ...pointIndices.flatMap((i) => [`x${i}`, `y${i}`]), ...lineIndices.flatMap((j) => [`u${j}`, `v${j}`, `w${j}`]), ...curveNames],
      groups: [[...CONIC_LETTERS], ['x', 'y']],
      equations: (u, q, ops) => {
        const k = CONIC_LETTERS.map((name) => u[name]!);
        const conicAt = (x: ExprNode, y: ExprNode) => ops.add(ops.mul(k[0]!, ops.pow(x, 2)), ops.mul(k[1]!, x, y), ops.mul(k[2]!, ops.pow(y, 2)), ops.mul(k[3]!, x), ops.mul(k[4]!, y), k[5]!);
        const [x, y] = [u.x!, u.y!];
        const g = curveNames.map((n) => q[n]!);
        const [gx, gy] = gradientOnChart(ops, g, exponents, d, [x, y]);
        const qx = ops.add(ops.mul(2, k[0]!, x), ops.mul(k[1]!, y), k[3]!);
        const qy = ops.add(ops.mul(k[1]!, x), ops.mul(2, k[2]!, y), k[4]!);
        return [
          ops.sub(ops.add(...CHART_NAMES.map((n, m) => ops.mul(q[n]!, k[m]!))), 1),
          ...pointIndices.map((i) => conicAt(q[`x${i}`]!, q[`y${i}`]!)),
          ...lineIndices.map((j) => tangencyQuadric(ops, u, q[`u${j}`]!, q[`v${j}`]!, q[`w${j}`]!)),
          conicAt(x, y),
          polynomial(ops, g, exponents, [x, y]),
          ops.sub(ops.mul(qx, gy!), ops.mul(qy, gx!)),
        ];
      },
      description: [
        'The unknowns are the six coefficients $(a, \\dots, f)$ of the conic $q$, in the affine chart $h_a a + \\dots + h_f f = 1$ of $\\mathbb{P}^5$ (random complex $h$ for the generic instance, fixed real $h$ for the demo), and its point of contact $(x, y)$ with the curve.',
        `Passing through a point is linear in the coefficients${l === 1 ? '; tangency to the line $\\ell$ is the quadric $\\ell^{\\mathsf{T}} \\operatorname{adj}(M)\\, \\ell = 0$ in the conic matrix $M$' : ''}. At the contact point $q(x, y) = 0$, $g(x, y) = 0$ and the gradients are parallel, $q_x g_y - q_y g_x = 0$: degrees $3$, $${d}$ and $${d + 1}$.`,
        `Total-degree Bézout bound $${l === 1 ? '2 \\cdot ' : ''}3 \\cdot ${d} \\cdot ${d + 1} = ${total}$; with the variable groups $\\{a, \\dots, f\\}$ and $\\{x, y\\}$ the two-homogeneous bound is $${l === 1 ? '2 \\cdot ' : ''}${d} \\cdot ${d + 2} = ${twoGroup}$, and the solver tracks those ${twoGroup} paths. Shown: the coefficients scaled so that the largest is $1$, then the contact point.`,
      ].join(' '),
      coordinates: { names: [...CONIC_LETTERS, 'x', 'y'], map: shownCoordinates },
    },
    trueCount: { value: count, source: classAndOrderSource(`For a smooth ${spec.curve}: class m = ${cls}, order ${d}; conics through ${others} have μ = ${nMu}, ν = ${nNu} (the characteristic numbers 1, 2, 4 of conics through 5, 4, 3 points and 0, 1, 2 lines), so m·μ + ${d}·ν = ${count}.`) },
    excessNote: [
      `The two-homogeneous bound $${twoGroup}$ exceeds $${count}$ by $${atInfinity}$, and those paths end at infinity of the contact point's chart, not at degenerate conics.`,
      `The parallel-gradient equation $q_x g_y - q_y g_x = 0$ is the last coordinate of the cross product of the projective gradients $\\nabla Q \\times \\nabla G$; at a common point $P$ of the two curves $P \\cdot \\nabla Q = 2Q(P) = 0$ and $P \\cdot \\nabla G = ${d}\\,G(P) = 0$ (Euler’s relation), so the cross product is a multiple of $P$ itself and its last coordinate vanishes wherever $P$ is at infinity, tangent or not.`,
      `So every conic of the family that passes through one of the ${spec.curve}’s $${d}$ points at infinity, paired with that point, solves the equations at infinity: ${l === 0 ? `the conics through ${p} points form a pencil, one of which passes through each point at infinity, $${d}$ in all` : `the conics through ${p} points through a further point form a pencil, ${characteristicNumbers[p + 1]!} of which touch the line, $${characteristicNumbers[p + 1]!} \\cdot ${d} = ${atInfinity}$ in all`}.`,
      `In our runs (the generic instance, the demo and the test seeds) exactly $${atInfinity}$ paths ended at infinity, none failed and none ended at a singular point; on the test seeds each of those ends was checked: its contact direction $(x : y)$ is an asymptotic direction of the ${spec.curve}, its conic passes through that point at infinity, and the directions are the ${spec.curve}’s $${d}$ points at infinity, each met ${l === 0 ? 'once' : 'twice'}.`,
      `No path ends at a degenerate conic: the family’s line pairs are made of lines through two given points${l === 1 ? ' or through a given point and the point where such a line meets the given line (their crossing must lie on it)' : ''}, none of them tangent to a general ${spec.curve}, and the given points are not on the curve. The ${count} themselves are nonsingular.`,
      `From the total-degree start the ${total - count} surplus paths of the bound $${total}$ also all end at infinity (measured on one test seed each page).`,
    ].join(' '),
    solver: { kind: 'multihomogeneous' },
    instances: [
      genericInstance(`Random complex points${l ? ', line' : ''} and ${spec.curve}`, spec.genericSeed, 'Points, line coefficients, curve coefficients and the chart'),
      { id: demo.id, kind: 'demo', label: demo.label, description: demo.description, seed: demo.seed, parameters },
    ],
    drawing: {
      projection: `${PLANE_PROJECTION} The ${spec.curve} is traced numerically from its equation.`,
      window: () => demo.view,
      configuration,
      solution: (values, q): FigureItem[] => {
        const conic = values.slice(0, 6) as ConicCoefficients;
        const lineContacts = lineIndices.map((j) => lineContactPoint(conic, [q[`u${j}`]!, q[`v${j}`]!, q[`w${j}`]!]));
        return [
          { shape: 'conic', coefficients: conic, layer: 'solution' },
          { shape: 'point', x: values[6]!, y: values[7]!, layer: 'tangency', label: `contact with the ${spec.curve}` },
          ...lineContacts.flatMap((c, j): FigureItem[] => (c ? [{ shape: 'point', x: c[0], y: c[1], layer: 'tangency', label: `contact with line ${j + 1}` }] : [])),
        ];
      },
    },
  };
}
