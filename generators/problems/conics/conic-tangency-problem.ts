import type { ComplexInput, ProblemDefinition } from '../../../src/atlas/definition.ts';
import type { FigureItem } from '../../../src/atlas/figure.ts';
import { fitWindow } from '../shared/fit-window.ts';
import { normalizeByLargest } from '../shared/normalize.ts';
import { CONIC_LETTERS, parameterNames } from './conic-names.ts';
import { tangencyPoint, type ConicCoefficients } from './conic-geometry.ts';
import { tangencyDiscriminant } from './sextic-formulation.ts';
import { storedSetReads, storedSetSolver } from '../shared/stored-set.ts';
import { CONIC_LADDER, tangencyStoreSpec } from './tangency-store.ts';
import { naiveRunSentence } from './naive-run-note.ts';
import { isRealPoint } from '../../../src/engine/index.ts';
import type { TangencyShape } from './tangency-layout.ts';
import { conicLadderRungs, conicLadderSource, PLANE_PROJECTION } from './ladder-source.ts';

export { CONIC_LADDER } from './tangency-store.ts';

/**
 * A fixed real affine chart of the P⁵ of conics (our own arbitrary numbers): the shown solution has Σ hₖ·coefₖ = 1.
 * Real, so that a real conic has real coordinates and its realness can be certified; the real conics on its
 * hyperplane at infinity form a set of measure zero that no instance of ours meets.
 */
const SHOWN_CHART: readonly (readonly [number, number])[] = [[0.41, 0], [0.58, 0], [-0.36, 0], [0.77, 0], [-0.29, 0], [0.66, 0]];

/** A demo configuration: real points and real conics (coefficients), in words. */
export interface ConicDemo {
  readonly id: string;
  readonly label: string;
  readonly description: string;
  readonly points: readonly (readonly [number, number])[];
  readonly conics: readonly ConicCoefficients[];
}

const plural = (k: number, word: string): string => `${k} ${word}${k === 1 ? '' : 's'}`;

/** The permanent slug of the rung with p points. */
export function conicLadderSlug(points: number): string {
  const k = 5 - points;
  return points === 0 ? 'conics-tangent-to-5-conics' : `conics-through-${plural(points, 'point')}-tangent-to-${plural(k, 'conic')}`.replaceAll(' ', '-');
}

/** Maps a working solution (u first, any chart) to the shown chart Σ hₖ·uₖ = 1. */
function toShownChart(x: Float64Array): Float64Array {
  let re = 0, im = 0;
  SHOWN_CHART.forEach(([hr, hi], k) => { re += hr * x[2 * k]! - hi * x[2 * k + 1]!; im += hr * x[2 * k + 1]! + hi * x[2 * k]!; });
  const d = re * re + im * im, out = new Float64Array(12);
  for (let k = 0; k < 6; k++) {
    const ur = x[2 * k]!, ui = x[2 * k + 1]!;
    out[2 * k] = (ur * re + ui * im) / d;
    out[2 * k + 1] = (ui * re - ur * im) / d;
  }
  return out;
}

/**
 * The rung "conics through p general points tangent to 5 − p general conics" for 0 ≤ p ≤ 4, solved by parameter
 * homotopy in the tangency-point formulation from a stored generic set (startSeed: its chart, seed and monodromy).
 */
export function conicTangencyProblem(points: number, seeds: { generic: number; start: number }, demo: ConicDemo): ProblemDefinition {
  const shape: TangencyShape = { points, conics: 5 - points };
  const k = shape.conics, count = CONIC_LADDER[points]!, bound = 6 ** k;
  if (!(points >= 0 && points <= 4) || demo.points.length !== points || demo.conics.length !== k) throw new RangeError(`conic ladder: need 0 ≤ p ≤ 4 with p demo points and 5 − p demo conics (p = ${points})`);
  const parameters: Record<string, ComplexInput> = {};
  demo.points.forEach(([x, y], i) => Object.assign(parameters, { [`x${i + 1}`]: x, [`y${i + 1}`]: y }));
  demo.conics.forEach((c, i) => CONIC_LETTERS.forEach((l, m) => { parameters[`${l}${i + 1}`] = c[m]!; }));
  const givenConic = (q: Readonly<Record<string, number>>, i: number): ConicCoefficients => CONIC_LETTERS.map((l) => q[`${l}${i}`]!) as ConicCoefficients;
  const configuration = (q: Readonly<Record<string, number>>): FigureItem[] => [
    ...Array.from({ length: k }, (_, i): FigureItem => ({ shape: 'conic', coefficients: givenConic(q, i + 1), layer: 'given', label: `conic ${i + 1}` })),
    ...Array.from({ length: points }, (_, j): FigureItem => ({ shape: 'point', x: q[`x${j + 1}`]!, y: q[`y${j + 1}`]!, layer: 'given', label: `point ${j + 1}` })),
  ];
  const store = tangencyStoreSpec(shape, seeds.start, count);
  const through = points === 0 ? '' : `passing through ${plural(points, 'general point')} $(x_j, y_j)$ and `;
  return {
    slug: conicLadderSlug(points),
    title: points === 0 ? 'Conics tangent to five conics' : `Conics through ${plural(points, 'point')} and tangent to ${plural(k, 'conic')}`,
    family: 'conics',
    tags: ['conics', 'tangency', 'characteristic numbers', 'Chasles', 'excess intersection', 'parameter homotopy', 'monodromy'],
    statement: `Find every plane conic $ax^2 + bxy + cy^2 + dx + ey + f = 0$ ${through}tangent to ${plural(k, 'general conic')} $a_i x^2 + b_i xy + c_i y^2 + d_i x + e_i y + f_i = 0$. There are $${count}$ over the complex numbers; the ladder for $p = 5, \\dots, 0$ points is $1, 6, 36, 184, 816, 3264$.`,
    formulation: {
      unknowns: [...CONIC_LETTERS],
      parameters: parameterNames(shape),
      equations: (u, q, ops) => {
        const coef = CONIC_LETTERS.map((l) => u[l]!);
        return [
          ops.sub(ops.add(...SHOWN_CHART.map(([hr, hi], m) => ops.mul(ops.constant(hr, hi), coef[m]!))), 1),
          ...Array.from({ length: points }, (_, j) => {
            const x = q[`x${j + 1}`]!, y = q[`y${j + 1}`]!;
            return ops.add(ops.mul(u.a!, x, x), ops.mul(u.b!, x, y), ops.mul(u.c!, y, y), ops.mul(u.d!, x), ops.mul(u.e!, y), u.f!);
          }),
          ...Array.from({ length: k }, (_, i) => tangencyDiscriminant(ops, coef, CONIC_LETTERS.map((l) => q[`${l}${i + 1}`]!))),
        ];
      },
      description: [
        'Shown: the six coefficients of the conic in a fixed real affine chart of $\\mathbb{P}^5$; passing through a point is linear, and tangency to a conic $A$ is the discriminant of the binary cubic $\\det(sA + tU)$, of degree 6 in $U$,',
        `so the Bézout bound is $6^{${k}} = ${bound}$. Solved: the tangency-point formulation (Breiding–Sturmfels–Timme 2020), with each point of contact as two extra unknowns in a random chart of $\\mathbb{P}^2$ — on both conics, gradients parallel — of degree at most 3, tracked from a stored generic solution set by parameter homotopy.`,
      ].join(' '),
      coordinates: { names: [...CONIC_LETTERS], map: normalizeByLargest },
    },
    trueCount: {
      value: count,
      source: conicLadderSource('The numbers 1, 6, 36, 184, 816, 3264 are Chasles’s (M. Chasles, Construction des coniques qui satisfont à cinq conditions, Comptes Rendus de l’Académie des Sciences de Paris 58 (1864), 297–308); 3264 corrected Steiner’s 7776 of 1848, the survey’s opening problem.'),
    },
    excessNote: k <= 2
      ? `None: with at most two tangency conditions the naive count $6^{${k}} = ${bound}$ is exact, because the conics through ${plural(points, 'general point')} form a family that misses the double lines.`
      : [
        `The naive count $6^{${k}} = ${bound}$ exceeds $${count}$ because every double line $(\\alpha x + \\beta y + \\gamma)^2$ is "tangent" to every conic: its matrix has rank one, so the binary cubic $\\det(sA + tU)$ has the double root $(s : t) = (0 : 1)$ and the tangency discriminant vanishes, to higher order.`,
        `The double lines form a surface (the Veronese surface) in $\\mathbb{P}^5$${points > 0 ? `, which the ${plural(points, 'point condition')} cut down` : ''}; ${bound - count} of the naive count's solutions are absorbed there as an excess component, and only the ${count} genuine conics remain isolated.${naiveRunSentence(conicLadderSlug(points))}`,
      ].join(' '),
    // J. Harris, Galois groups of enumerative problems, Duke Math. J. 46 (1979) 685–724: the conics tangent to five
    // general conics have the full symmetric group on the 3264 (only this rung is claimed here)
    ...(points === 0 ? { publishedGroup: { name: 'S₃₂₆₄, the full symmetric group', symmetricOn: count, citation: 'J. Harris, Galois groups of enumerative problems, Duke Math. J. 46 (1979) 685–724' } } : {}),
    instances: [
      { id: 'generic', kind: 'generic', label: 'Random complex data', description: 'Points and conics with coefficients drawn as random complex numbers from the recorded seed.', seed: seeds.generic },
      { id: demo.id, kind: 'demo', label: demo.label, description: demo.description, seed: 17, parameters },
    ],
    solver: storedSetSolver(store, { toShown: toShownChart, isReal: (shown) => isRealPoint(normalizeByLargest(shown)) }),
    reads: storedSetReads(store),
    ladders: conicLadderRungs(points, ['conics']),
    drawing: {
      projection: PLANE_PROJECTION,
      window: (q, items) => fitWindow([...configuration(q), ...(items ?? []).filter((it) => it.layer !== 'solution')], 0.2),
      configuration,
      solution: (values, q) => {
        const u = values.slice(0, 6) as ConicCoefficients;
        const contacts = Array.from({ length: k }, (_, i) => tangencyPoint(u, givenConic(q, i + 1)));
        return [
          { shape: 'conic', coefficients: u, layer: 'solution' },
          ...contacts.flatMap((p, i): FigureItem[] => (p ? [{ shape: 'point', x: p[0], y: p[1], layer: 'tangency', label: `contact with conic ${i + 1}` }] : [])),
        ];
      },
    },
  };
}
