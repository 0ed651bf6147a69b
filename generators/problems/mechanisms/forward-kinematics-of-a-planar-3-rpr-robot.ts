import { defineProblem } from '../../../src/atlas/definition.ts';
import type { FigureItem } from '../../../src/atlas/figure.ts';
import { fitWindow } from '../shared/fit-window.ts';
import { genericInstance } from '../shared/generic-instance.ts';
import { ENGINEERING_CAUTION } from '../shared/engineering-caution.ts';

type Point = [number, number];

/** The three floor anchors A₁ = (0, 0), A₂ = (a₂, 0), A₃ = (a₃ₓ, a₃ᵧ) of the demo's parameters. */
function anchors(p: Readonly<Record<string, number>>): Point[] {
  return [[0, 0], [p.a2!, 0], [p.a3x!, p.a3y!]];
}

/** The plate's joints B₁ = (0, 0), B₂ = (b₂, 0), B₃ = (b₃ₓ, b₃ᵧ) in the plate's own frame. */
function plateJoints(p: Readonly<Record<string, number>>): Point[] {
  return [[0, 0], [p.b2!, 0], [p.b3x!, p.b3y!]];
}

/** The plate's joints in the floor frame for the pose (x, y, cos θ, sin θ): (x, y) + R(θ)·B. */
export function placedJoints([x, y, c, s]: readonly number[], p: Readonly<Record<string, number>>): Point[] {
  return plateJoints(p).map(([bx, by]) => [x! + c! * bx - s! * by, y! + s! * bx + c! * by]);
}

function floorFrame(p: Readonly<Record<string, number>>): FigureItem[] {
  const a = anchors(p);
  return [
    { shape: 'polyline', points: a, closed: true, layer: 'given', label: 'floor anchors' },
    ...a.map(([x, y], i): FigureItem => ({ shape: 'point', x, y, layer: 'given', label: `anchor ${i + 1}` })),
  ];
}

// Demo data (metres), our own: floor frame, plate and strut lengths picked from a search over random designs and
// lengths on a 5 cm grid (seed 7) for one where all six assembly modes are real.
const demoParameters = { a2: 2.3, a3x: 0.15, a3y: 3.45, b2: 2.2, b3x: 0.3, b3y: 1.1, r1: 3.05, r2: 3.25, r3: 2.75 };

export default defineProblem({
  slug: 'forward-kinematics-of-a-planar-3-rpr-robot',
  title: 'Assembly modes of a planar 3-RPR parallel robot',
  family: 'mechanisms',
  tags: ['kinematics', 'parallel robot', '3-RPR', 'forward kinematics', 'assembly modes', 'planar mechanism'],
  statement: [
    'A triangular plate moves in the plane, held by three telescopic struts. Strut $i$ turns freely about a fixed anchor $A_i$ on the floor and about a joint $B_i$ on the plate (revolute, prismatic, revolute: RPR), and its length $\\rho_i$ is set by an actuator.',
    'Given the anchors, the plate and the three lengths, find every pose of the plate (position and angle) that fits.',
    'For a general design there are $6$ such poses over the complex numbers, the assembly modes, and for suitable real designs and lengths all $6$ are real.',
  ].join(' '),
  formulation: {
    unknowns: ['x', 'y', 'c', 's'],
    parameters: ['a2', 'a3x', 'a3y', 'b2', 'b3x', 'b3y', 'r1', 'r2', 'r3'],
    groups: [['x', 'y'], ['c', 's']],
    equations: (u, p, ops) => {
      type Node = NonNullable<typeof u.x>;
      const zero = ops.constant(0);
      // Strut i minus strut 1, with c² + s² replaced by 1 (the fourth equation), written out so that its
      // bidegree in {x, y} and {c, s} is visibly (1, 1):
      // 2(x, y)·RB − 2(x, y)·A − 2A·RB + |B|² + |A|² − ρᵢ² + ρ₁², where RB = (c·bx − s·by, s·bx + c·by).
      const strutMinusFirst = (bx: Node, by: Node, ax: Node, ay: Node, r: Node): Node => {
        const rbx = ops.sub(ops.mul(u.c!, bx), ops.mul(u.s!, by));
        const rby = ops.add(ops.mul(u.s!, bx), ops.mul(u.c!, by));
        return ops.add(
          ops.mul(2, ops.add(ops.mul(u.x!, rbx), ops.mul(u.y!, rby))),
          ops.mul(-2, ops.add(ops.mul(u.x!, ax), ops.mul(u.y!, ay))),
          ops.mul(-2, ops.add(ops.mul(ax, rbx), ops.mul(ay, rby))),
          ops.pow(bx, 2), ops.pow(by, 2), ops.pow(ax, 2), ops.pow(ay, 2),
          ops.neg(ops.pow(r, 2)), ops.pow(p.r1!, 2),
        );
      };
      return [
        ops.sub(ops.add(ops.pow(u.x!, 2), ops.pow(u.y!, 2)), ops.pow(p.r1!, 2)),
        strutMinusFirst(p.b2!, zero, p.a2!, zero, p.r2!),
        strutMinusFirst(p.b3x!, p.b3y!, p.a3x!, p.a3y!, p.r3!),
        ops.sub(ops.add(ops.pow(u.c!, 2), ops.pow(u.s!, 2)), 1),
      ];
    },
    description: [
      'Put the floor frame at anchor $A_1 = (0, 0)$ with $A_2 = (a_2, 0)$, and the plate frame at joint $B_1$ with $B_2 = (b_2, 0)$; a pose is the position $(x, y)$ of $B_1$ and the rotation $(c, s) = (\\cos\\theta, \\sin\\theta)$, so that $B_i$ sits at $(x, y) + R(c, s)B_i$.',
      'Strut 1 gives the circle $x^2 + y^2 = \\rho_1^2$; struts 2 and 3 give $|(x, y) + R B_i - A_i|^2 = \\rho_i^2$, and subtracting the first equation (and using $c^2 + s^2 = 1$ for the term $|B_i|^2(c^2 + s^2)$) leaves $2(x, y) \\cdot R B_i - 2(x, y) \\cdot A_i - 2 A_i \\cdot R B_i + |A_i|^2 + |B_i|^2 = \\rho_i^2 - \\rho_1^2$, bilinear in $(x, y)$ and $(c, s)$ plus lower terms; with $c^2 + s^2 = 1$ these are four quadrics, Bézout bound $2^4 = 16$.',
      'In the groups $\\{x, y\\}$ and $\\{c, s\\}$ the equations have bidegrees $(2, 0)$, $(1, 1)$, $(1, 1)$, $(0, 2)$, so the two-homogeneous bound is $8$; the atlas solves by total degree to show the naive count at work.',
    ].join(' '),
  },
  trueCount: {
    value: 6,
    source: {
      kind: 'published',
      authors: ['C. M. Gosselin', 'J.-P. Merlet'],
      year: 1994,
      title: 'On the direct kinematics of planar parallel manipulators: special architectures and number of solutions',
      venue: 'Mechanism and Machine Theory 29(8) (1994), 1083–1097',
      bib: { type: 'article', journal: 'Mechanism and Machine Theory', volume: '29', number: '8', pages: '1083--1097' },
      note: 'Their abstract (read in the 1993 manuscript) states that the direct kinematic problem of the general planar three-degree-of-freedom parallel manipulator reduces to a polynomial of degree 6, found by several researchers independently, among them Gosselin, Sefrioui and Richard (Mechanism and Machine Theory, early 1990s). Volume, issue and pages as a reference list that cites the article gives them; no DOI was found. That Hunt showed six assembly modes is as L. Rolland’s survey of the kinematics of parallel manipulators says (doi 10.5772/5431); from memory, not re-read: the year of Hunt’s paper, 1983, and that all six can be real.',
    },
  },
  realMaximum: { value: 6, citation: 'all six assembly modes can be real (K. H. Hunt, 1983; C. Gosselin, J. Sefrioui, M. J. Richard 1994; from memory)' },
  excessNote: [
    'The $16 - 6 = 10$ surplus paths go to infinity. Homogenise with a new coordinate $h$: at $h = 0$ the circle and the rotation condition become $x^2 + y^2 = 0$ and $c^2 + s^2 = 0$, so each of $(x, y)$ and $(c, s)$ is zero or points along an isotropic direction $(1, \\pm i)$,',
    'and the bilinear parts of the other two equations, $2(x, y) \\cdot R(c, s) B_i$, vanish for general data exactly when one of the two is zero or both directions carry the same sign.',
    'So the equations meet the plane at infinity in two whole lines, $\\{[\\delta : \\pm i\\delta : \\gamma : \\pm i\\gamma : 0]\\}$ (the circular points of the position and of the rotation, tied together), and these two lines absorb $10$ of the $16$ intersections.',
    'The two-homogeneous start already keeps the two groups apart and sees only $8$; its $2$ surplus paths still end where $(x, y)$ and $(c, s)$ are isotropic together.',
    'No assembly mode is lost: a genuine pose has $c^2 + s^2 = 1$ and is finite.',
  ].join(' '),
  caution: ENGINEERING_CAUTION,
  instances: [
    genericInstance('A random complex robot', 20260301, 'The anchors, the plate and the three strut lengths'),
    {
      id: 'positioning-table',
      kind: 'demo',
      label: 'A positioning table with six real poses',
      description:
        'A workshop builds a small positioning table: a triangular plate moved in the plane by three telescopic struts anchored to the floor frame (units: metres). With the struts set to $3.05$, $3.25$ and $2.75$ m the controller must know which pose the plate is in; all six assembly modes are real, so the lengths alone do not decide it.',
      seed: 11,
      parameters: demoParameters,
    },
  ],
  drawing: {
    projection: 'Drawn in the plane of the mechanism itself, with equal scales on both axes.',
    window: (p, items) => fitWindow([...floorFrame(p), ...(items ?? [])]),
    configuration: floorFrame,
    solution: (values, p) => {
      const placed = placedJoints(values, p);
      const a = anchors(p);
      return [
        { shape: 'polyline', points: placed, closed: true, layer: 'solution', label: 'plate' },
        ...placed.map((b, i): FigureItem => ({ shape: 'polyline', points: [a[i]!, b], closed: false, layer: 'struts', label: `strut ${i + 1}` })),
      ];
    },
  },
});
