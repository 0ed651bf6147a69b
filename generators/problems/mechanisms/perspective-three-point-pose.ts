import { defineProblem } from '../../../src/atlas/definition.ts';
import type { FigureItem } from '../../../src/atlas/figure.ts';
import { fitWindow } from '../shared/fit-window.ts';
import { genericInstance } from '../shared/generic-instance.ts';
import { ENGINEERING_CAUTION } from '../shared/engineering-caution.ts';
import { dot3 as dot, type Vector3 } from './vector3.ts';

const markers = [1, 2, 3] as const;

/** The ray (xᵢ, yᵢ, 1) through marker i's image point, in the camera frame (z along the optical axis). */
function ray(p: Readonly<Record<string, number>>, i: number): Vector3 {
  return [p[`x${i}`]!, p[`y${i}`]!, 1];
}

/**
 * The three markers in the camera frame for depth ratios (u, v) = (λ₂/λ₁, λ₃/λ₁): λ₁ is fixed by the known distance
 * between markers 1 and 2, taking λ₁ > 0 (the positive square root), and marker i sits at λᵢ(xᵢ, yᵢ, 1).
 */
export function markersInCameraFrame([u, v]: readonly number[], p: Readonly<Record<string, number>>): Vector3[] {
  const [r1, r2, r3] = markers.map((i) => ray(p, i)) as [Vector3, Vector3, Vector3];
  const gap = [r1[0] - u! * r2[0], r1[1] - u! * r2[1], r1[2] - u! * r2[2]] as Vector3;
  const depth1 = Math.sqrt(p.d12! / dot(gap, gap));
  return [1, u!, v!].map((ratio, k) => [r1, r2, r3][k]!.map((c) => depth1 * ratio * c) as Vector3);
}

/** Top view: the camera frame's (x, z)-plane, seen along the camera's y-axis. */
const topView = (v: Vector3): [number, number] => [v[0], v[2]];

function cameraAndRays(p: Readonly<Record<string, number>>): FigureItem[] {
  // Rays are drawn far beyond any marker; the figure clips them to the window.
  const reach = 50 * Math.sqrt(Math.max(p.d12!, p.d13!, p.d23!));
  return [
    { shape: 'point', x: 0, y: 0, layer: 'given', label: 'camera' },
    ...markers.map((i): FigureItem => ({ shape: 'polyline', points: [[0, 0], topView(ray(p, i).map((c) => reach * c) as Vector3)], closed: false, layer: 'rays', label: `ray to marker ${i}` })),
  ];
}

// Demo data of our own: image points (calibrated, focal length 1) and marker spacings (metres), picked from a search
// over marker triangles on flat ground and cameras looking down at them from 2 to 8 m (seed 3; this view was taken
// from about 4.9 m up), rounded, for a view in which all four poses are real, in front of the camera and well apart.
const demoParameters = { x1: 0.187, y1: 0.293, x2: 0.199, y2: -0.118, x3: -0.365, y3: -0.144, d12: 4.19, d13: 12.52, d23: 8.64 };

export default defineProblem({
  slug: 'perspective-three-point-pose',
  title: 'Camera pose from three points (perspective-three-point)',
  family: 'mechanisms',
  tags: ['computer vision', 'camera pose', 'perspective-three-point', 'P3P', 'Grunert', 'Bézout bound exact'],
  statement: [
    'A calibrated camera sees three markers whose mutual distances are known. Each image point fixes the ray from the camera centre through its marker; find every placement of the three markers on their rays with the known distances, that is every pose of the camera relative to the markers.',
    'For general data there are $4$ solutions over the complex numbers (up to the sign of all three depths at once), and for suitable real views all $4$ are real and in front of the camera.',
  ].join(' '),
  formulation: {
    unknowns: ['u', 'v'],
    parameters: ['x1', 'y1', 'x2', 'y2', 'x3', 'y3', 'd12', 'd13', 'd23'],
    equations: (u, p, ops) => {
      const q = (i: number, j: number) => ops.add(ops.mul(p[`x${i}`]!, p[`x${j}`]!), ops.mul(p[`y${i}`]!, p[`y${j}`]!), 1);
      // |λ₁r₁ − λ₂r₂|² / λ₁² and the like, in the ratios u = λ₂/λ₁, v = λ₃/λ₁.
      const side12 = ops.add(q(1, 1), ops.mul(-2, u.u!, q(1, 2)), ops.mul(ops.pow(u.u!, 2), q(2, 2)));
      const side13 = ops.add(q(1, 1), ops.mul(-2, u.v!, q(1, 3)), ops.mul(ops.pow(u.v!, 2), q(3, 3)));
      const side23 = ops.add(ops.mul(ops.pow(u.u!, 2), q(2, 2)), ops.mul(-2, u.u!, u.v!, q(2, 3)), ops.mul(ops.pow(u.v!, 2), q(3, 3)));
      return [ops.sub(ops.mul(p.d12!, side23), ops.mul(p.d23!, side12)), ops.sub(ops.mul(p.d12!, side13), ops.mul(p.d13!, side12))];
    },
    description: [
      'Marker $i$ sits at depth $\\lambda_i$ on the ray $r_i = (x_i, y_i, 1)$ through its image point, so the known squared distances give $\\lambda_i^2 q_{ii} - 2\\lambda_i\\lambda_j q_{ij} + \\lambda_j^2 q_{jj} = d_{ij}$ with $q_{ij} = r_i \\cdot r_j$: three quadrics in the depths, Bézout bound $8$, and all $8$ solutions are genuine, since $(\\lambda_1, \\lambda_2, \\lambda_3)$ and $(-\\lambda_1, -\\lambda_2, -\\lambda_3)$ solve together.',
      'Following Grunert, the atlas divides by $\\lambda_1^2$: in the depth ratios $u = \\lambda_2/\\lambda_1$, $v = \\lambda_3/\\lambda_1$ the ratios of the three equations are two conics, $d_{12}\\,|u r_2 - v r_3|^2 = d_{23}\\,|r_1 - u r_2|^2$ and $d_{12}\\,|r_1 - v r_3|^2 = d_{13}\\,|r_1 - u r_2|^2$; Bézout bound $4$, attained.',
      'Each solution $(u, v)$ gives back $\\lambda_1 = \\pm\\sqrt{d_{12}/|r_1 - u r_2|^2}$, one pose for each sign; the figure takes $\\lambda_1 > 0$.',
    ].join(' '),
  },
  trueCount: {
    value: 4,
    source: {
      kind: 'published',
      authors: ['R. M. Haralick', 'C.-N. Lee', 'K. Ottenberg', 'M. Nölle'],
      year: 1994,
      title: 'Review and analysis of solutions of the three point perspective pose estimation problem',
      venue: 'International Journal of Computer Vision 13(3) (1994), 331–356',
      doi: '10.1007/BF02028352',
      bib: { type: 'article', journal: 'International Journal of Computer Vision', volume: '13', number: '3', pages: '331--356' },
      note: 'They review the direct solutions from Grunert (1841) on, each of which reduces the problem to a polynomial of degree four, so at most four poses. Issue, pages and DOI as several reference lists that cite the article give them. From memory, not re-read: that all four can be real and in front of the camera, with such a configuration given by Fischler and Bolles (Communications of the ACM 24(6), 1981, 381–395, doi 10.1145/358669.358692, as reference lists give them).',
    },
  },
  realMaximum: { value: 4, citation: 'all four poses can be real (R. M. Haralick et al., IJCV 13, 1994; from memory)' },
  excessNote: [
    'None in the formulation shown: two conics in the depth ratios meet in $4$ points, none at infinity for general data (at infinity the quadratic parts $d_{12}(u^2 q_{22} - 2uv q_{23} + v^2 q_{33}) - d_{23}u^2 q_{22}$ and $d_{12}v^2 q_{33} - d_{13}u^2 q_{22}$ have no common root).',
    'The naive count lives in the depths: there the Bézout bound $8$ is attained too, but every pose is counted twice, once with each sign of the depths, the second copy being the mirror image through the camera centre with all markers behind it.',
    'Dividing by $\\lambda_1^2$ removes exactly that sign, so $8 = 4 \\times 2$.',
    'A real solution $(u, v)$ is always a real pose, because $|r_1 - u r_2|^2 > 0$ for real data; it is in front of the camera when $u > 0$ and $v > 0$.',
  ].join(' '),
  caution: ENGINEERING_CAUTION,
  instances: [
    genericInstance('A random complex view', 20260302, 'The three image points and the three squared distances'),
    {
      id: 'marker-posts',
      kind: 'demo',
      label: 'Three marker posts seen by a site camera',
      description: 'A surveyor’s camera on a mast looks down on three marker posts whose spacings were taped on the ground (squared distances $4.19$, $12.52$ and $8.64$ m², image coordinates after calibration, focal length $1$). Four camera poses fit the photograph, all in front of the camera, so one photograph of three markers cannot tell them apart.',
      seed: 13,
      parameters: demoParameters,
    },
  ],
  drawing: {
    projection: 'Seen from above in the camera frame: the (x, z)-plane, with space projected along the camera’s y-axis; the camera is at the origin looking up the page.',
    window: (p, items) => fitWindow([{ shape: 'point', x: 0, y: 0, layer: 'given' }, ...(items ?? []).filter((i) => i.layer !== 'rays')]),
    configuration: cameraAndRays,
    solution: (values, p) => {
      const placed = markersInCameraFrame(values, p);
      return [
        { shape: 'polyline', points: placed.map(topView), closed: true, layer: 'solution', label: 'markers' },
        ...placed.map((m, k): FigureItem => ({ shape: 'point', x: m[0], y: m[2], layer: 'solution', label: `marker ${k + 1}` })),
      ];
    },
  },
});
