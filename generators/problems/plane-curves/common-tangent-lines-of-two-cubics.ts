import { defineProblem, type ComplexInput } from '../../../src/atlas/definition.ts';
import type { FigureItem } from '../../../src/atlas/figure.ts';
import type { ExprNode } from '../../../src/engine/index.ts';
import { coefficientNames, monomialExponents } from '../shared/monomials.ts';
import { polynomial } from '../shared/form.ts';
import { gradientOnChart } from '../shared/gradient.ts';
import type { PlaneWindow } from '../shared/contour.ts';
import { planeCurveItems } from '../shared/plane-curve-items.ts';
import { genericInstance } from '../shared/generic-instance.ts';
import { coefficientsOf } from '../shared/numeric-polynomial.ts';
import { ovalCubicForm } from '../shared/oval-cubic-form.ts';
import { pluckerBook } from './plucker-book.ts';

// Coefficients in the order x³, x²y, xy², y³, x², xy, y², x, y, 1.
const exponents = monomialExponents(2, 3);
const pNames = coefficientNames('p', 2, 3);
const qNames = coefficientNames('q', 2, 3);
const view: PlaneWindow = { xMin: -3.5, xMax: 5.5, yMin: -4.5, yMax: 4.5 };

/**
 * The demo: two cubics of our own, each a bead (an oval) beside an open arm, the arms pointing away from each other.
 * Of 60 random placements of this kind (and 90 of other shapes) none had more than 18 real common tangents; this rounded one
 * has 18, 9 of them touching both curves inside the drawing, and the curves' 3 real common points lie beyond |x|, |y| = 28.
 */
const demo = {
  p: coefficientsOf(ovalCubicForm([-1.8, -1.2, -0.8], 1.7, 0.2, 2.1, -1.5, -0.9), exponents),
  q: coefficientsOf(ovalCubicForm([-1.3, 0.1, 0.4], 1.4, 0.2, -0.9, 1.5, 0.9), exponents),
};
const demoParameters: Record<string, ComplexInput> = Object.fromEntries([...pNames.map((n, m) => [n, demo.p[m]!] as const), ...qNames.map((n, m) => [n, demo.q[m]!] as const)]);
const cubics = (q: Readonly<Record<string, number>>): FigureItem[] => [...planeCurveItems(q, pNames, exponents, view, 'first cubic', 220), ...planeCurveItems(q, qNames, exponents, view, 'second cubic', 220)];

export default defineProblem({
  slug: 'common-tangent-lines-of-two-cubics',
  title: 'The 36 common tangent lines of two plane cubics',
  family: 'plane-curves',
  tags: ['plane curves', 'tangent lines', 'duality', 'class of a curve', 'Plücker formulas', 'cubics', 'excess intersection'],
  statement: 'Find every line tangent to both of two general plane cubics $p(x, y) = 0$ and $q(x, y) = 0$. There are exactly $36$: a smooth cubic has class $d(d - 1) = 6$, so its tangent lines form a curve of degree $6$ in the plane of lines (its dual curve), and two such sextics meet in $6 \\cdot 6 = 36$ points by Bézout’s theorem.',
  formulation: {
    unknowns: ['u', 'v', 'x1', 'y1', 'x2', 'y2'],
    parameters: [...pNames, ...qNames],
    equations: (w, c, ops) => {
      const line = (x: ExprNode, y: ExprNode) => ops.add(ops.mul(w.u!, x), ops.mul(w.v!, y), ops.constant(1));
      const touching = (names: readonly string[], x: ExprNode, y: ExprNode) => {
        const coefficients = names.map((n) => c[n]!);
        const [fx, fy] = gradientOnChart(ops, coefficients, exponents, 3, [x, y]);
        return [polynomial(ops, coefficients, exponents, [x, y]), line(x, y), ops.sub(ops.mul(w.u!, fy!), ops.mul(w.v!, fx!))];
      };
      return [...touching(pNames, w.x1!, w.y1!), ...touching(qNames, w.x2!, w.y2!)];
    },
    description: [
      'A line is written $u x + v y + 1 = 0$, a chart of the plane of lines that misses only the lines through the origin; the unknowns are $(u, v)$ and the two points of contact $(x_1, y_1)$ on $p = 0$ and $(x_2, y_2)$ on $q = 0$.',
      'For each cubic $f$ and its point $(x, y)$: $f(x, y) = 0$ (the point is on the curve), $u x + v y + 1 = 0$ (and on the line), and $u f_y - v f_x = 0$ (the line’s normal $(u, v)$ is parallel to the gradient of $f$ there).',
      'Six equations of degrees $3, 2, 3$ twice: Bézout bound $18^2 = 324$. Solutions are stored as all six values, the line followed by its two points of contact.',
    ].join(' '),
  },
  trueCount: {
    value: 36,
    source: {
      ...pluckerBook,
      note: 'The class d(d − 1) of a smooth plane curve of degree d, 6 for a cubic, is the first of Plücker’s formulas; he published them in J. reine angew. Math. 12 and gave a complete account in this book (as an encyclopaedia passage on Plücker says; the year 1834 and the page numbers not re-read). The count 36 is then Bézout’s theorem for the two dual sextics in the plane of lines (Fulton, Algebraic Curves, 1969), which meet transversally for general cubics.',
    },
  },
  excessNote: [
    'The Bézout bound $324$ overcounts by $288$, and every one of those paths ends at infinity, none at a finite point: in our runs (the generic instance, the demo and the test seeds) every path not at one of the $36$ common tangents was declared at infinity, with no failure.',
    'They end on the hyperplane at infinity of the compactified space of $(u, v, x_1, y_1, x_2, y_2)$, where the leading forms of the six equations vanish along whole families, not at isolated points: wherever $x_1 = y_1 = x_2 = y_2 = 0$ (only the line coordinates $(u, v)$ grow: lines closing in on the origin, which the chart misses), and wherever $u = v = 0$ and each contact point that grows runs off along an asymptotic direction of its cubic (the cubic part of $f$ vanishes there), and mixtures of the two.',
    'At the generic instance the $288$ ends split as $98$ with only $(u, v)$ growing, $98$ with only one contact point growing ($44$ and $54$), $36$ with both contact points, and $56$ with the line and one contact point; these splits depend on the random start and are not a published decomposition.',
    'The $36$ themselves meet no excess: for general cubics no common tangent passes through the origin, and each touches each cubic at one finite point. In special position common tangents go missing from the chart: two cubics sharing a flex on the line at infinity with that line as its tangent (two curves $Y^2 = $ cubic in $X$ in the same frame, say) share that line as a common tangent, at $u = v = 0$ with both contact points at infinity, and it takes $4$ of the $36$ (such pairs gave $32$ finite tangents in our runs).',
  ].join(' '),
  instances: [
    genericInstance('Two random complex cubics', 20261205, 'All 20 coefficients'),
    {
      id: 'two-beaded-strokes',
      kind: 'demo',
      label: 'Two beaded strokes',
      description: 'A letter carver sketches an ornament of two cubic strokes: each has a closed bead, an oval, beside an open sweeping arm, and the two arms sweep away from each other. Straight guide strokes that graze both curves are the common tangents. Of the $36$, $18$ are real; $9$ touch both curves inside the drawing, the others touch an arm far out. The two curves share no point in the drawing (as cubics they must meet somewhere, and their $3$ real common points lie far outside).',
      seed: 67,
      parameters: demoParameters,
    },
  ],
  drawing: {
    projection: 'Drawn in the (x, y)-plane of the cubics, with equal scales on both axes; the cubics are traced numerically from their equations.',
    window: () => view,
    configuration: cubics,
    solution: ([u, v, x1, y1, x2, y2]): FigureItem[] => [
      { shape: 'line', a: u!, b: v!, c: 1, layer: 'solution' },
      { shape: 'point', x: x1!, y: y1!, layer: 'tangency' },
      { shape: 'point', x: x2!, y: y2!, layer: 'tangency' },
    ],
  },
});
