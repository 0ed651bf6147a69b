import { defineProblem, type ComplexInput } from '../../../src/atlas/definition.ts';
import type { SpaceItem } from '../../../src/atlas/space-figure.ts';
import { clearestSight } from '../../../src/plots/clearest-sight.ts';
import { genericInstance } from '../shared/generic-instance.ts';
import { ENGINEERING_CAUTION } from '../shared/engineering-caution.ts';
import { poseOfStudy, rotate, type Vector3 } from './study-pose.ts';

const legs = [1, 2, 3, 4, 5, 6] as const;
const axes = ['x', 'y', 'z'] as const;

/** Base joint Aᵢ (floor frame) and platform joint Bᵢ (platform frame) of leg i, from the parameters. */
const joint = (p: Readonly<Record<string, number>>, side: 'a' | 'b', i: number): Vector3 => axes.map((k) => p[`${side}${i}${k}`]!) as Vector3;

/** The platform joints in the floor frame for a pose (t₁, t₂, t₃, e₁, e₂, e₃): t + R(e)·Bᵢ. */
export function placedPlatform(values: readonly number[], p: Readonly<Record<string, number>>): Vector3[] {
  const [t1, t2, t3, ...e] = values;
  return legs.map((i) => {
    const r = rotate(e, joint(p, 'b', i));
    return [r[0] + t1!, r[1] + t2!, r[2] + t3!];
  });
}

function baseItems(p: Readonly<Record<string, number>>): SpaceItem[] {
  return [
    { shape: 'chain', points: legs.map((i) => joint(p, 'a', i)), closed: true, layer: 'given', label: 'base' },
    ...legs.map((i): SpaceItem => ({ shape: 'dot', at: joint(p, 'a', i), layer: 'given', label: `base joint ${i}` })),
  ];
}

/** Demo parameters: the two joint sets (metres) and the six leg lengths. */
function hexapod(base: readonly Vector3[], platform: readonly Vector3[], lengths: readonly number[]): Record<string, ComplexInput> {
  const out: Record<string, ComplexInput> = {};
  legs.forEach((i, n) => {
    axes.forEach((k, m) => { out[`a${i}${k}`] = base[n]![m]!; out[`b${i}${k}`] = platform[n]![m]!; });
    out[`r${i}`] = lengths[n]!;
  });
  return out;
}

// Demo data of our own (metres, rounded to millimetres): the best of 120 random irregular designs (seed 1), with leg
// lengths taken from a random pose and perturbed by up to 15 %, had 10 real assembly modes; a random walk of 250 small
// changes to joints and lengths (seed 2) that kept every change not lowering the real count raised it to 16.
const demoBase: Vector3[] = [[0.797, 0.11, 0.02], [0.326, 0.954, 0.053], [-0.644, 0.995, 0.077], [-0.883, 0.197, -0.029], [-0.389, -0.831, -0.015], [0.459, -0.702, 0.032]];
const demoPlatform: Vector3[] = [[0.273, 0.373, -0.059], [0.156, 0.48, -0.15], [-0.527, 0.32, 0.007], [-0.567, -0.301, -0.092], [0.253, -0.534, 0.056], [0.522, -0.164, 0.013]];
const demoLengths = [1.501, 1.617, 1.887, 1.76, 1.646, 1.534];

export default defineProblem({
  slug: 'forward-kinematics-of-a-stewart-gough-platform',
  title: 'Forward kinematics of a Stewart–Gough platform',
  family: 'mechanisms',
  tags: ['kinematics', 'parallel robot', 'Stewart–Gough platform', 'hexapod', 'forward kinematics', 'assembly modes', 'Study parameters'],
  statement: [
    'A rigid platform is held above a base by six telescopic legs, each with a ball joint $A_i$ on the base and $B_i$ on the platform. Given the joints and the six leg lengths $\\rho_i$, find every pose of the platform in space.',
    'For a general design there are $40$ poses over the complex numbers, and there are designs and lengths for which all $40$ are real.',
  ].join(' '),
  formulation: {
    unknowns: ['e1', 'e2', 'e3', 'g0', 'g1', 'g2', 'g3'],
    parameters: legs.flatMap((i) => [...axes.map((k) => `a${i}${k}`), ...axes.map((k) => `b${i}${k}`), `r${i}`]),
    equations: (u, p, ops) => {
      type Node = NonNullable<typeof u.e1>;
      const e: Node[] = [u.e1!, u.e2!, u.e3!];
      const g: Node[] = [u.g1!, u.g2!, u.g3!];
      const dotOf = (v: Node[], w: Node[]) => ops.add(...v.map((c, k) => ops.mul(c, w[k]!)));
      const crossOf = (v: Node[], w: Node[]) => [0, 1, 2].map((k) => ops.sub(ops.mul(v[(k + 1) % 3]!, w[(k + 2) % 3]!), ops.mul(v[(k + 2) % 3]!, w[(k + 1) % 3]!)));
      const normOfE = ops.add(1, ...e.map((c) => ops.pow(c, 2)));
      const leg = (i: number) => {
        const a = axes.map((k) => p[`a${i}${k}`]!), b = axes.map((k) => p[`b${i}${k}`]!);
        // The quaternion E·b − a·E + 2G with E = (1, e), G = (g₀, g): scalar part, then vector part.
        const scalar = ops.add(ops.neg(dotOf(e, b)), dotOf(a, e), ops.mul(2, u.g0!));
        const eb = crossOf(e, b), ae = crossOf(a, e);
        const vector = [0, 1, 2].map((k) => ops.add(b[k]!, eb[k]!, ops.neg(a[k]!), ops.neg(ae[k]!), ops.mul(2, g[k]!)));
        return ops.sub(ops.add(ops.pow(scalar, 2), ...vector.map((c) => ops.pow(c, 2))), ops.mul(ops.pow(p[`r${i}`]!, 2), normOfE));
      };
      return [...legs.map(leg), ops.add(u.g0!, dotOf(e, g))];
    },
    description: [
      'A pose is written in Study parameters: a quaternion $E = (e_0, e)$ for the rotation and $G = (g_0, g)$ for the translation $t = 2\\,G\\bar E/|E|^2$, subject to the Study quadric $e_0g_0 + e \\cdot g = 0$; the atlas works in the chart $e_0 = 1$ (it misses only half-turns, which a general instance does not have).',
      'Then $R B_i + t - A_i = (E B_i - A_i E + 2G)\\bar E/|E|^2$, so leg $i$ reads $|E B_i - A_i E + 2G|^2 = \\rho_i^2 |E|^2$, a quadric in the seven unknowns $e_1, e_2, e_3, g_0, \\dots, g_3$ (the form used by Husty, 1996).',
      'Six leg quadrics and the Study quadric give the Bézout bound $2^7 = 128$. The page stores each pose as the translation $(t_1, t_2, t_3)$ and the rotation parameters $(e_1, e_2, e_3)$.',
    ].join(' '),
    coordinates: { names: ['t1', 't2', 't3', 'e1', 'e2', 'e3'], map: poseOfStudy },
  },
  trueCount: {
    value: 40,
    source: {
      kind: 'published',
      authors: ['M. Raghavan'],
      year: 1993,
      title: 'The Stewart platform of general geometry has 40 configurations',
      venue: 'Journal of Mechanical Design 115(2) (1993), 277–282',
      doi: '10.1115/1.2919188',
      bib: { type: 'article', journal: 'Journal of Mechanical Design', volume: '115', number: '2', pages: '277--282' },
      note: 'Raghavan found the 40 by polynomial continuation; proofs followed by Ronga and Vust, by Lazard and by Mourrain (1993–1995), and Husty (Mechanism and Machine Theory 31, 1996, doi 10.1016/0094-114X(95)00091-C) derived a degree-40 polynomial in Study parameters. That all 40 can be real: P. Dietmaier, The Stewart–Gough platform of general geometry can have 40 real postures, in Advances in Robot Kinematics: Analysis and Control, Kluwer 1998, 7–16 (doi 10.1007/978-94-015-9064-8_1). DOIs and titles as secondary citations give them. That Ronga, Lazard and Mourrain each established the count 40 is as L. Rolland’s survey of the kinematics of parallel manipulators says (doi 10.5772/5431); Vust as Ronga’s coauthor, the years and Husty’s issue and pages are from memory.',
    },
  },
  excessNote: [
    'The $128 - 40 = 88$ surplus paths go to infinity, and all to one place. In homogeneous Study coordinates $[e_0 : e : g_0 : g]$ the leg equations are homogeneous quadrics, and where $e_0 = 0$ and $e = 0$ each of them reduces to $4(g_0^2 + g_1^2 + g_2^2 + g_3^2) = 0$ while the Study quadric vanishes identically.',
    'So all seven quadrics contain the surface $\\{e_0 = e = 0,\\ g_0^2 + |g|^2 = 0\\}$, points with a vanishing rotation quaternion, which are no poses at all, and this surface absorbs $88$ of the $128$ intersections.',
    'In the chart $e_0 = 1$ the surface lies at infinity; the test of this page checks that every path at infinity ends on it (rotation part $e$ negligible against $g$, and $g_0^2 + |g|^2 = 0$).',
  ].join(' '),
  caution: ENGINEERING_CAUTION,
  instances: [
    genericInstance('A random complex platform', 20260303, 'The twelve joints and the six leg lengths'),
    {
      id: 'motion-rig',
      kind: 'demo',
      label: 'A motion rig for a driving simulator',
      description: 'A small studio builds a six-legged motion rig to carry the seat of a driving simulator (units: metres; base and seat joints at irregular positions of our own). With the legs at the lengths given, the six lengths the controller reads fit $16$ real poses of the seat (of the $40$ complex ones), listed and drawn below, so the lengths alone do not tell where the seat is.',
      seed: 17,
      parameters: hexapod(demoBase, demoPlatform, demoLengths),
    },
  ],
  drawing: {
    kind: 'space',
    projection: 'Each real pose is drawn as the seat\'s joint hexagon with its six legs from the base joints.',
    sight: (_, items) => clearestSight(items.filter((i) => i.layer === 'legs')),
    configuration: baseItems,
    solution: (values, p): SpaceItem[] => {
      const placed = placedPlatform(values, p);
      return [
        { shape: 'chain', points: placed, closed: true, layer: 'solution', label: 'platform' },
        ...placed.map((b, n): SpaceItem => ({ shape: 'stick', from: joint(p, 'a', n + 1), to: b, layer: 'legs', label: `leg ${n + 1}` })),
      ];
    },
  },
});
