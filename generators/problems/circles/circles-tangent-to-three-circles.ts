import { defineProblem } from '../../../src/atlas/definition.ts';
import type { FigureItem } from '../../../src/atlas/figure.ts';
import { fitWindow } from '../shared/fit-window.ts';
import { genericInstance } from '../shared/generic-instance.ts';

const given = [1, 2, 3] as const;

/** The circle x² + y² + Dx + Ey + F = 0 as centre and radius, or null when its radius is not real. */
function circleOf(D: number, E: number, F: number): { cx: number; cy: number; r: number } | null {
  const r2 = (D * D + E * E) / 4 - F;
  return r2 >= 0 ? { cx: -D / 2, cy: -E / 2, r: Math.sqrt(r2) } : null;
}

function givenCircles(p: Readonly<Record<string, number>>): FigureItem[] {
  return given.map((i) => ({ shape: 'circle', cx: p[`a${i}`]!, cy: p[`b${i}`]!, r: Math.abs(p[`r${i}`]!), layer: 'given', label: `pond ${i}` }));
}

export default defineProblem({
  slug: 'circles-tangent-to-three-circles',
  title: 'Circles tangent to three circles',
  family: 'circles',
  tags: ['Apollonius', 'circles', 'tangency', 'plane geometry', 'Bézout bound exact'],
  statement: [
    'Given three circles in the plane, with centres $(a_i, b_i)$ and radii $r_i$ for $i = 1, 2, 3$, find every circle tangent to all three.',
    'This is the problem of Apollonius. For three general circles there are $8$ solutions over the complex numbers,',
    'and for suitable real circles (as in the demo below) all $8$ are real.',
  ].join(' '),
  formulation: {
    unknowns: ['D', 'E', 'F'],
    parameters: given.flatMap((i) => [`a${i}`, `b${i}`, `r${i}`]),
    equations: (u, p, ops) =>
      given.map((i) => {
        const a = p[`a${i}`]!, b = p[`b${i}`]!, r = p[`r${i}`]!;
        // Centre c = (−D/2, −E/2), R² = |c|² − F. Then |c − a|² − R² − r² = aD + bE + F + a² + b² − r² =: L,
        // and tangency (|c − a|² − R² − r²)² = 4R²r² reads L² = r²(D² + E² − 4F): one quadric in (D, E, F).
        const L = ops.add(ops.mul(a, u.D!), ops.mul(b, u.E!), u.F!, ops.pow(a, 2), ops.pow(b, 2), ops.neg(ops.pow(r, 2)));
        const R4 = ops.add(ops.pow(u.D!, 2), ops.pow(u.E!, 2), ops.mul(-4, u.F!));
        return ops.sub(ops.pow(L, 2), ops.mul(ops.pow(r, 2), R4));
      }),
    description: [
      'A circle is a point $(D, E, F)$ of the space of equations $x^2 + y^2 + Dx + Ey + F = 0$.',
      'With centre $c = (-D/2, -E/2)$ and $R^2 = |c|^2 - F$, tangency to the circle with centre $(a, b)$ and radius $r$ is',
      '$(|c - (a, b)|^2 - R^2 - r^2)^2 = 4R^2r^2$, which expands to $(aD + bE + F + a^2 + b^2 - r^2)^2 = r^2(D^2 + E^2 - 4F)$,',
      'one quadric in $(D, E, F)$; three quadrics give the Bézout bound $2^3 = 8$, and it is attained.',
      'Unlike centre and radius, these coordinates do not count a circle twice (radius $\\pm R$).',
    ].join(' '),
  },
  trueCount: {
    value: 8,
    source: {
      kind: 'published',
      authors: ['K. Drechsler', 'U. Sterz'],
      year: 1999,
      title: "Apollonius' contact problem in n-space in view of enumerative geometry",
      venue: 'Acta Mathematica Universitatis Comenianae 68(1) (1999), 37–47',
      bib: { type: 'article', journal: 'Acta Mathematica Universitatis Comenianae', volume: '68', number: '1', pages: '37--47' },
      note: 'They count 2^(n+1) hyperspheres tangent to n + 1 general ones by Bézout in the space of coefficients (volume, issue and pages checked on the article’s first page). That the planar construction goes back to Viète’s restoration of Apollonius’s lost book on tangencies (Apollonius Gallus, Paris, 1600) is as historical accounts of the problem give it; Viète’s text was not read.',
    },
  },
  realMaximum: { value: 8, citation: 'all eight are real for three mutually exterior circles of distinct radii, classical since Apollonius (from memory)' },
  excessNote: [
    'None: the three tangency quadrics meet in exactly $8$ points of the projective space of circle equations, none of them at infinity, for general data.',
    'Excess appears only in other coordinates: with centre $(x, y)$ and radius $R$, the two kinds of contact $|c - (a, b)| = R \\pm r$ combine into one quartic per given circle, so the naive count is $4^3 = 64$, and each circle is found twice (radius $\\pm R$).',
  ].join(' '),
  instances: [
    genericInstance('Random complex circles', 20260101, 'Centres and radii'),
    {
      id: 'three-ponds',
      kind: 'demo',
      label: 'Three ponds in a park',
      description:
        'A landscape designer lays out a curved footpath that must just touch the shores of three round ponds in a new park (units: tens of metres). Each circular path that touches all three shores is a candidate route; all eight exist.',
      seed: 7,
      parameters: { a1: 0, b1: 0, r1: 1.2, a2: 6.5, b2: 1, r2: 1.8, a3: 2.6, b3: 5.4, r3: 0.9 },
    },
  ],
  drawing: {
    projection: 'Drawn in the (x, y)-plane of the problem itself, with equal scales on both axes.',
    window: (p, items) => fitWindow([...givenCircles(p), ...(items ?? [])]),
    configuration: givenCircles,
    solution: ([D, E, F]) => {
      const c = circleOf(D!, E!, F!);
      return c ? [{ shape: 'circle', ...c, layer: 'solution' }] : [];
    },
  },
});
