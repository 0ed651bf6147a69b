import type { ComplexInput, ProblemDefinition } from '../../../src/atlas/definition.ts';
import type { FigureItem } from '../../../src/atlas/figure.ts';
import { coefficientNames, monomialExponents } from '../shared/monomials.ts';
import { gradientOnChart } from '../shared/gradient.ts';
import type { PlaneWindow } from '../shared/contour.ts';
import { planeCurveItems } from '../shared/plane-curve-items.ts';
import { genericInstance } from '../shared/generic-instance.ts';
import { nodeBranches } from '../shared/node-branches.ts';

/** What distinguishes one "singular members of a pencil of plane curves of degree d" page from another. */
export interface PencilProblemSpec {
  readonly slug: string;
  readonly degree: number;
  /** Plural noun of the curves ("cubics"). */
  readonly nouns: string;
  readonly genericSeed: number;
  readonly demo: { id: string; label: string; description: string; seed: number; p: readonly number[]; q: readonly number[] };
  readonly view: PlaneWindow;
}

/** Discriminant degree of plane curves of degree d (Boole's formula n(d − 1)ⁿ⁻¹ for n = 3 variables). */
export function singularMembers(d: number): number {
  return 3 * (d - 1) ** 2;
}

/**
 * Singular members of a general pencil P + λQ of plane curves of degree d: a point (x, y) and a value λ where
 * every partial derivative of the homogenised P + λQ vanishes, three equations of bidegree (d − 1, 1) in
 * ({x, y}, {λ}), whose two-homogeneous bound 3(d − 1)² is the true count; total degree d³.
 */
export function pencilProblem(spec: PencilProblemSpec): ProblemDefinition {
  const d = spec.degree;
  const exponents = monomialExponents(2, d);
  const pNames = coefficientNames('p', 2, d);
  const qNames = coefficientNames('q', 2, d);
  const count = singularMembers(d);
  const parameters: Record<string, ComplexInput> = Object.fromEntries([
    ...spec.demo.p.map((c, m) => [pNames[m]!, c] as const),
    ...spec.demo.q.map((c, m) => [qNames[m]!, c] as const),
  ]);
  const reach = (spec.view.xMax - spec.view.xMin) / 40;
  return {
    slug: spec.slug,
    title: `Singular members of a pencil of plane ${spec.nouns}`,
    family: 'plane-curves',
    tags: ['plane curves', 'pencils', 'discriminant', 'nodes', spec.nouns, 'Bézout bound exact'],
    statement: `Two general plane ${spec.nouns} $P(x, y) = 0$ and $Q(x, y) = 0$ of degree $${d}$ span the pencil of curves $P + \\lambda Q = 0$. Find the members of the pencil that are singular, each with its singular point. A general pencil has exactly $3(d - 1)^2 = ${count}$ of them, each with one node: the degree of the discriminant of plane curves of degree $${d}$.`,
    formulation: {
      unknowns: ['x', 'y', 'lambda'],
      parameters: [...pNames, ...qNames],
      groups: [['x', 'y'], ['lambda']],
      equations: (u, c, ops) => {
        const gradient = (names: readonly string[]) => gradientOnChart(ops, names.map((n) => c[n]!), exponents, d, [u.x!, u.y!]);
        const [gp, gq] = [gradient(pNames), gradient(qNames)];
        return gp.map((a, k) => ops.add(a, ops.mul(u.lambda!, gq[k]!)));
      },
      description: [
        `A member $P + \\lambda Q$ is singular at $(x, y)$ when the three partial derivatives of its homogenisation $F_\\lambda(x, y, z)$ vanish there; by Euler's relation the curve then passes through the point.`,
        `On the chart $z = 1$ these are three equations of degree $${d - 1}$ in $(x, y)$ and $1$ in $\\lambda$: total degree $${d}$ each, Bézout bound $${d ** 3}$;`,
        `with the groups $\\{x, y\\}$ and $\\{\\lambda\\}$ the two-homogeneous bound is $3(d - 1)^2 = ${count}$, the true count, and the solver uses it.`,
      ].join(' '),
    },
    trueCount: {
      value: count,
      source: {
        kind: 'published',
        authors: ['I. M. Gelfand', 'M. M. Kapranov', 'A. V. Zelevinsky'],
        year: 1994,
        title: 'Discriminants, Resultants, and Multidimensional Determinants',
        venue: 'Birkhäuser, Boston (1994)',
        bib: { type: 'book', publisher: 'Birkhäuser', address: 'Boston' },
        note: `The discriminant of forms of degree d in n variables is a hypersurface of degree n(d − 1)ⁿ⁻¹ (Boole's formula), so a general line of forms, a pencil, meets it in 3(d − 1)² = ${count} points for plane curves of degree ${d}; that a general singular member has a single node is classical. The book credits the degree of the discriminant to Boole (seen in a sample of its text); chapter and page were not re-read. Its chapters are online under doi 10.1007/978-0-8176-4771-1 (the publisher’s page of chapter 12 seen), an edition whose relation to the 1994 printing was not checked.`,
      },
    },
    excessNote: `The total-degree count $${d}^3 = ${d ** 3}$ exceeds $${count}$ by $${d ** 3 - count}$, and the surplus sits at infinity. Homogenise with $(x : y : \\lambda : w)$: the terms of top degree $${d}$ are $\\lambda$ times the top-degree parts of $\\nabla Q$, which all vanish when $\\lambda = 0$, so the whole line $w = \\lambda = 0$ (points $(x, y)$ running off to infinity while $\\lambda$ stays small beside them) solves the system at infinity. In our total-degree run on the generic instance all $${d ** 3 - count}$ surplus paths end there and none fails. Separating $\\{x, y\\}$ from $\\{\\lambda\\}$ removes the surplus: the two-homogeneous start has exactly $${count}$ paths, all ending at nodes.`,
    instances: [
      genericInstance(`A random complex pencil of ${spec.nouns}`, spec.genericSeed, `All ${2 * pNames.length} coefficients of P and Q`),
      { id: spec.demo.id, kind: 'demo', label: spec.demo.label, description: spec.demo.description, seed: spec.demo.seed, parameters },
    ],
    solver: { kind: 'multihomogeneous' },
    drawing: {
      projection: 'Drawn in the (x, y)-plane of the curves themselves, with equal scales on both axes; the two given curves are traced numerically from their equations, and each real node is drawn with the two branches of its member through it.',
      window: () => spec.view,
      configuration: (c) => [
        ...planeCurveItems(c, pNames, exponents, spec.view, 'P = 0', 200),
        ...planeCurveItems(c, qNames, exponents, spec.view, 'Q = 0', 200),
      ],
      solution: ([x, y, lambda], c): FigureItem[] => [
        { shape: 'point', x: x!, y: y!, layer: 'solution' },
        ...nodeBranches(pNames.map((n, m) => c[n]! + lambda! * c[qNames[m]!]!), exponents, x!, y!, reach, 'branches'),
      ],
    },
  };
}
