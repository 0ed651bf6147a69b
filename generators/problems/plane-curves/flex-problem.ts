import type { ComplexInput, ProblemDefinition } from '../../../src/atlas/definition.ts';
import type { FigureItem } from '../../../src/atlas/figure.ts';
import { coefficientNames, monomialExponents } from '../shared/monomials.ts';
import { hessianOnChart, polynomial } from '../shared/form.ts';
import type { PlaneWindow } from '../shared/contour.ts';
import { planeCurveItems } from '../shared/plane-curve-items.ts';
import { genericInstance } from '../shared/generic-instance.ts';
import { pluckerBook } from './plucker-book.ts';

/** What distinguishes one "flexes of a plane curve of degree d" page from another. */
export interface FlexProblemSpec {
  readonly slug: string;
  readonly degree: number;
  readonly noun: string;
  readonly genericSeed: number;
  /** Sentences on the real flexes, appended to the statement. */
  readonly realNote: string;
  readonly demo: { id: string; label: string; description: string; seed: number; coefficients: readonly number[] };
  readonly view: PlaneWindow;
}

/** Flexes of a general plane curve of degree d ≥ 3: the curve f = 0 meets its Hessian (degree 3(d − 2)) in 3d(d − 2) points. */
export function flexProblem(spec: FlexProblemSpec): ProblemDefinition {
  const d = spec.degree;
  const exponents = monomialExponents(2, d);
  const names = coefficientNames('c', 2, d);
  const count = 3 * d * (d - 2);
  const parameters: Record<string, ComplexInput> = Object.fromEntries(spec.demo.coefficients.map((c, m) => [names[m]!, c]));
  const curve = (q: Readonly<Record<string, number>>): FigureItem[] => planeCurveItems(q, names, exponents, spec.view, `the ${spec.noun}`, 220);
  return {
    slug: spec.slug,
    title: `The ${count} flexes of a plane ${spec.noun}`,
    family: 'plane-curves',
    tags: ['plane curves', 'flexes', 'inflection points', 'Hessian', 'Plücker formulas', spec.noun, 'Bézout bound exact'],
    statement: `Find the flexes (inflection points) of a general plane ${spec.noun} $f(x, y) = \\sum c_{ij} x^i y^j = 0$ ($i + j \\le ${d}$): the points where the tangent line meets the curve with multiplicity at least three. A smooth ${spec.noun} has exactly $3d(d - 2) = ${count}$ flexes. ${spec.realNote}`,
    formulation: {
      unknowns: ['x', 'y'],
      parameters: names,
      equations: (u, q, ops) => {
        const c = names.map((n) => q[n]!);
        return [polynomial(ops, c, exponents, [u.x!, u.y!]), hessianOnChart(ops, c, exponents, d, u.x!, u.y!)];
      },
      description: [
        `A flex is a point of the curve where the Hessian $H = \\det\\left(\\partial^2 F / \\partial u\\, \\partial v\\right)$ of the homogenised ${spec.noun} $F(x, y, z)$ vanishes.`,
        `On the chart $z = 1$ this gives $f = 0$ (degree $${d}$) and $H = 0$ (degree $3(d - 2) = ${3 * (d - 2)}$): Bézout bound $${count}$, attained.`,
      ].join(' '),
    },
    trueCount: {
      value: count,
      source: {
        ...pluckerBook,
        note: `Plücker's count 3d(d − 2) of the flexes of a curve of degree d without singular points gives ${count} for d = ${d}; that Plücker obtained the count and Hesse (J. reine angew. Math. 28, 1844) first gave the theory through the Hessian in complete form is as an encyclopaedia article on curves says. Page numbers not re-read. The bound d(d − 2) on the real flexes is Klein's (Math. Ann. 10, 1876), from memory.`,
      },
    },
    excessNote: `None: the Hessian of a general ${spec.noun} meets the curve transversally in $${d} \\cdot ${3 * (d - 2)} = ${count}$ points, and none lies on the line at infinity (a general curve has no flex there), so every path of the total-degree homotopy ends at a distinct flex. Special curves lose flexes to coincidence: a point where the tangent meets the curve four times (a hyperflex) counts twice.`,
    instances: [
      genericInstance(`A random complex ${spec.noun}`, spec.genericSeed, `All ${names.length} coefficients`),
      { id: spec.demo.id, kind: 'demo', label: spec.demo.label, description: spec.demo.description, seed: spec.demo.seed, parameters },
    ],
    drawing: {
      projection: 'Drawn in the (x, y)-plane of the curve itself, with equal scales on both axes; the curve is traced numerically from its equation.',
      window: () => spec.view,
      configuration: curve,
      solution: ([x, y]) => [{ shape: 'point', x: x!, y: y!, layer: 'solution' }],
    },
  };
}
