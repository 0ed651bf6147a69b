import { defineProblem, type ComplexInput } from '../../../src/atlas/definition.ts';
import type { FigureItem } from '../../../src/atlas/figure.ts';
import { coefficientNames, monomialExponents } from '../shared/monomials.ts';
import { hessianOnChart, polynomial } from '../shared/form.ts';
import type { PlaneWindow } from '../shared/contour.ts';
import { planeCurveItems } from '../shared/plane-curve-items.ts';
import { genericInstance } from '../shared/generic-instance.ts';

const exponents = monomialExponents(2, 3);
const names = coefficientNames('c', 2, 3);
const view: PlaneWindow = { xMin: -3.5, xMax: 4.5, yMin: -4.5, yMax: 4.5 };

// Demo: y² − x³ + x + 0.3y³ + 0.2xy, in the order x³, x²y, xy², y³, x², xy, y², x, y, 1.
const demo = [-1, 0, 0, 0.3, 0, 0.2, 1, 1, 0, 0];
const demoParameters: Record<string, ComplexInput> = Object.fromEntries(demo.map((c, m) => [names[m]!, c]));

const curve = (q: Readonly<Record<string, number>>): FigureItem[] => planeCurveItems(q, names, exponents, view, 'the cubic', 200);

export default defineProblem({
  slug: 'flexes-of-a-plane-cubic',
  title: 'The 9 flexes of a plane cubic',
  family: 'plane-curves',
  tags: ['plane curves', 'flexes', 'inflection points', 'Hessian', 'Plücker formulas', 'Bézout bound exact'],
  statement:
    'Find the flexes (inflection points) of a general plane cubic $f(x, y) = \\sum c_{ij} x^i y^j = 0$ ($i + j \\le 3$): the points where the tangent line meets the curve with multiplicity at least three. A smooth cubic has exactly $9$ flexes, and when it is real exactly $3$ of them are real.',
  formulation: {
    unknowns: ['x', 'y'],
    parameters: names,
    equations: (u, q, ops) => {
      const c = names.map((n) => q[n]!);
      return [polynomial(ops, c, exponents, [u.x!, u.y!]), hessianOnChart(ops, c, exponents, 3, u.x!, u.y!)];
    },
    description: [
      'A flex is a point of the curve where the Hessian $H = \\det\\left(\\partial^2 F / \\partial u\\, \\partial v\\right)$ of the homogenised cubic $F(x, y, z)$ vanishes.',
      'On the chart $z = 1$ this gives $f = 0$ and $H = 0$, two equations of degree $3$: Bézout bound $9$, attained (Plücker: $3d(d - 2) = 9$ for $d = 3$).',
    ].join(' '),
  },
  trueCount: {
    value: 9,
    source: {
      kind: 'published',
      authors: ['O. Hesse'],
      year: 1844,
      title: 'Über die Wendepuncte der Curven dritter Ordnung',
      venue: 'Journal für die reine und angewandte Mathematik 28 (1844), 97–107',
      bib: { type: 'article', journal: 'Journal für die reine und angewandte Mathematik', volume: '28', pages: '97--107' },
      note: 'The flexes as the intersection with the Hessian curve; the count 3d(d − 2) for a curve of degree d was obtained by Plücker, and Hesse gave the theory in complete form in this paper (as an encyclopaedia article on curves that cites it says). Volume and pages are as one secondary citation gives them, not checked against the volume. That exactly three flexes of a real smooth cubic are real is classical (from memory); Cayley finds exactly three real ones, the flex at infinity and two of the other eight, on the non-singular divergent parabolas y² = cubic (Collected Mathematical Papers vol. 5, paper 345, p. 285, read in the TIB scan).',
    },
  },
  publishedGroup: { name: 'the affine special linear group of (Z/3)², order 9 · 24', order: '216', citation: 'J. Harris, Galois groups of enumerative problems, Duke Math. J. 46 (1979) 685–724 (the section from memory)' },
  realMaximum: { value: 3, citation: 'F. Klein, Math. Ann. 10 (1876): at most d(d − 2) = 3 real flexes, and a real smooth cubic has exactly three (from memory)' },
  excessNote: 'None: for a general cubic the curve and its Hessian meet transversally in $9$ points, all in the affine chart.',
  instances: [
    genericInstance('A random complex cubic', 20260107, 'All 10 coefficients'),
    {
      id: 'toy-railway',
      kind: 'demo',
      label: 'A toy railway bend',
      description: 'A model-railway builder lays track along the cubic $y^2 - x^3 + x + 0.3y^3 + 0.2xy = 0$ and must put a straight transition piece wherever the bend changes direction. Of the $9$ flexes, $3$ are real.',
      seed: 23,
      parameters: demoParameters,
    },
  ],
  drawing: {
      projection: 'Drawn in the (x, y)-plane of the curve itself, with equal scales on both axes; the curve is traced numerically from its equation.',
    window: () => view,
    configuration: curve,
    solution: ([x, y]) => [{ shape: 'point', x: x!, y: y!, layer: 'solution' }],
  },
});
