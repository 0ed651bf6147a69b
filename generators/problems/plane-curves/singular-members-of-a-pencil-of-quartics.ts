import { defineProblem } from '../../../src/atlas/definition.ts';
import { pencilProblem } from './pencil-problem.ts';

// Demo data in the order x⁴, x³y, …, 1 (monomials by falling degree): each of P and Q is a product of four real
// lines plus a small cubic, scaled to largest coefficient 1 and rounded to 4 decimals. Its six nodes give six
// singular members near λ = 0 and six near λ = ∞; kept from 60 random tries for the most real singular members.
export default defineProblem(pencilProblem({
  slug: 'singular-members-of-a-pencil-of-quartics',
  degree: 4,
  nouns: 'quartics',
  genericSeed: 20261104,
  view: { xMin: -3.2, xMax: 3.2, yMin: -3.2, yMax: 3.2 },
  demo: {
    id: 'contour-animation',
    label: 'An animated contour line',
    description: 'A map animator sweeps one contour line of a landscape into another through the curves $P + \\lambda Q = 0$; a frame in which the line pinches into a crossing (a pass) or shrinks to a lone point (a summit or a pit) is flagged for review. Of the $27$ singular frames, $23$ are real; three of their nodes lie outside the drawn window.',
    seed: 47,
    p: [0.4844, -1, -0.8763, 0.9365, 0.6257, -0.3414, 0.093, -0.0433, -0.1608, -0.0725, 0.0115, -0.1591, 0.0384, 0.0062, 0.0057],
    q: [-0.0405, -0.0525, 0.0681, -0.0019, -0.0067, -0.1895, -0.4259, 0.246, 0.0143, -0.1608, -1, 0.215, 0.2858, -0.7323, 0.3578],
  },
}));
