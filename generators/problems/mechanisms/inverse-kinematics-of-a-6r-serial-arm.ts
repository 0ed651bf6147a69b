import { defineProblem, type ComplexInput } from '../../../src/atlas/definition.ts';
import type { SpaceItem } from '../../../src/atlas/space-figure.ts';
import { clearestSight } from '../../../src/plots/clearest-sight.ts';
import { genericInstance } from '../shared/generic-instance.ts';
import { ENGINEERING_CAUTION } from '../shared/engineering-caution.ts';
import { armOf, axesOf, skeletonOf, type ArmData } from './serial-arm-skeleton.ts';
import { toolFrameOf, type Frame } from './denavit-hartenberg.ts';
import type { Vector3 } from './vector3.ts';

const five = [1, 2, 3, 4, 5] as const;
const axisNames = (k: number) => ['x', 'y', 'z'].map((c) => `z${k}${c}`);

/** The tool point p and the tool axis w (the direction of joint axis 6) from the parameters. */
const toolPoint = (p: Readonly<Record<string, number>>): Vector3 => [p.px!, p.py!, p.pz!];
const toolAxis = (p: Readonly<Record<string, number>>): Vector3 => [p.wx!, p.wy!, p.wz!];

function baseAndTarget(p: Readonly<Record<string, number>>): SpaceItem[] {
  const tip = toolPoint(p), w = toolAxis(p);
  const reach = 0.25 * Math.max(...five.map((i) => Math.abs(p[`a${i}`]!)), ...[...five, 6].map((i) => Math.abs(p[`d${i}`]!)));
  return [
    { shape: 'stick', from: [0, 0, -reach], to: [0, 0, reach], layer: 'given', label: 'axis of joint 1' },
    { shape: 'dot', at: [0, 0, 0], layer: 'given', label: 'base' },
    { shape: 'stick', from: tip, to: [tip[0] + reach * w[0], tip[1] + reach * w[1], tip[2] + reach * w[2]], layer: 'given', label: 'tool axis' },
    { shape: 'dot', at: tip, layer: 'given', label: 'tool point' },
  ];
}

/** A real arm of our own: twists αᵢ (radians), lengths aᵢ and offsets dᵢ (metres). */
interface ArmDesign { readonly twist: readonly number[]; readonly length: readonly number[]; readonly offset: readonly number[] }

/** The arm data of a design (cos and sin of each twist). */
const armData = (d: ArmDesign): ArmData => ({ cosTwist: d.twist.map(Math.cos), sinTwist: d.twist.map(Math.sin), length: d.length, offset: d.offset });

/** The parameters of the system for a real arm and a tool frame: λᵢ, μᵢ, aᵢ, dᵢ, the tool point and the tool axis. */
function armParameters(arm: ArmData, tool: Frame): Record<string, ComplexInput> {
  const out: Record<string, ComplexInput> = {};
  five.forEach((i) => { out[`l${i}`] = arm.cosTwist[i - 1]!; out[`m${i}`] = arm.sinTwist[i - 1]!; out[`a${i}`] = arm.length[i - 1]!; });
  [...five, 6].forEach((i) => { out[`d${i}`] = arm.offset[i - 1]!; });
  ['x', 'y', 'z'].forEach((k, n) => { out[`p${k}`] = tool.origin[n]!; out[`w${k}`] = tool.z[n]!; });
  return out;
}

// Demo data of our own (radians and metres, rounded to 0.001). The best of 300 random arms (twists 0.3 to 2.8 rad of
// either sign, lengths 0.1 to 1 m, offsets within ±0.6 m; seed 2), each with the tool frame of a random posture, had 10
// real postures, counted by Newton's method from 300 random postures; a random walk of small changes to the twists,
// lengths (kept at least 0.05 m), offsets and that posture (seed 4) that kept every change not lowering the count raised
// it to 14, and a longer walk from there (seed 11, 1596 steps) to 16. The full solve of the rounded data confirms 16 real.
const demoDesign: ArmDesign = { twist: [-1.162, -1.426, 1.728, 1.704, -3.049], length: [0.05, 0.723, 0.05, 1.064, 1.614], offset: [0.049, 0.9, -0.26, 1.017, 1.245, 0.897] };
/** The joint angles (radians) of the posture whose tool frame is the demo's target pose, so the pose is reachable. */
export const demoPostureAngles: readonly number[] = [-0.468, 1.647, -2.562, 2.878, 2.125, 0.746];
/** The demo's tool frame: the forward kinematics of demoPostureAngles (its x-axis fixes only θ₆). */
export const demoToolFrame: Frame = toolFrameOf(armData(demoDesign), demoPostureAngles.map((t) => [Math.cos(t), Math.sin(t)] as [number, number]));

export default defineProblem({
  slug: 'inverse-kinematics-of-a-6r-serial-arm',
  title: 'Inverse kinematics of a general 6R serial arm',
  family: 'mechanisms',
  tags: ['kinematics', 'serial robot', '6R', 'inverse kinematics', 'Denavit–Hartenberg', 'robot arm'],
  statement: [
    'A robot arm is a chain of six links joined by six revolute joints, each turning about its own axis. Given the geometry of the links and a pose of the tool (a point and an orientation in space), find every set of joint angles that puts the tool there.',
    'For a general arm of six revolute joints and a general reachable pose there are $16$ postures over the complex numbers, and there are arms and poses for which all $16$ are real.',
  ].join(' '),
  formulation: {
    unknowns: ['c1', 's1', ...axisNames(3), ...axisNames(4), ...axisNames(5)],
    parameters: [...five.map((i) => `l${i}`), ...five.map((i) => `m${i}`), ...five.map((i) => `a${i}`), ...[...five, 6].map((i) => `d${i}`), 'px', 'py', 'pz', 'wx', 'wy', 'wz'],
    equations: (u, p, ops) => {
      type Node = NonNullable<typeof u.c1>;
      const dotOf = (v: Node[], w: Node[]) => ops.add(...v.map((c, k) => ops.mul(c, w[k]!)));
      const crossOf = (v: Node[], w: Node[]) => [0, 1, 2].map((k) => ops.sub(ops.mul(v[(k + 1) % 3]!, w[(k + 2) % 3]!), ops.mul(v[(k + 2) % 3]!, w[(k + 1) % 3]!)));
      const axis = (k: number): Node[] => axisNames(k).map((n) => u[n]!);
      const z: Node[][] = [
        [ops.constant(0), ops.constant(0), ops.constant(1)],
        [ops.mul(p.m1!, u.s1!), ops.neg(ops.mul(p.m1!, u.c1!)), p.l1!],
        axis(3), axis(4), axis(5),
        [p.wx!, p.wy!, p.wz!],
      ];
      const tip = [p.px!, p.py!, p.pz!];
      // Position: Σ dᵢzᵢ + Σ aᵢ (zᵢ × zᵢ₊₁)/μᵢ = p, multiplied through by μ₁μ₂μ₃μ₄μ₅ so that it stays polynomial.
      const sines = five.map((i) => p[`m${i}`]!);
      const allSines = ops.mul(...sines);
      const position = [0, 1, 2].map((k) => ops.add(
        ops.mul(allSines, ops.sub(ops.add(...z.map((zi, i) => ops.mul(p[`d${i + 1}`]!, zi[k]!))), tip[k]!)),
        ...five.map((i) => ops.mul(p[`a${i}`]!, ...sines.filter((_, j) => j !== i - 1), crossOf(z[i - 1]!, z[i]!)[k]!)),
      ));
      return [
        ops.sub(ops.add(ops.pow(u.c1!, 2), ops.pow(u.s1!, 2)), 1),
        ...[2, 3, 4].map((i) => ops.sub(dotOf(z[i]!, z[i]!), 1)),
        ...[2, 3, 4, 5].map((i) => ops.sub(dotOf(z[i - 1]!, z[i]!), p[`l${i}`]!)),
        ...position,
      ];
    },
    description: [
      'The arm is written with its joint axes as unknown unit vectors. Axis $1$ is the $z$-axis of the base frame, $z_1 = (0, 0, 1)$; axis $2$ turns about it with joint $1$, $z_2 = (\\mu_1 s_1, -\\mu_1 c_1, \\lambda_1)$ with $(c_1, s_1) = (\\cos\\theta_1, \\sin\\theta_1)$; axes $3$, $4$, $5$ are unknown vectors $z_3, z_4, z_5$; axis $6$ is the given tool axis $w$.',
      'The Denavit–Hartenberg parameters enter as $\\lambda_i = \\cos\\alpha_i$ and $\\mu_i = \\sin\\alpha_i$ for the twists between consecutive axes, the lengths $a_i$ of the common normals $x_i = z_i \\times z_{i+1}/\\mu_i$ and the offsets $d_i$ along the axes (with $d_1$ from the base origin and $d_6$ to the tool point $p$).',
      'The equations are $c_1^2 + s_1^2 = 1$, $z_i \\cdot z_i = 1$ ($i = 3, 4, 5$), $z_{i-1} \\cdot z_i = \\lambda_{i-1}$ ($i = 3, 4, 5, 6$; the last is linear) and the three coordinates of the position loop $\\sum_{i=1}^{6} d_i z_i + \\sum_{i=1}^{5} a_i x_i = p$, multiplied by $\\mu_1 \\cdots \\mu_5$: ten quadrics and one linear equation in $11$ unknowns, Bézout bound $2^{10} = 1024$.',
      'The tool’s turn about its own axis fixes only $\\theta_6$ and is not an unknown; every joint angle follows from consecutive axes and normals ($\\cos\\theta_i = x_{i-1} \\cdot x_i$), so the solutions are the postures one for one.',
    ].join(' '),
  },
  trueCount: {
    value: 16,
    source: {
      kind: 'published',
      authors: ['M. Raghavan', 'B. Roth'],
      year: 1993,
      title: 'Inverse kinematics of the general 6R manipulator and related linkages',
      venue: 'Journal of Mechanical Design 115(3) (1993), 502–508',
      bib: { type: 'article', journal: 'Journal of Mechanical Design', volume: '115', number: '3', pages: '502--508' },
      note: 'Raghavan and Roth eliminate to a univariate polynomial of degree 16. The 16 were found earlier by polynomial continuation: L.-W. Tsai and A. P. Morgan, Solving the kinematics of the most general six- and five-degree-of-freedom manipulators by continuation methods, Journal of Mechanisms, Transmissions, and Automation in Design 107 (1985), 189–200, who wrote the problem as eight quadrics in eight unknowns (Bézout bound 256). From memory, not re-read: the issue number and pages of both papers, that Lee and Liang (1988) also gave a degree-16 polynomial, and that Manseur and Doty (1989) gave an arm and pose with 16 real postures.',
    },
  },
  excessNote: [
    'Of the $1024$ paths, $16$ end at the postures and the other $1008$ go to infinity. Homogenise with a new coordinate $h$: at $h = 0$ the quadrics keep only their leading forms, $c_1^2 + s_1^2 = 0$ and $z_i \\cdot z_i = 0$ for $i = 3, 4, 5$, together with the leading parts of the angle conditions $z_{i-1} \\cdot z_i = \\lambda_{i-1}$ and of the position loop.',
    'So at infinity each of $(c_1, s_1)$, $z_3$, $z_4$, $z_5$ is either zero or an isotropic vector, a point of the cone $v \\cdot v = 0$ that contains no real direction; these are the circular points of the joint-1 circle and of the three unit spheres, and no posture lies there.',
    'We checked it numerically: at the generic instance below and at random instances in the tests, all $1008$ surplus paths end at infinity, none fails and none ends at a finite false solution, and in every end each block that is not negligible (at least $5\\%$ of the largest coordinate) has $v \\cdot v$ below $10^{-3}$ of its squared size (below $10^{-4}$ in the runs we looked at).',
    'Tsai and Morgan eliminate two joints and write eight quadrics in eight unknowns (Bézout bound $256$); the atlas keeps the axes themselves as unknowns, so that every finite solution is a posture, one for one, at the price of more paths.',
  ].join(' '),
  caution: ENGINEERING_CAUTION,
  instances: [
    genericInstance('A random complex arm and pose', 20260305, 'The twists, lengths, offsets, tool point and tool axis'),
    {
      id: 'glazing-cell',
      kind: 'demo',
      label: 'A glazing arm in a pottery studio',
      description: 'A pottery studio builds a six-joint arm of its own design to dip bowls in glaze (lengths and offsets in metres, twists given by their cosines $\\lambda_i$ and sines $\\mu_i$ in the parameters below; the target pose is the tool frame of one posture of the arm, so it is reachable). To hold a bowl at that pose the controller can choose among $16$ real postures, every one of the $16$ complex ones, drawn below; they differ in where every link goes, so the choice decides what the arm sweeps through on its way.',
      seed: 23,
      parameters: armParameters(armData(demoDesign), demoToolFrame),
    },
  ],
  drawing: {
    kind: 'space',
    projection: 'Each posture is drawn as its chain of offsets along the joint axes and lengths along the common normals, from the base origin to the tool point, with a dot on each joint axis where its common normal leaves it, the last at the tool point; joint 1’s axis is the vertical z-axis.',
    sight: (_, items) => clearestSight(items.filter((i) => i.layer === 'joints')),
    configuration: baseAndTarget,
    solution: (values, p): SpaceItem[] => {
      const skeleton = skeletonOf(axesOf(values, armOf(p), toolAxis(p)), armOf(p));
      return [
        { shape: 'chain', points: skeleton.map((v) => [v[0], v[1], v[2]]), closed: false, layer: 'solution', label: 'arm' },
        ...[1, 2, 3, 4, 5, 6].map((i): SpaceItem => ({ shape: 'dot', at: skeleton[2 * i - 1]!, layer: 'joints', label: `joint ${i}` })),
      ];
    },
  },
});
