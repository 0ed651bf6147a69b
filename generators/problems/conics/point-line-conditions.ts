import type { ComplexInput, ProblemDefinition } from '../../../src/atlas/definition.ts';
import type { FigureItem } from '../../../src/atlas/figure.ts';
import type { ExprNode, exprBuilders } from '../../../src/engine/index.ts';
import { fitWindow } from '../shared/fit-window.ts';
import { genericInstance } from '../shared/generic-instance.ts';
import { normalizeByLargest } from '../shared/normalize.ts';
import { conicLadderRungs, conicLadderSource, PLANE_PROJECTION } from './ladder-source.ts';

/** The characteristic numbers of conics: through p general points and tangent to 5 − p general lines. */
export const characteristicNumbers: Readonly<Record<number, number>> = { 5: 1, 4: 2, 3: 4, 2: 4, 1: 2, 0: 1 };

const coefficients = ['a', 'b', 'c', 'd', 'e', 'f'] as const;

/**
 * The affine chart of the projective space of conics, Σ hₖ·coefₖ = 1, is part of each instance: the generic
 * instance draws h at random (complex, so no special position), and demos use these real numbers of our own, so
 * that real conics get real chart coordinates (and can be certified real). None of the demo conics lies on the
 * chart's hyperplane at infinity (checked by the tests: all are found).
 */
const demoChart = [0.31, -0.22, 0.27, 0.12, -0.17, 1] as const;
const chartNames = coefficients.map((c) => `h${c}`);

/** The scenario of a demo configuration: its points (x, y), lines (u, v, w) meaning ux + vy + w = 0, and words. */
export interface PointLineDemo {
  readonly id: string;
  readonly label: string;
  readonly description: string;
  readonly points: readonly (readonly [number, number])[];
  readonly lines: readonly (readonly [number, number, number])[];
}

function slugFor(p: number): string {
  const lines = 5 - p;
  if (lines === 0) return 'conics-through-5-points';
  if (p === 0) return 'conics-tangent-to-5-lines';
  return `conics-through-${p}-point${p === 1 ? '' : 's'}-tangent-to-${lines}-line${lines === 1 ? '' : 's'}`;
}

function titleFor(p: number): string {
  const lines = 5 - p;
  const pts = p === 0 ? '' : `through ${p} point${p === 1 ? '' : 's'}`;
  const tan = lines === 0 ? '' : `tangent to ${lines} line${lines === 1 ? '' : 's'}`;
  return `Conics ${[pts, tan].filter(Boolean).join(' and ')}`;
}

/**
 * 4·ℓᵀ adj(M) ℓ for the conic matrix M of ax² + bxy + cy² + dx + ey + f and the line ℓ = (u, v, w): it vanishes
 * exactly when the conic restricted to the line has a double root (the line is tangent), and identically on
 * double lines, where adj(M) = 0.
 */
export function tangencyQuadric(ops: typeof exprBuilders, k: Readonly<Record<string, ExprNode>>, u: ExprNode, v: ExprNode, w: ExprNode): ExprNode {
  const { a, b, c, d, e, f } = k as Record<(typeof coefficients)[number], ExprNode>;
  const minor = (x: ExprNode, y: ExprNode, z: ExprNode, s: number) => ops.sub(ops.mul(s, x, y), ops.pow(z, 2));
  const mixed = (x: ExprNode, y: ExprNode, z: ExprNode, t: ExprNode) => ops.sub(ops.mul(x, y), ops.mul(2, z, t));
  return ops.add(
    ops.mul(ops.pow(u, 2), minor(c, f, e, 4)),
    ops.mul(ops.pow(v, 2), minor(a, f, d, 4)),
    ops.mul(ops.pow(w, 2), minor(a, c, b, 4)),
    ops.mul(2, u, v, mixed(d, e, b, f)),
    ops.mul(2, u, w, mixed(b, e, c, d)),
    ops.mul(2, v, w, mixed(b, d, a, e)),
  );
}

/** The problem "conics through p general points and tangent to 5 − p general lines", p = 0…5. */
export function pointLineProblem(p: number, genericSeed: number, demo: PointLineDemo): ProblemDefinition {
  const l = 5 - p;
  const pointIndices = Array.from({ length: p }, (_, i) => i + 1);
  const lineIndices = Array.from({ length: l }, (_, j) => j + 1);
  const parameters: Record<string, ComplexInput> = {};
  chartNames.forEach((n, m) => (parameters[n] = demoChart[m]!));
  demo.points.forEach(([x, y], i) => Object.assign(parameters, { [`x${i + 1}`]: x, [`y${i + 1}`]: y }));
  demo.lines.forEach(([u, v, w], j) => Object.assign(parameters, { [`u${j + 1}`]: u, [`v${j + 1}`]: v, [`w${j + 1}`]: w }));
  const configuration = (q: Readonly<Record<string, number>>): FigureItem[] => [
    ...lineIndices.map((j): FigureItem => ({ shape: 'line', a: q[`u${j}`]!, b: q[`v${j}`]!, c: q[`w${j}`]!, layer: 'given', label: `line ${j}` })),
    ...pointIndices.map((i): FigureItem => ({ shape: 'point', x: q[`x${i}`]!, y: q[`y${i}`]!, layer: 'given', label: `point ${i}` })),
  ];
  const bound = 2 ** l;
  const count = characteristicNumbers[p]!;
  return {
    slug: slugFor(p),
    title: titleFor(p),
    family: 'conics',
    tags: ['conics', 'characteristic numbers', 'Chasles', ...(l > 0 ? ['tangency'] : []), ...(bound > count ? ['excess intersection'] : ['Bézout bound exact'])],
    statement: [
      `Find every plane conic $ax^2 + bxy + cy^2 + dx + ey + f = 0$`,
      p > 0 ? `passing through ${p} general point${p === 1 ? '' : 's'} $(x_i, y_i)$` : '',
      p > 0 && l > 0 ? 'and' : '',
      l > 0 ? `tangent to ${l} general line${l === 1 ? '' : 's'} $u_j x + v_j y + w_j = 0$` : '',
      `. There ${count === 1 ? 'is' : 'are'} $${count}$ over the complex numbers, one of the characteristic numbers $1, 2, 4, 4, 2, 1$ of conics.`,
    ].filter(Boolean).join(' ').replace(' .', '.'),
    formulation: {
      unknowns: [...coefficients],
      parameters: [...chartNames, ...pointIndices.flatMap((i) => [`x${i}`, `y${i}`]), ...lineIndices.flatMap((j) => [`u${j}`, `v${j}`, `w${j}`])],
      equations: (k, q, ops) => [
        ops.sub(ops.add(...coefficients.map((name, m) => ops.mul(q[chartNames[m]!]!, k[name]!))), 1),
        ...pointIndices.map((i) => {
          const x = q[`x${i}`]!, y = q[`y${i}`]!;
          return ops.add(ops.mul(k.a!, ops.pow(x, 2)), ops.mul(k.b!, x, y), ops.mul(k.c!, ops.pow(y, 2)), ops.mul(k.d!, x), ops.mul(k.e!, y), k.f!);
        }),
        ...lineIndices.map((j) => tangencyQuadric(ops, k, q[`u${j}`]!, q[`v${j}`]!, q[`w${j}`]!)),
      ],
      description: [
        'The six coefficients $(a, b, c, d, e, f)$ of the conic, a point of $\\mathbb{P}^5$, in the affine chart $h_a a + h_b b + \\dots + h_f f = 1$ (one linear equation; random complex $h$ for generic instances, fixed real $h$ for demos). Solutions are shown scaled so that their largest coefficient is $1$.',
        'Passing through a point is linear; tangency to the line $\\ell = (u, v, w)$ is the quadric $\\ell^{\\mathsf{T}} \\operatorname{adj}(M)\\, \\ell = 0$ in the conic matrix $M$,',
        `the discriminant of the conic restricted to the line. Bézout bound $2^{${l}} = ${bound}$.`,
      ].join(' '),
      coordinates: { names: [...coefficients], map: normalizeByLargest },
    },
    trueCount: {
      value: count,
      source: conicLadderSource('The numbers 1, 2, 4, 4, 2, 1 for points and lines are Chasles’s characteristic numbers of the conics (Comptes Rendus de l’Académie des Sciences de Paris 58 (1864), 297–308); our runs reproduce each rung.'),
    },
    excessNote:
      bound === count
        ? `None: the naive count $${bound}$ is exact. ${l === 0 ? 'Five point conditions are linear and cut out a single conic.' : `The tangency equation also holds on degenerate conics (double lines, and line pairs crossing on the given line), but none of them passes through ${p} general points and meets the other conditions.`}`
        : [
            `The naive count $2^{${l}} = ${bound}$ exceeds the true count $${count}$ because every double line $(\\alpha x + \\beta y + \\gamma)^2$ satisfies every tangency equation: its matrix has rank one, so $\\operatorname{adj}(M) = 0$.`,
            p === 2
              ? 'Through the two points there is exactly one double line, and all the surplus paths converge to it as singular endpoints (one cluster of multiplicity $4$).'
              : `The double lines ${p === 1 ? 'through the point form a curve (a conic in $\\mathbb{P}^5$)' : 'form a surface (the Veronese surface in $\\mathbb{P}^5$)'} of spurious solutions. In our runs all $${bound - count}$ surplus paths end on it at singular points, none at infinity of the chart.`,
          ].join(' '),
    instances: [
      genericInstance('Random complex points and lines', genericSeed, 'Point coordinates and line coefficients'),
      { id: demo.id, kind: 'demo', label: demo.label, description: demo.description, seed: 13, parameters },
    ],
    ladders: conicLadderRungs(p, p === 5 ? ['lines', 'conics'] : ['lines']),
    drawing: {
      projection: PLANE_PROJECTION,
      window: (q, items) => fitWindow([...configuration(q), ...(items ?? [])], 0.15),
      configuration,
      solution: (values) => [{ shape: 'conic', coefficients: values.slice(0, 6) as [number, number, number, number, number, number], layer: 'solution' }],
    },
  };
}
