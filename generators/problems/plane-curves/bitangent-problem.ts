import type { ComplexInput, ProblemDefinition } from '../../../src/atlas/definition.ts';
import type { FigureItem } from '../../../src/atlas/figure.ts';
import { coefficientNames, monomialExponents } from '../shared/monomials.ts';
import type { PlaneWindow } from '../shared/contour.ts';
import { planeCurveItems } from '../shared/plane-curve-items.ts';
import { genericInstance } from '../shared/generic-instance.ts';
import { bitangentEquations, pointOnChartLine } from './bitangent-equations.ts';
import { pluckerBook } from './plucker-book.ts';

/** What distinguishes one "bitangents of a plane curve of degree d" page from another. */
export interface BitangentProblemSpec {
  readonly slug: string;
  readonly degree: number;
  readonly noun: string;
  readonly genericSeed: number;
  /** Sentences on the real bitangents, appended to the statement. */
  readonly realNote: string;
  /** The Bézout and multihomogeneous bounds of the formulation, quoted in its description (a test checks them against the engine). */
  readonly bounds: { readonly bezout: number; readonly multihomogeneous: number };
  /** Where the surplus paths of the solver's start system went, measured (Markdown), appended to the excess note. */
  readonly measuredExcess: string;
  readonly demo: {
    id: string;
    label: string;
    description: string;
    seed: number;
    /** The curve's coefficients in the order of monomialExponents(2, degree). */
    coefficients: readonly number[];
    /** A real chart parameter σ of our own, chosen so that no real bitangent is near the chart's missing direction. */
    sigma: number;
  };
  readonly view: PlaneWindow;
}

/** Plücker's count ½d(d − 2)(d − 3)(d + 3) of the bitangents of a smooth plane curve of degree d. */
export function bitangentCount(d: number): number {
  return (d * (d - 2) * (d - 3) * (d + 3)) / 2;
}

/** The names of the residual unknowns γ of degree d: none for d = 4, 'gamma' for d = 5, 'gamma1' … beyond. */
export function residualNames(d: number): string[] {
  return d === 5 ? ['gamma'] : Array.from({ length: d - 4 }, (_, i) => `gamma${i + 1}`);
}

/**
 * Bitangents of a general plane curve of degree d ≥ 4: the line A·(t, mt + k) on which the curve restricts to
 * (leading coefficient)·(t² + αt + β)²·(monic residual of degree d − 4); d equations in 4 + (d − 4) = d unknowns,
 * solved from the multihomogeneous start with the groups {m, k}, {α, β} and the residual coefficients.
 */
export function bitangentProblem(spec: BitangentProblemSpec): ProblemDefinition {
  const d = spec.degree;
  const exponents = monomialExponents(2, d);
  const names = coefficientNames('c', 2, d);
  const gammas = residualNames(d);
  const count = bitangentCount(d);
  const parameters: Record<string, ComplexInput> = Object.fromEntries([...spec.demo.coefficients.map((c, m) => [names[m]!, c] as const), ['sigma', spec.demo.sigma] as const]);
  const residualText = d === 4 ? '' : d === 5 ? '\\,(t + \\gamma)' : `\\,(t^{${d - 4}} + \\gamma_1 t^{${d - 5}} + \\dots + \\gamma_{${d - 4}})`;
  const residualUnknowns = d === 4 ? '' : d === 5 ? ', \\gamma' : ', \\gamma_1, \\dots, \\gamma_{' + (d - 4) + '}';
  const groupsText = `$\\{m, k\\}$, $\\{\\alpha, \\beta\\}$${d === 4 ? '' : `, $\\{${residualUnknowns.slice(2)}\\}$`}`;
  return {
    slug: spec.slug,
    title: `The ${count} bitangents of a plane ${spec.noun}`,
    family: 'plane-curves',
    tags: ['plane curves', 'bitangents', spec.noun, 'Plücker formulas', 'excess intersection'],
    statement: `Find every line tangent to a general plane ${spec.noun} $f(x, y) = \\sum c_{ij} x^i y^j = 0$ ($i + j \\le ${d}$) at two points. A smooth curve of degree $d$ has exactly $\\tfrac12 d(d - 2)(d - 3)(d + 3)$ bitangents, $${count}$ for $d = ${d}$. ${spec.realNote}`,
    formulation: {
      unknowns: ['m', 'k', 'alpha', 'beta', ...gammas],
      parameters: [...names, 'sigma'],
      groups: gammas.length > 0 ? [['m', 'k'], ['alpha', 'beta'], gammas] : [['m', 'k'], ['alpha', 'beta']],
      equations: (u, q, ops) => bitangentEquations(ops, names.map((n) => q[n]!), exponents, d, q.sigma!, { m: u.m!, k: u.k!, alpha: u.alpha!, beta: u.beta!, residual: gammas.map((g) => u[g]!) }),
      description: [
        'Lines are charted as the points $A\\,(t,\\ mt + k)$ with $A = \\begin{pmatrix} 1 & -\\sigma \\\\ \\sigma & 1 \\end{pmatrix}$, where $\\sigma$ is part of the instance: random complex for generic instances, so that no line is special; for the demo a real value of our own.',
        `Restricted to the line, the ${spec.noun} becomes a polynomial $q(t) = f(A\\,(t,\\ mt + k))$ of degree $${d}$. The line is a bitangent when $q(t) = q_{${d}}(m)\\,(t^2 + \\alpha t + \\beta)^2${residualText}$: the roots of $t^2 + \\alpha t + \\beta$ are the two points of contact${d === 4 ? '' : `, and the remaining factor marks the other ${d - 4 === 1 ? 'point' : `${d - 4} points`} where the line crosses the curve`}.`,
        `Comparing the coefficients of $t^{${d - 1}}, \\dots, t, 1$ gives $${d}$ equations in the $${d}$ unknowns $(m, k, \\alpha, \\beta${residualUnknowns})$, each of degree $${d}$ in $(m, k)$, at most $2$ in $(\\alpha, \\beta)$${d === 4 ? '' : ' and at most $1$ in the residual coefficients'}: Bézout bound $${spec.bounds.bezout}$;`,
        `with the groups ${groupsText} the multihomogeneous bound is $${spec.bounds.multihomogeneous}$, which the solver uses.`,
        `Solutions are stored in these chart coordinates $(m, k, \\alpha, \\beta${residualUnknowns})$.`,
      ].join(' '),
    },
    trueCount: {
      value: count,
      source: {
        ...pluckerBook,
        note: `The book’s formula for the double tangents of a curve of degree d without singular points, ½d(d − 2)(d² − 9) = ½d(d − 2)(d − 3)(d + 3), gives ${count} for d = ${d} (p. 211, as Cayley cites it in 1849). From memory, not re-read: the page number and its publisher (Adolph Marcus).`,
      },
    },
    excessNote: [
      `The naive counts, the Bézout bound and the multihomogeneous bound, far exceed $${count}$; the surplus lies at infinity of the charts.`,
      `When $q_{${d}}(m) = 0$ the line runs in an asymptotic direction of the curve, $q$ drops degree, and the factorisation can only be met in the limit with $\\alpha$, $\\beta$ or a residual coefficient infinite; lines escaping to infinity in the $(m, k)$ chart give more limits of the same kind.`,
      spec.measuredExcess,
    ].join(' '),
    instances: [
      genericInstance(`A random complex ${spec.noun}`, spec.genericSeed, `All ${names.length} coefficients and the chart parameter σ`),
      { id: spec.demo.id, kind: 'demo', label: spec.demo.label, description: spec.demo.description, seed: spec.demo.seed, parameters },
    ],
    solver: { kind: 'multihomogeneous' },
    drawing: {
      projection: 'Drawn in the (x, y)-plane of the curve itself, with equal scales on both axes; the curve is traced numerically from its equation.',
      window: () => spec.view,
      configuration: (q) => planeCurveItems(q, names, exponents, spec.view, `the ${spec.noun}`, 220),
      solution: ([m, k, alpha, beta], q) => {
        const sigma = q.sigma!;
        const [p0, p1] = [pointOnChartLine(sigma, m!, k!, 0), pointOnChartLine(sigma, m!, k!, 1)];
        const [dx, dy] = [p1[0] - p0[0], p1[1] - p0[1]];
        const items: FigureItem[] = [{ shape: 'line', a: dy, b: -dx, c: dx * p0[1] - dy * p0[0], layer: 'solution' }];
        const disc = alpha! * alpha! - 4 * beta!;
        if (disc >= 0) {
          for (const t of [(-alpha! + Math.sqrt(disc)) / 2, (-alpha! - Math.sqrt(disc)) / 2]) {
            const [x, y] = pointOnChartLine(sigma, m!, k!, t);
            items.push({ shape: 'point', x, y, layer: 'tangency' });
          }
        }
        return items;
      },
    },
  };
}
