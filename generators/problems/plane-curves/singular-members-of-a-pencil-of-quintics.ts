import { defineProblem } from '../../../src/atlas/definition.ts';
import { pencilProblem } from './pencil-problem.ts';

// Demo data in the order x⁵, x⁴y, …, 1 (monomials by falling degree): each of P and Q is a product of five real
// lines plus a small quartic, scaled to largest coefficient 1 and rounded to 4 decimals. Its ten nodes give ten
// singular members near λ = 0 and ten near λ = ∞; kept from 25 random tries for the most real singular members.
export default defineProblem(pencilProblem({
  slug: 'singular-members-of-a-pencil-of-quintics',
  degree: 5,
  nouns: 'quintics',
  genericSeed: 20261105,
  view: { xMin: -3.2, xMax: 3.2, yMin: -4.2, yMax: 4.2 },
  demo: {
    id: 'laser-sweep',
    label: 'A laser show’s sweep',
    description: 'A laser show morphs one figure of five crossing beams, slightly rounded, into another through the curves $P + \\lambda Q = 0$. The projector’s controller must slow down at every frame whose curve has a crossing or a lone bright point: of the $48$ singular frames, $32$ are real; three of their nodes lie outside the drawn window.',
    seed: 53,
    p: [-0.0227, 1, -0.6332, -0.3295, 0.2302, -0.0261, 0.7512, -0.2688, 0.6233, -0.3874, 0.0783, 0.2029, -0.0643, -0.055, -0.0027, -0.5475, 0.2377, -0.1199, -0.0402, 0.0204, 0.051],
    q: [-0.0082, -0.0074, 0.2217, 0.3982, 0.2365, 0.0468, 0.0276, 0.4851, 1, 0.6952, 0.1582, 0.2134, 0.7431, 0.689, 0.192, 0.1681, 0.2659, 0.0999, 0.0307, 0.0198, 0.0006],
  },
}));
