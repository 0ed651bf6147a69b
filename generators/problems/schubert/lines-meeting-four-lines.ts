import { defineProblem, type ComplexInput } from '../../../src/atlas/definition.ts';
import type { FigureItem } from '../../../src/atlas/figure.ts';
import { fitWindow } from '../shared/fit-window.ts';
import { genericInstance } from '../shared/generic-instance.ts';

const lines = [1, 2, 3, 4] as const;
const axes = ['x', 'y', 'z'] as const;

/** Oblique parallel projection of space to the drawing plane: (x, y, z) ↦ (x + 0.45z, y + 0.3z). */
function project([x, y, z]: readonly number[]): [number, number] {
  return [x! + 0.45 * z!, y! + 0.3 * z!];
}

function point(q: Readonly<Record<string, number>>, i: number, s: number): number[] {
  return axes.map((a) => q[`p${a}${i}`]! + s * q[`d${a}${i}`]!);
}

function givenLines(q: Readonly<Record<string, number>>): FigureItem[] {
  return lines.map((i) => ({ shape: 'polyline', points: [project(point(q, i, -4)), project(point(q, i, 4))], closed: false, layer: 'given', label: `wire ${i}` }));
}

// Demo data (metres): four wires, each through a point p with direction d, none of them parallel or meeting.
const demoPoints = [[-2.1, 3.0, 1.4], [-2.7, 1.9, 1.6], [-0.9, 1.1, 1.0], [1.8, 1.8, 1.9]];
const demoDirections = [[-0.1, -0.7, 0.1], [-0.3, -0.9, -0.6], [-0.6, 0.3, 1.0], [0.4, 0.6, -0.8]];
const demoParameters: Record<string, ComplexInput> = {};
lines.forEach((i) => axes.forEach((a, k) => {
  demoParameters[`p${a}${i}`] = demoPoints[i - 1]![k]!;
  demoParameters[`d${a}${i}`] = demoDirections[i - 1]![k]!;
}));

export default defineProblem({
  slug: 'lines-meeting-four-lines',
  title: 'Lines meeting four lines in space',
  family: 'schubert',
  tags: ['Schubert calculus', 'lines in space', 'Grassmannian', 'transversals', 'excess intersection'],
  statement:
    'Given four general lines $L_1, \\dots, L_4$ in space, $L_i = \\{ p_i + s\\, d_i \\}$, find every line that meets all four. There are exactly $2$ over the complex numbers: the first three lines lie on one quadric surface, whose other ruling meets $L_4$ where $L_4$ crosses the quadric.',
  formulation: {
    unknowns: ['s', 't'],
    parameters: lines.flatMap((i) => [...axes.map((a) => `p${a}${i}`), ...axes.map((a) => `d${a}${i}`)]),
    groups: [['s'], ['t']],
    equations: (u, q, ops) => {
      const P = axes.map((a) => ops.add(q[`p${a}1`]!, ops.mul(u.s!, q[`d${a}1`]!)));
      const Q = axes.map((a) => ops.add(q[`p${a}2`]!, ops.mul(u.t!, q[`d${a}2`]!)));
      // The line PQ meets L_k iff Q − P, p_k − P and d_k are linearly dependent; writing Q − P = (Q − p_k) + (p_k − P)
      // drops a vanishing determinant and leaves each row in one unknown only, so the bidegree (1, 1) is visible.
      return [3, 4].map((k) => ops.det([
        axes.map((a, m) => ops.sub(Q[m]!, q[`p${a}${k}`]!)),
        axes.map((a, m) => ops.sub(q[`p${a}${k}`]!, P[m]!)),
        axes.map((a) => q[`d${a}${k}`]!),
      ]));
    },
    description: [
      'A transversal is determined by where it crosses $L_1$ and $L_2$: the points $P = p_1 + s\\,d_1$ and $Q = p_2 + t\\,d_2$.',
      'It meets $L_k$ ($k = 3, 4$) when $\\det(Q - P,\\ p_k - P,\\ d_k) = \\det(Q - p_k,\\ p_k - P,\\ d_k) = 0$, an equation of degree one in $s$ and one in $t$.',
      'We chose these coordinates over a chart of the Grassmannian of lines (four quadrics, Bézout bound $16$) because they keep the geometry visible and the count nearly sharp:',
      'total degree $2 \\cdot 2 = 4$, and with the groups $\\{s\\}, \\{t\\}$ the two-homogeneous bound is exactly $2$.',
    ].join(' '),
  },
  trueCount: {
    value: 2,
    source: {
      kind: 'published',
      authors: ['H. Schubert'],
      year: 1879,
      title: 'Kalkül der abzählenden Geometrie',
      venue: 'Leipzig (1879); reprinted by Springer, Berlin (1979), edited by S. L. Kleiman',
      url: 'https://archive.org/details/kalklderabzh00schuuoft',
      bib: { type: 'book', address: 'Leipzig' },
      note: 'Two lines meet four general lines: Schubert’s method counts them with the four lines moved into special position, where the solutions can be seen, and keeps the number (his principle of conservation of number). The reprint (ISBN 3-540-09233-1) and the linked scan of the 1879 edition are as a reference list that cites the book gives them; the place, Leipzig, is as encyclopaedia entries on Schubert give it, and the publisher, B. G. Teubner, as secondary reference lists give it (not seen on the scan’s title page).',
    },
  },
  publishedGroup: { name: 'S₂, the full symmetric group', order: '2', citation: 'J. Harris, Galois groups of enumerative problems, Duke Math. J. 46 (1979) 685–724' },
  realMaximum: { value: 2, citation: 'common practice: four lines of one ruling of a real hyperboloid of one sheet are met by every line of the other ruling; moved off it, two real lines remain' },
  excessNote: [
    'The total-degree homotopy tracks $4$ paths; the $2$ extra ones go to infinity in the plane of $(s, t)$, to the points where $s$ or $t$ alone is infinite:',
    'each equation is $c_0 + c_1 s + c_2 t + c_3 st$, whose top-degree part $st$ vanishes at two points at infinity common to both equations.',
    'In $\\mathbb{P}^1 \\times \\mathbb{P}^1$ (the two-homogeneous start) they disappear and the bound $2$ is exact.',
  ].join(' '),
  instances: [
    genericInstance('Four random complex lines', 20260104, 'Points and directions'),
    {
      id: 'four-wires',
      kind: 'demo',
      label: 'A rod against four wires',
      description: 'In an art installation four taut straight wires cross a gallery at different heights and angles (units: metres). The artist wants a straight rigid rod that rests against all four wires; there are two ways to place it.',
      seed: 17,
      parameters: demoParameters,
    },
  ],
  drawing: {
    projection: 'Space is drawn by the oblique parallel projection (x, y, z) ↦ (x + 0.45z, y + 0.3z); the dots mark where each solution line meets wires 1 and 2.',
    window: (q, items) => fitWindow([...givenLines(q), ...(items ?? [])], 0.05),
    configuration: givenLines,
    solution: ([s, t], q) => {
      const P = point(q, 1, s!), Q = point(q, 2, t!);
      const along = (k: number) => project(P.map((v, m) => v + k * (Q[m]! - v)));
      return [
        { shape: 'polyline', points: [along(-0.3), along(1.3)], closed: false, layer: 'solution' },
        ...[P, Q].map((X): FigureItem => ({ shape: 'point', x: project(X)[0], y: project(X)[1], layer: 'tangency' })),
      ];
    },
  },
});
