import { defineProblem } from '../../../src/atlas/definition.ts';
import { tensorEigenvectorProblem } from './tensor-eigenvector-problem.ts';

// Demo form in the order x³, x²y, xy², y³, x²z, xyz, y²z, xz², yz², z³ (written through x, y with z = 1): drawn at
// random with 3 decimals and kept, from a few tries, because all 7 eigenvectors came out real.
export default defineProblem(tensorEigenvectorProblem({
  slug: 'eigenvectors-of-a-symmetric-ternary-cubic',
  degree: 3,
  noun: 'cubic',
  genericSeed: 20261114,
  view: { xMin: -6.2, xMax: 2.2, yMin: -3, yMax: 3.6 },
  demo: {
    id: 'lamp-pattern',
    label: 'A lamp’s brightness pattern',
    description: 'A lighting designer shapes a lamp whose brightness in the direction of a unit vector $v$ is given by a cubic form $F(v)$ of our own. The directions where the brightness is stationary on the sphere (brightest, darkest, or a saddle between) are the eigenvectors; since $F(-v) = -F(v)$, each line gives a brightest and a darkest direction at once. All $7$ eigenvectors are real.',
    seed: 97,
    coefficients: [0.185, 0.109, -0.043, -0.53, -0.384, 0.592, -0.977, -0.614, 0.152, 0.426],
  },
}));
