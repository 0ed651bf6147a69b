import type { ComplexInput, ProblemDefinition } from '../../../src/atlas/definition.ts';
import type { FigureItem } from '../../../src/atlas/figure.ts';
import { coefficientNames, monomialExponents } from '../shared/monomials.ts';
import { polynomial } from '../shared/form.ts';
import { gradientOnChart } from '../shared/gradient.ts';
import type { PlaneWindow } from '../shared/contour.ts';
import { planeCurveItems } from '../shared/plane-curve-items.ts';
import { genericInstance } from '../shared/generic-instance.ts';
import { pluckerBook } from './plucker-book.ts';

/** What distinguishes one "tangent lines from a point to a plane curve of degree d" page from another. */
export interface ClassProblemSpec {
  readonly slug: string;
  readonly degree: number;
  readonly noun: string;
  readonly genericSeed: number;
  readonly demo: {
    id: string;
    label: string;
    description: string;
    seed: number;
    /** The curve's coefficients in the order of monomialExponents(2, degree). */
    coefficients: readonly number[];
    point: readonly [number, number];
  };
  readonly view: PlaneWindow;
}

/** The class d(d − 1) of a smooth plane curve of degree d: its tangent lines through a general point. */
export function classOfCurve(d: number): number {
  return d * (d - 1);
}

/**
 * Tangent lines from a general point (a, b) to a general plane curve f = 0 of degree d ≥ 2: the points of contact
 * are where the curve meets the polar of (a, b), a curve of degree d − 1, so the Bézout bound d(d − 1) is the count.
 */
export function classProblem(spec: ClassProblemSpec): ProblemDefinition {
  const d = spec.degree;
  const exponents = monomialExponents(2, d);
  const names = coefficientNames('c', 2, d);
  const count = classOfCurve(d);
  const parameters: Record<string, ComplexInput> = Object.fromEntries([
    ...spec.demo.coefficients.map((c, m) => [names[m]!, c] as const),
    ['a', spec.demo.point[0]] as const,
    ['b', spec.demo.point[1]] as const,
  ]);
  return {
    slug: spec.slug,
    title: `The ${count} tangent lines from a point to a plane ${spec.noun}`,
    family: 'plane-curves',
    tags: ['plane curves', 'tangent lines', 'class of a curve', 'polar curve', 'Plücker formulas', spec.noun, 'Bézout bound exact'],
    statement: `Find every line through a general point $(a, b)$ of the plane that is tangent to a general plane ${spec.noun} $f(x, y) = \\sum c_{ij} x^i y^j = 0$ ($i + j \\le ${d}$). There are exactly $d(d - 1) = ${count}$: the class of a smooth ${spec.noun}, the degree of its dual curve.`,
    formulation: {
      unknowns: ['x', 'y'],
      parameters: [...names, 'a', 'b'],
      equations: (u, q, ops) => {
        const c = names.map((n) => q[n]!);
        const [fx, fy, fz] = gradientOnChart(ops, c, exponents, d, [u.x!, u.y!]);
        return [polynomial(ops, c, exponents, [u.x!, u.y!]), ops.add(ops.mul(q.a!, fx!), ops.mul(q.b!, fy!), fz!)];
      },
      description: [
        'The unknown is the point of contact $(x, y)$. The tangent at a point of the curve passes through $(a, b)$ exactly when the point lies on the polar curve of $(a, b)$, $a F_x + b F_y + F_z = 0$, where $F(x, y, z)$ is the homogenised curve (Euler’s relation turns the tangent’s equation into this).',
        `On the chart $z = 1$: $f = 0$ of degree $${d}$ and the polar of degree $${d - 1}$, Bézout bound $${count}$, attained.`,
        'Solutions are stored as the points of contact; each tangent line is the line through $(a, b)$ and its point.',
      ].join(' '),
    },
    trueCount: {
      value: count,
      source: {
        ...pluckerBook,
        note: `The class d(d − 1) of a curve of degree d without singular points (the number of its tangents through a general point), ${count} for d = ${d}, is the first of Plücker’s formulas; it was found before him by Poncelet and Gergonne through polars (from memory). Page numbers not re-read.`,
      },
    },
    excessNote: `None: the polar curve of degree $${d - 1}$ of a general point meets a general ${spec.noun} transversally in $${d} \\cdot ${d - 1} = ${count}$ finite points, none on the line at infinity, so every path of the total-degree homotopy ends at a point of contact. For special data the excess is real: from a point on the curve, the polar passes through that point and the tangent there counts twice; a bitangent through the point counts twice as well, since both of its points of contact solve, and a flex tangent through it counts twice at its single point of contact.`,
    instances: [
      genericInstance(`A random complex ${spec.noun} and point`, spec.genericSeed, `All ${names.length} coefficients and the point (a, b)`),
      { id: spec.demo.id, kind: 'demo', label: spec.demo.label, description: spec.demo.description, seed: spec.demo.seed, parameters },
    ],
    drawing: {
      projection: 'Drawn in the (x, y)-plane of the curve itself, with equal scales on both axes; the curve is traced numerically from its equation.',
      window: () => spec.view,
      configuration: (q) => [...planeCurveItems(q, names, exponents, spec.view, `the ${spec.noun}`, 220), { shape: 'point', x: q.a!, y: q.b!, layer: 'given', label: 'the point' }],
      solution: ([x, y], q): FigureItem[] => [
        { shape: 'line', a: y! - q.b!, b: q.a! - x!, c: x! * q.b! - y! * q.a!, layer: 'solution' },
        { shape: 'point', x: x!, y: y!, layer: 'tangency' },
      ],
    },
  };
}
