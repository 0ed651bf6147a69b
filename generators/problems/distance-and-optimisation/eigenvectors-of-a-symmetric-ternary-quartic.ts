import { defineProblem } from '../../../src/atlas/definition.ts';
import { tensorEigenvectorProblem } from './tensor-eigenvector-problem.ts';

// Demo form in the order x⁴, x³y, …, z⁴ (monomials in x, y by falling degree, z filling each to degree 4): drawn at
// random with 3 decimals and kept, from 80 tries, because all 13 eigenvectors came out real.
export default defineProblem(tensorEigenvectorProblem({
  slug: 'eigenvectors-of-a-symmetric-ternary-quartic',
  degree: 4,
  noun: 'quartic',
  genericSeed: 20261115,
  view: { xMin: -4.6, xMax: 4.6, yMin: -3, yMax: 4.6 },
  demo: {
    id: 'grain-stiffness',
    label: 'Stiffness of a carved block',
    description: 'A woodcarver models how hard a block of layered wood is to cut in the direction of a unit vector $v$ by a quartic form $F(v)$ of our own, the same for $v$ and $-v$. The directions where this hardness is stationary on the sphere (hardest, easiest, or a saddle between) are the eigenvectors. All $13$ are real.',
    seed: 101,
    coefficients: [-0.204, 0.152, -0.143, -0.217, -0.846, 0.214, 0.109, 0.121, -0.89, -0.385, 0.016, -0.161, -0.858, 0.041, -0.57],
  },
}));
