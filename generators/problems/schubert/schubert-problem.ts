import { defineProblem, type ProblemDefinition } from '../../../src/atlas/definition.ts';
import { genericInstance } from '../shared/generic-instance.ts';
import { grassmannianDegree } from './grassmannian-degree.ts';
import { grassmannianPattern } from './grassmannian-pattern.ts';
import { chartBezoutBound, chartFormulation, chartRowGroupBound, conditionCount, reducedBezoutBound, type SchubertShape } from './schubert-chart.ts';
import { osculatingParameters } from './osculating-subspaces.ts';
import { schubertDrawing } from './schubert-figure.ts';
import { SCHUBERT_1886 } from './schubert-source.ts';

/** The page-specific words and data of a Schubert problem in the Stiefel chart. */
export interface SchubertPage {
  readonly shape: SchubertShape;
  readonly slug: string;
  readonly title: string;
  /** The question in words (Markdown with $…$ TeX); the Grassmannian pattern paragraph is appended. */
  readonly question: string;
  /** Where the naive count's excess goes (original words for this page). */
  readonly excessNote: string;
  readonly tags: readonly string[];
  readonly genericSeed: number;
  /** The demo: osculating subspaces of the moment curve at these stations (one per condition), and its story. */
  readonly demo: { readonly id: string; readonly label: string; readonly description: string; readonly seed: number; readonly stations: readonly number[] };
  /** What a solution is, for the figure caption ("Lines in 4-space are"). */
  readonly drawn: string;
  /** n = 2k only: drop the shared top-degree form det X from all equations but one (the solver stays multihomogeneous). */
  readonly reduceTopForm?: boolean;
}

/**
 * A Schubert problem page: Stiefel-chart formulation (rows of X as variable groups, solved by the multihomogeneous
 * start), the true count computed as the Grassmannian's degree (and checked against Schubert 1886 in the tests), a
 * generic instance and a demo whose given subspaces osculate the moment curve.
 */
export function schubertProblem(page: SchubertPage): ProblemDefinition {
  const { k, n } = page.shape;
  const m = conditionCount(page.shape);
  const rowNames = ['a', 'b', 'c'].slice(0, k).map((r) => `$${r}$`).join(', ');
  return defineProblem({
    slug: page.slug,
    title: page.title,
    family: 'schubert',
    tags: page.tags,
    statement: `${page.question}\n\n${grassmannianPattern(k, n)}`,
    formulation: chartFormulation(page.shape, [
      `A general solution is the row space of a ${k} × ${n} matrix $[\\,I_{${k}} \\mid X\\,]$ in homogeneous coordinates $(x_0, \\dots, x_{${n - 1}})$: the local Stiefel coordinates of the Grassmannian are the ${k * (n - k)} entries of $X$ (rows ${rowNames}).`,
      `Given subspace $j$ is spanned by $(1, p_j)$ and its directions $(0, e_j), \\dots$; the two meet exactly when the ${n} × ${n} matrix stacking both bases is singular.`,
      `Expanding that determinant $E_j$ along the top ${k} rows writes it as a linear combination of the ${k} × ${k} minors of $[\\,I \\mid X\\,]$, the Plücker coordinates of the solution, so each of the ${m} equations has degree ${k} and is linear in each row of $X$ separately:`,
      `Bézout bound $${k}^{${m}} = ${chartBezoutBound(page.shape)}$, and with the rows of $X$ as variable groups the multihomogeneous bound is $${m}!/(${n - k}!)^{${k}} = ${chartRowGroupBound(page.shape)}$.`,
      page.reduceTopForm
        ? `Here the only term of degree ${k} in every $E_j$ is $\\det X$ times the minor $m_j$ of subspace $j$’s basis on the first ${k} columns, so we keep $E_1$ and replace each other $E_j$ by $m_1 E_j - m_j E_1$, of degree ${k - 1} (the same solutions wherever $m_1 \\neq 0$): Bézout bound $${k} \\cdot ${k - 1}^{${m - 1}} = ${reducedBezoutBound(page.shape)}$. The generator still tracks the rows-as-groups start: more paths, but on the demo’s osculating planes the smaller total-degree start left one to three diverging paths unconverged (path seeds 1 to 3 and the recorded one), while the rows-as-groups start ended every path.`
        : 'The generator tracks the rows-as-groups start.',
    ].join(' '), page.reduceTopForm ?? false),
    trueCount: { value: Number(grassmannianDegree(k, n)), source: SCHUBERT_1886 },
    excessNote: page.excessNote,
    solver: { kind: 'multihomogeneous' },
    instances: [
      genericInstance(`${m} random complex subspaces`, page.genericSeed, 'Points and directions'),
      { id: page.demo.id, kind: 'demo', label: page.demo.label, description: page.demo.description, seed: page.demo.seed, parameters: osculatingParameters(page.shape, page.demo.stations) },
    ],
    drawing: schubertDrawing(page.shape, page.drawn),
  });
}
