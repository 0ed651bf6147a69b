import type { ComplexInput, ProblemDefinition } from '../../../src/atlas/definition.ts';
import type { FigureItem } from '../../../src/atlas/figure.ts';
import { coefficientNames, monomialExponents } from '../shared/monomials.ts';
import { polynomial } from '../shared/form.ts';
import type { PlaneWindow } from '../shared/contour.ts';
import { planeCurveItems } from '../shared/plane-curve-items.ts';
import { genericInstance } from '../shared/generic-instance.ts';
import { fitWindow } from '../shared/fit-window.ts';
import { fultonCurves } from '../shared/fulton-curves.ts';
import { factorialDigits, symmetricGroupName } from '../shared/symmetric-group.ts';

/** What distinguishes one "two plane curves meet" problem from another. */
export interface CurvePairSpec {
  readonly slug: string;
  readonly degree: number;
  readonly noun: string;
  readonly demo: { id: string; label: string; description: string; p: readonly number[]; q: readonly number[] };
  /** The box in which the demo curves are drawn (sampled for degree ≥ 3). */
  readonly view: PlaneWindow;
  readonly genericSeed: number;
}

/** A two-curve intersection problem: Σ pᵢⱼxⁱyʲ = 0 and Σ qᵢⱼxⁱyʲ = 0 of the same degree d meet in d² points. */
export function curvePairProblem(spec: CurvePairSpec): ProblemDefinition {
  const { degree: d } = spec;
  const exponents = monomialExponents(2, d);
  const pNames = coefficientNames('p', 2, d);
  const qNames = coefficientNames('q', 2, d);
  const curve = (p: Readonly<Record<string, number>>, curveNames: readonly string[], label: string): FigureItem[] =>
    d === 2
      ? [{ shape: 'conic', coefficients: curveNames.map((n) => p[n]!) as [number, number, number, number, number, number], layer: 'given', label }]
      : planeCurveItems(p, curveNames, exponents, spec.view, label);
  const configuration = (p: Readonly<Record<string, number>>): FigureItem[] => [...curve(p, pNames, 'first curve'), ...curve(p, qNames, 'second curve')];
  const parameters: Record<string, ComplexInput> = {};
  pNames.forEach((n, m) => (parameters[n] = spec.demo.p[m]!));
  qNames.forEach((n, m) => (parameters[n] = spec.demo.q[m]!));
  return {
    slug: spec.slug,
    title: `Points common to two plane ${spec.noun}s`,
    family: 'intersections',
    tags: ['Bézout', 'plane curves', 'intersection', spec.noun, 'Bézout bound exact'],
    statement: `Two general plane ${spec.noun}s, the zero sets of $p(x, y) = \\sum p_{ij} x^i y^j$ and $q(x, y) = \\sum q_{ij} x^i y^j$ with $i + j \\le ${d}$, meet in $${d} \\cdot ${d} = ${d * d}$ points of the complex projective plane (Bézout's theorem). For general coefficients all of them lie in the affine plane.`,
    formulation: {
      unknowns: ['x', 'y'],
      parameters: [...pNames, ...qNames],
      equations: (u, p, ops) => [
        polynomial(ops, pNames.map((n) => p[n]!), exponents, [u.x!, u.y!]),
        polynomial(ops, qNames.map((n) => p[n]!), exponents, [u.x!, u.y!]),
      ],
      description: `The affine coordinates $(x, y)$ of a common point; two equations of degree $${d}$, so the Bézout bound is $${d * d}$.`,
    },
    trueCount: {
      value: d * d,
      source: {
        ...fultonCurves,
        note: "Bézout's theorem for plane curves. That Bézout published it in 1779, in his Théorie générale des équations algébriques, is as encyclopaedia accounts of the theorem give it; his text was not read.",
      },
    },
    publishedGroup: { name: `${symmetricGroupName(d * d)}, the full symmetric group`, order: factorialDigits(d * d), citation: 'J. Harris, Galois groups of enumerative problems, Duke Math. J. 46 (1979) 685–724' },
    realMaximum: { value: d * d, citation: `common practice: two real curves that are each a product of ${d} real lines in general position meet in ${d * d} real points, and a small real perturbation keeps them` },
    excessNote: `None: for general coefficients the two curves meet transversally in exactly $${d * d}$ finite points, so every path of the total-degree homotopy ends at a distinct solution.`,
    instances: [
      genericInstance(`Two random complex ${spec.noun}s`, spec.genericSeed, 'All coefficients'),
      { id: spec.demo.id, kind: 'demo', label: spec.demo.label, description: spec.demo.description, seed: 11, parameters },
    ],
    drawing: {
      projection: 'Drawn in the (x, y)-plane of the problem itself, with equal scales on both axes.',
      window: (p, items) => fitWindow([...configuration(p), ...(items ?? [])], 0.05, spec.view),
      configuration,
      solution: ([x, y]) => [{ shape: 'point', x: x!, y: y!, layer: 'solution' }],
    },
  };
}
