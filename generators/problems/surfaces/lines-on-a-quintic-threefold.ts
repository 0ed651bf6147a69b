import { defineProblem, type ProblemDefinition } from '../../../src/atlas/definition.ts';
import type { FigureItem } from '../../../src/atlas/figure.ts';
import type { PlaneWindow } from '../shared/contour.ts';
import { genericInstance } from '../shared/generic-instance.ts';
import { chartLinePoints } from '../shared/line-chart.ts';
import { planeCurveItems } from '../shared/plane-curve-items.ts';
import { projectedLineItems } from '../shared/projected-line.ts';
import { storedSetReads, storedSetSolver } from '../shared/stored-set.ts';
import { FRAME_SEED, QUINTIC_EXPONENTS, QUINTIC_FRAME, QUINTIC_NAMES, quinticLinesFormulation } from './quintic-lines-formulation.ts';
import { QUINTIC_LINE_COUNT, quinticLinesSpec } from './quintic-lines-store.ts';
import { BENDING_SEED, bentWalls } from './quintic-walls-demo.ts';

const view: PlaneWindow = { xMin: -4, xMax: 4, yMin: -4, yMax: 4 };

/** The demo's bending size ε. */
export const BENDING = 0.1;

/** Exponents (x₁, x₂, x₃, x₄) of each coefficient: on the chart x₀ = 1 the section x₃ = x₄ = 0 keeps the terms with no x₃, x₄. */
const sectionExponents = QUINTIC_EXPONENTS.map((e) => e.slice(1));

/** The section of the threefold by the plane x₃ = x₄ = 0, in the chart x₀ = 1 with axes (x₁, x₂). */
const section = (c: Readonly<Record<string, number>>): FigureItem[] => planeCurveItems(c, QUINTIC_NAMES, sectionExponents, view, 'section by the plane x₃ = x₄ = 0');

/** The definition without its solver (the stored-set spec compiles this formulation). */
export const quinticLinesBase: Omit<ProblemDefinition, 'solver' | 'reads'> = {
  slug: 'lines-on-a-quintic-threefold',
  title: 'The 2875 lines on a quintic threefold',
  family: 'surfaces',
  tags: ['quintic threefold', 'lines', 'Schubert', 'Calabi–Yau', 'Grassmannian', 'parameter homotopy'],
  statement:
    'Find every straight line contained in a general quintic threefold $F(x_0, \\dots, x_4) = \\sum c_{e}\\, x^{e} = 0$ in projective 4-space ($126$ coefficients, one per monomial of degree $5$). A general quintic threefold contains exactly $2875$ lines over the complex numbers.',
  formulation: quinticLinesFormulation,
  trueCount: {
    value: QUINTIC_LINE_COUNT,
    source: {
      kind: 'published',
      authors: ['H. Schubert'],
      year: 1879,
      title: 'Kalkül der abzählenden Geometrie',
      venue: 'B. G. Teubner, Leipzig',
      bib: { type: 'book', publisher: 'B. G. Teubner', address: 'Leipzig' },
      note: 'From memory, not re-read: the section of the book where the count 2875 appears. That the lines of a general quintic threefold are finitely many, each counted once, is shown in S. Katz, On the finiteness of rational curves on quintic threefolds, Compositio Mathematica 60 (1986), no. 2, 151–162 (Numdam item CM_1986__60_2_151_0; venue checked against the digitised first page, not a Mathematische Zeitschrift paper), which also counts the 609250 conics.',
    },
  },
  excessNote: [
    `The $15625 - 2875 = 12750$ surplus paths of the total-degree start go to infinity: homogenising the chart, at the hyperplane at infinity only the terms of top degree survive, and they vanish on positive-dimensional sets of spurious solutions.`,
    'The atlas therefore does not track the $15625$ paths on every run: it keeps the $2875$ lines of one random complex quintic (found once by monodromy from a quintic built around a chosen line, stored in single precision and refined by Newton\'s method on loading) and moves them to each quintic by a parameter homotopy, $2875$ paths.',
  ].join(' '),
  instances: [
    genericInstance('A random complex quintic threefold', 1879, 'All 126 coefficients'),
    {
      id: 'bent-walls',
      kind: 'demo',
      label: 'Five bent walls',
      description: `A geometry club builds a real quintic threefold of its own: the product of five real hyperplanes ("walls" of a slanted pentatope), which contains infinitely many lines, plus ${BENDING} times a real quintic with coefficients drawn from seed ${BENDING_SEED} (standard normals rounded to two decimals). The bending leaves finitely many lines; the club asks how many of them are real.`,
      seed: 55,
      parameters: bentWalls(BENDING),
    },
  ],
  drawing: {
    projection: `Each real line is drawn by its image under the projection (x₀ : x₁ : x₂ : x₃ : x₄) ↦ (x₀ : x₁ : x₂), in the chart x₀ = 1 with axes x₁ (across) and x₂ (up); the curve is the section of the threefold by the plane x₃ = x₄ = 0. The chart's change of coordinates is drawn from seed ${FRAME_SEED}.`,
    window: () => view,
    configuration: section,
    solution: (values) => {
      const { p, q } = chartLinePoints(QUINTIC_FRAME, Float64Array.from(values.flatMap((v) => [v, 0])));
      return projectedLineItems([...p].filter((_, i) => i % 2 === 0), [...q].filter((_, i) => i % 2 === 0), view);
    },
  },
};

export default defineProblem({ ...quinticLinesBase, solver: storedSetSolver(quinticLinesSpec, { toShown: (x) => x }), reads: storedSetReads(quinticLinesSpec) });
