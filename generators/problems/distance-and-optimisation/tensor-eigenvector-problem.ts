import type { ComplexInput, ProblemDefinition } from '../../../src/atlas/definition.ts';
import { coefficientNames, monomialExponents } from '../shared/monomials.ts';
import { gradientOnChart } from '../shared/gradient.ts';
import type { PlaneWindow } from '../shared/contour.ts';
import { planeCurveItems } from '../shared/plane-curve-items.ts';
import { genericInstance } from '../shared/generic-instance.ts';

/** What distinguishes one "eigenvectors of a symmetric ternary tensor of order d" page from another. */
export interface TensorEigenvectorSpec {
  readonly slug: string;
  readonly degree: number;
  /** "cubic", "quartic": the ternary form's name. */
  readonly noun: string;
  readonly genericSeed: number;
  readonly demo: { id: string; label: string; description: string; seed: number; coefficients: readonly number[] };
  readonly view: PlaneWindow;
}

/** The number of eigenvectors of a general symmetric tensor of order d in n variables, ((d − 1)ⁿ − 1)/(d − 2) (n for d = 2). */
export function eigenvectorCount(n: number, d: number): number {
  return d === 2 ? n : ((d - 1) ** n - 1) / (d - 2);
}

/**
 * Eigenvectors of a general symmetric tensor of order d on C³, through its ternary form F = Σ c·xⁱyʲz^(d−i−j):
 * v is an eigenvector when ∇F(v) is parallel to v. On the chart v = (a, b, 1): F_x − a·F_z = 0 and F_y − b·F_z = 0,
 * two equations of degree d; Bézout d², true count d² − d + 1, the other d − 1 at infinity.
 */
export function tensorEigenvectorProblem(spec: TensorEigenvectorSpec): ProblemDefinition {
  const d = spec.degree;
  const exponents = monomialExponents(2, d);
  const names = coefficientNames('c', 2, d);
  const count = eigenvectorCount(3, d);
  const parameters: Record<string, ComplexInput> = Object.fromEntries(spec.demo.coefficients.map((c, m) => [names[m]!, c]));
  return {
    slug: spec.slug,
    title: `The ${count} eigenvectors of a symmetric ternary ${spec.noun} tensor`,
    family: 'distance-and-optimisation',
    tags: ['tensors', 'eigenvectors', 'symmetric tensors', 'critical points', 'optimisation', 'sphere', spec.noun],
    statement: `A symmetric tensor $T$ of order $${d}$ on $\\mathbb{C}^3$ is the same as the ternary form $F(v) = T v^{${d}}$ of degree $${d}$. A nonzero vector $v$ is an eigenvector when $T v^{${d - 1}} = \\lambda v$, that is when $\\nabla F(v)$ is parallel to $v$; for real data these are the critical points of $F$ on the unit sphere. Find all eigenvectors, up to scaling, of a general symmetric tensor: there are exactly $((d - 1)^n - 1)/(d - 2) = ${count}$ for $n = 3$, $d = ${d}$.`,
    formulation: {
      unknowns: ['a', 'b'],
      parameters: names,
      equations: (u, q, ops) => {
        const [fx, fy, fz] = gradientOnChart(ops, names.map((n) => q[n]!), exponents, d, [u.a!, u.b!]);
        return [ops.sub(fx!, ops.mul(u.a!, fz!)), ops.sub(fy!, ops.mul(u.b!, fz!))];
      },
      description: [
        `The form is written $F = \\sum c_{ij}\\, x^i y^j z^{${d} - i - j}$ and an eigenvector on the chart $v = (a, b, 1)$, which misses only the eigenvectors with $z = 0$ (a general tensor has none).`,
        `$\\nabla F(v) \\parallel v$ becomes $F_x - a F_z = 0$ and $F_y - b F_z = 0$: two equations of degree $${d}$, Bézout bound $${d * d}$.`,
      ].join(' '),
    },
    trueCount: {
      value: count,
      source: {
        kind: 'published',
        authors: ['D. Cartwright', 'B. Sturmfels'],
        year: 2013,
        title: 'The number of eigenvalues of a tensor',
        venue: 'Linear Algebra and its Applications 438(2) (2013), 942–952',
        doi: '10.1016/j.laa.2011.05.040',
        bib: { type: 'article', journal: 'Linear Algebra and its Applications', volume: '438', number: '2', pages: '942--952' },
        note: `A general symmetric tensor of order d on Cⁿ has ((d − 1)ⁿ − 1)/(d − 2) eigenvectors up to scaling, ${count} for n = 3, d = ${d}. Issue, pages and DOI as reference lists that cite the article give them (one of them checked the DOI record against title, author and volume); the theorem number and page of the formula were not re-read.`,
      },
    },
    excessNote: `The Bézout bound $${d * d}$ exceeds $${count}$ by $${d * d - count} = d - 1$, and the surplus is at infinity of the chart. On the line at infinity the top-degree parts of the two equations are $-a\\, h(a, b)$ and $-b\\, h(a, b)$ with $h(a, b) = F_z(a, b, 0)$ of degree $${d - 1}$, so both vanish at the $${d - 1}$ zeros of $h$: directions with $z = 0$ where $\\nabla F$ has no $z$-component, which are not eigenvectors. The record counts those paths at infinity.`,
    instances: [
      genericInstance(`A random complex ternary ${spec.noun}`, spec.genericSeed, `All ${names.length} coefficients`),
      { id: spec.demo.id, kind: 'demo', label: spec.demo.label, description: spec.demo.description, seed: spec.demo.seed, parameters },
    ],
    drawing: {
      projection: 'Drawn in the chart z = 1 of the plane of directions: an eigenvector (a, b, 1) is the point (a, b), and the curve is where the form vanishes, F(a, b, 1) = 0; equal scales on both axes.',
      window: () => spec.view,
      configuration: (q) => planeCurveItems(q, names, exponents, spec.view, 'F = 0', 200),
      solution: ([a, b]) => [{ shape: 'point', x: a!, y: b!, layer: 'solution' }],
    },
  };
}
