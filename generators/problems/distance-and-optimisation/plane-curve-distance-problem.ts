import type { ComplexInput, ProblemDefinition } from '../../../src/atlas/definition.ts';
import type { FigureItem } from '../../../src/atlas/figure.ts';
import { coefficientNames, monomialExponents } from '../shared/monomials.ts';
import { polynomial } from '../shared/form.ts';
import { gradientOnChart } from '../shared/gradient.ts';
import type { PlaneWindow } from '../shared/contour.ts';
import { planeCurveItems } from '../shared/plane-curve-items.ts';
import { genericInstance } from '../shared/generic-instance.ts';
import { euclideanDistanceDegreePaper } from './ed-degree-source.ts';

/** What distinguishes one "critical points of the distance to a plane curve of degree d" page from another. */
export interface PlaneCurveDistanceSpec {
  readonly slug: string;
  readonly degree: number;
  readonly title: string;
  /** The curve in words, for the statement ("a general ellipse"). */
  readonly curve: string;
  readonly tags: readonly string[];
  readonly genericSeed: number;
  /** Sentences on real critical points, appended to the statement. */
  readonly realNote: string;
  readonly demo: { id: string; label: string; description: string; seed: number; coefficients: readonly number[]; point: readonly [number, number] };
  readonly view: PlaneWindow;
}

/**
 * Critical points of the squared distance from a point (a, b) to a general plane curve f = 0 of degree d: f = 0 and
 * (x − a)·f_y − (y − b)·f_x = 0 (the normal through the point), two equations of degree d; the Euclidean distance
 * degree d² equals their Bézout bound.
 */
export function planeCurveDistanceProblem(spec: PlaneCurveDistanceSpec): ProblemDefinition {
  const d = spec.degree;
  const exponents = monomialExponents(2, d);
  const names = coefficientNames('c', 2, d);
  const parameters: Record<string, ComplexInput> = Object.fromEntries([...spec.demo.coefficients.map((c, m) => [names[m]!, c] as const), ['a', spec.demo.point[0]] as const, ['b', spec.demo.point[1]] as const]);
  const curve = (q: Readonly<Record<string, number>>): FigureItem[] =>
    d === 2
      ? [{ shape: 'conic', coefficients: names.map((n) => q[n]!) as [number, number, number, number, number, number], layer: 'given', label: spec.curve }]
      : planeCurveItems(q, names, exponents, spec.view, 'the curve', 220);
  return {
    slug: spec.slug,
    title: spec.title,
    family: 'distance-and-optimisation',
    tags: ['Euclidean distance degree', 'critical points', 'nearest point', 'optimisation', 'plane curves', ...spec.tags, 'Bézout bound exact'],
    statement: `Given ${spec.curve} $f(x, y) = \\sum c_{ij} x^i y^j = 0$ ($i + j \\le ${d}$) and a general point $(a, b)$, find every critical point of the squared distance $(x - a)^2 + (y - b)^2$ on the curve: the points where the line to $(a, b)$ is normal to the curve. The nearest and the farthest point are among them. For general data there are exactly $d^2 = ${d * d}$, the Euclidean distance degree of the curve. ${spec.realNote}`,
    formulation: {
      unknowns: ['x', 'y'],
      parameters: [...names, 'a', 'b'],
      equations: (u, q, ops) => {
        const c = names.map((n) => q[n]!);
        const [fx, fy] = gradientOnChart(ops, c, exponents, d, [u.x!, u.y!]);
        return [polynomial(ops, c, exponents, [u.x!, u.y!]), ops.sub(ops.mul(ops.sub(u.x!, q.a!), fy!), ops.mul(ops.sub(u.y!, q.b!), fx!))];
      },
      description: [
        'The unknown is the point $(x, y)$ of the curve. It is critical for the distance when $(x - a, y - b)$ is parallel to the gradient $(f_x, f_y)$, that is $(x - a) f_y - (y - b) f_x = 0$.',
        `Together with $f = 0$: two equations of degree $${d}$, Bézout bound $${d * d}$, attained.`,
      ].join(' '),
    },
    trueCount: {
      value: d * d,
      source: {
        ...euclideanDistanceDegreePaper,
        note: `A general hypersurface of degree d in n-space has Euclidean distance degree d·((d − 1)ⁿ − 1)/(d − 2) (for d = 2: 2n); for a plane curve (n = 2) this is d², ${d * d} for d = ${d}. Volume, issue, pages and DOI as the publisher’s page for the article gives them. The formula is as we recall the paper’s statement on general hypersurfaces; the proposition and page that state it were not re-read.`,
      },
    },
    realMaximum: { value: d * d, citation: `J. Draisma, E. Horobeț, G. Ottaviani, B. Sturmfels, R. R. Thomas, Found. Comput. Math. 16 (2016): the Euclidean distance degree ${d * d} of a general plane curve of degree ${d} bounds its real critical points; that the bound is reached for every d is from memory` },
    excessNote: `None for general data. At infinity the two equations share a point only where the curve meets the line at infinity in one of the isotropic points $(1 : \\pm i : 0)$, or touches that line; a general curve does neither, so all $${d * d}$ paths of the total-degree homotopy end at finite critical points. Special curves lose solutions there: a circle passes through both isotropic points, and its Euclidean distance degree drops from $4$ to $2$.`,
    instances: [
      genericInstance(`A random complex curve and point`, spec.genericSeed, `All ${names.length} coefficients and the point (a, b)`),
      { id: spec.demo.id, kind: 'demo', label: spec.demo.label, description: spec.demo.description, seed: spec.demo.seed, parameters },
    ],
    drawing: {
      projection: 'Drawn in the (x, y)-plane of the curve itself, with equal scales on both axes, so that right angles look right.',
      window: () => spec.view,
      configuration: (q) => [...curve(q), { shape: 'point', x: q.a!, y: q.b!, layer: 'given', label: 'the point' }],
      solution: ([x, y], q): FigureItem[] => [
        { shape: 'polyline', points: [[q.a!, q.b!], [x!, y!]], closed: false, layer: 'normals' },
        { shape: 'point', x: x!, y: y!, layer: 'solution' },
      ],
    },
  };
}
