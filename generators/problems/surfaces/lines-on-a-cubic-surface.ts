import { defineProblem, type ComplexInput } from '../../../src/atlas/definition.ts';
import type { SpaceItem } from '../../../src/atlas/space-figure.ts';
import { clearestSight } from '../../../src/plots/clearest-sight.ts';
import { coefficientNames, monomialExponents } from '../shared/monomials.ts';
import { substitute } from '../shared/univariate.ts';
import type { PlaneWindow } from '../shared/contour.ts';
import { planeCurveItems } from '../shared/plane-curve-items.ts';
import { genericInstance } from '../shared/generic-instance.ts';
import { boxEdges, clipToBox } from '../shared/space-box.ts';
import { coefficientsOf, linearForm, product, scale, sum } from '../shared/numeric-polynomial.ts';

const exponents = monomialExponents(3, 3);
const names = coefficientNames('c', 3, 3);
const view: PlaneWindow = { xMin: -4, xMax: 4, yMin: -4, yMax: 4 };

/**
 * Demo surface: Clebsch's diagonal surface Σ xᵢ³ = 0, Σ xᵢ = 0 in projective 4-space, all of whose 27 lines are
 * real, seen through a real projective change of coordinates of our own (rows: coefficients of x, y, z, 1) that
 * tilts every line away from the horizontal planes z = constant and from the plane at infinity.
 */
export const clebschFrame: readonly (readonly number[])[] = [[1, 0.3, -0.2, 0.5], [-0.4, 1, 0.25, -0.3], [0.2, -0.35, 1, 0.4], [0.1, 0.15, -0.3, 1]];

/** The cubic Σ formᵢ³ of the frame's linear forms (plus −Σ forms when `clebsch`), as the 20 coefficients. */
function sumOfCubes(clebsch: boolean): Record<string, ComplexInput> {
  const forms = clebschFrame.map(([a, b, c, k]) => linearForm([a!, b!, c!], k!));
  const all = clebsch ? [...forms, scale(sum(...forms), -1)] : forms;
  return Object.fromEntries(coefficientsOf(sum(...all.map((f) => product(f, f, f))), exponents).map((c, m) => [names[m]!, c]));
}

/** Half the side of the cube the lines are drawn in (the section's square is its middle). */
const HALF = 4;

/** The section of the surface by the plane z = 0 (the terms without z), as chains of 3-space in that plane. */
const slice = (q: Readonly<Record<string, number>>): SpaceItem[] =>
  planeCurveItems(q, names, exponents, view, 'section by the plane z = 0').flatMap((item): SpaceItem[] =>
    item.shape === 'polyline' ? [{ shape: 'chain', points: item.points.map(([x, y]) => [x, y, 0] as [number, number, number]), closed: item.closed, layer: item.layer, label: 'section by the plane z = 0' }] : []);

export default defineProblem({
  slug: 'lines-on-a-cubic-surface',
  title: 'The 27 lines on a cubic surface',
  family: 'surfaces',
  tags: ['cubic surface', 'lines', 'Cayley', 'Salmon', 'excess intersection'],
  statement:
    'Find every straight line contained in a general cubic surface $f(x, y, z) = \\sum c_{ijk} x^i y^j z^k = 0$ ($i + j + k \\le 3$). A smooth cubic surface contains exactly $27$ lines over the complex numbers; a real one contains $27$, $15$, $7$ or $3$ real lines.',
  formulation: {
    unknowns: ['a', 'b', 'c', 'd'],
    parameters: names,
    groups: [['a', 'b'], ['c', 'd']],
    equations: (u, q, ops) => {
      // The line (x, y, z) = (a + c·s, b + d·s, s) lies on the surface iff f(a + cs, b + ds, s) vanishes identically in s.
      const inS = substitute(ops, names.map((n) => q[n]!), exponents, [[u.a!, u.c!], [u.b!, u.d!], [null, ops.constant(1)]]);
      return inS.map((coefficient, k) => {
        if (!coefficient) throw new Error(`lines-on-a-cubic-surface: the coefficient of s^${k} vanished identically`);
        return coefficient;
      });
    },
    description: [
      'A line not parallel to the plane $z = 0$ is $\\{(a + cs,\\ b + ds,\\ s)\\}$, so four numbers $(a, b, c, d)$ chart the lines in space.',
      'Substituting into $f$ gives a cubic in $s$ whose four coefficients must vanish: four equations of degree $3$ in $(a, b, c, d)$, Bézout bound $3^4 = 81$.',
      'In the groups $\\{a, b\\}$ (the point where the line crosses $z = 0$) and $\\{c, d\\}$ (its direction) the coefficient of $s^k$ has bidegree $(3 - k, k)$, so the two-homogeneous bound is $45$; the atlas solves by total degree to show the naive count at work.',
    ].join(' '),
  },
  trueCount: {
    value: 27,
    source: {
      kind: 'published',
      authors: ['A. Cayley'],
      year: 1849,
      title: 'On the triple tangent planes of surfaces of the third order',
      venue: 'The Cambridge and Dublin Mathematical Journal 4 (1849), 118–132; reprinted as paper 76 in his Collected Mathematical Papers, vol. 1',
      url: 'https://goobi.tib.eu/viewer/fulltext/1025197879/467',
      bib: { type: 'article', journal: 'The Cambridge and Dublin Mathematical Journal', volume: '4', pages: '118--132' },
      note: 'The link opens p. 446 of the reprint, where the count twenty-seven is derived from the circumscribed cone of degree six (by Salmon’s paper in vol. 2 of the same journal, p. 65) and Plücker’s formula for double tangents (his Theorie der algebraischen Curven, p. 211). Schläfli’s memoir on the species of cubic surfaces (Philosophical Transactions of the Royal Society of London 153, 1863) credits the theory of the 27 lines to Cayley and Salmon, cites Salmon’s paper on the triple tangent planes in vol. 4, pp. 252–260, and treats the reality of the lines. The page range of 1849 agrees with one secondary citation but was not seen on the reprint’s first page. From memory, not re-read: that the real counts are exactly 27, 15, 7 and 3, and that all 27 real on the diagonal surface is Clebsch’s (1871; that they are all real there is as MathWorld’s entry on the surface states).',
    },
  },
  publishedGroup: { name: 'W(E₆), the Weyl group of E₆', order: '51840', citation: 'C. Jordan, Traité des substitutions et des équations algébriques, Gauthier-Villars, Paris 1870; J. Harris, Galois groups of enumerative problems, Duke Math. J. 46 (1979) 685–724' },
  realMaximum: { value: 27, citation: 'L. Schläfli, Phil. Trans. R. Soc. London 153 (1863): a smooth real cubic surface has 27, 15, 7 or 3 real lines' },
  excessNote: [
    'The $81 - 27 = 54$ surplus paths go to infinity. Homogenise the chart with a new coordinate $h$: at $h = 0$ only the cubic part $f_3$ of $f$ survives,',
    'and the four equations say that $f_3(\\lambda(a, b) + \\mu(c, d), 0)$ vanishes for all $\\lambda, \\mu$. For a general surface that forces $(a, b)$ and $(c, d)$ to be proportional to one of the three roots of the binary cubic $f_3(x, y, 0)$:',
    'three lines of spurious solutions at infinity, which absorb $54$ of the $81$ intersections. No genuine line is missed, since a general surface has no line parallel to $z = 0$.',
  ].join(' '),
  instances: [
    genericInstance('A random complex cubic surface', 20260106, 'All 20 coefficients'),
    {
      id: 'plaster-model',
      kind: 'demo',
      label: 'A plaster model with 27 real lines',
      description: 'A workshop casts a plaster model of a cubic surface for a mathematics classroom and wants to stretch a thread along every straight line on it. The surface is a tilted copy of the diagonal surface $\\sum x_i^3 = 0$, $\\sum x_i = 0$; all 27 lines are real.',
      seed: 19,
      parameters: sumOfCubes(true),
    },
    {
      id: 'fermat-model',
      kind: 'demo',
      label: 'A second model with only 3 real lines',
      description: 'The same workshop casts the Fermat cubic surface $x_0^3 + x_1^3 + x_2^3 + x_3^3 = 0$, tilted by the same change of coordinates. Of its 27 lines only 3 are real (the lines $x_i + x_j = x_k + x_l = 0$), the smallest real count a smooth real cubic surface can have.',
      seed: 31,
      parameters: sumOfCubes(false),
    },
  ],
  drawing: {
    kind: 'space',
    projection: 'Each real line of the surface is drawn where it crosses the cube from −4 to 4 on every axis (edges dashed), over the section of the surface by the plane z = 0.',
    sight: (_, items) => clearestSight(items.filter((i) => i.layer === 'solution')),
    configuration: (q) => [...boxEdges(HALF, 'construction', 'the cube from −4 to 4'), ...slice(q)],
    solution: ([a, b, c, d]) => {
      const ends = clipToBox([a!, b!, 0], [c!, d!, 1], HALF);
      return ends ? [{ shape: 'stick', from: ends[0], to: ends[1], layer: 'solution' }] : [];
    },
  },
});
