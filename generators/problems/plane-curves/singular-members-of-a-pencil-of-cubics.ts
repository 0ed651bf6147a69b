import { defineProblem } from '../../../src/atlas/definition.ts';
import { pencilProblem } from './pencil-problem.ts';

// Demo data in the order x³, x²y, xy², y³, x², xy, y², x, y, 1: each of P and Q is a product of three real lines
// plus a small conic times a line, scaled to largest coefficient 1 and rounded to 4 decimals. A product of three
// lines has three nodes, so three singular members lie near λ = 0 and three near λ = ∞ (large |λ|); the lines were
// drawn at random and kept from 80 tries because the other six singular members came out real as well.
export default defineProblem(pencilProblem({
  slug: 'singular-members-of-a-pencil-of-cubics',
  degree: 3,
  nouns: 'cubics',
  genericSeed: 20261103,
  view: { xMin: -3.6, xMax: 4, yMin: -2.6, yMax: 5.8 },
  demo: {
    id: 'glyph-blend',
    label: 'Blending two type outlines',
    description: 'A type designer blends two outlines, each close to three crossing strokes, through the family $P + \\lambda Q = 0$, one frame for each mix $\\lambda$. Where a frame’s outline pinches to a crossing or a lone point the blend needs redrawing by hand. All $12$ singular frames are real.',
    seed: 43,
    p: [0.3796, 0.0405, -0.5668, 0.2368, 1, 0.5474, -0.7155, 0.6943, 0.3613, 0.1426],
    q: [-1, -0.877, -0.1505, -0.0003, 0.337, 0.4573, 0.0835, 0.1366, 0.0172, -0.0078],
  },
}));
