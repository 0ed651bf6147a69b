import { defineProblem } from '../../../src/atlas/definition.ts';
import { pencilProblem } from './pencil-problem.ts';

// Demo data in the order x⁶, x⁵y, …, 1 (monomials by falling degree): each of P and Q is a product of six real
// lines plus a small quartic (coefficients 0.005 times standard normals), scaled to largest coefficient 1 and
// rounded to 4 decimals. Its fifteen nodes give fifteen singular members near λ = 0 and fifteen near λ = ∞; kept
// from 40 random tries (seeds 1 … 40 of our own generator) for the most real singular members.
export default defineProblem(pencilProblem({
  slug: 'singular-members-of-a-pencil-of-sextics',
  degree: 6,
  nouns: 'sextics',
  genericSeed: 20261206,
  view: { xMin: -4.4, xMax: 6.2, yMin: -3.9, yMax: 3.9 },
  demo: {
    id: 'woven-lattice',
    label: 'A morphing woven lattice',
    description: 'A textile designer animates one lattice of six slightly bowed threads into another through the curves $P + \\lambda Q = 0$. A frame whose curve has a crossing (two threads meeting) or a lone point is marked, because the loom must tie a knot there: of the $75$ singular frames, $33$ are real; five of their nodes lie outside the drawn window.',
    seed: 61,
    p: [0.058, 0.4264, 0.873, 0.5727, -0.0351, -0.0962, 0.0042, 0.0819, -0.0907, -0.4361, -0.3515, -0.128, 0.0194, -0.3797, -1, -0.5721, 0.3411, 0.0023, -0.106, 0.4929, 0.4625, -0.0609, 0.4474, -0.1198, -0.0583, -0.1768, 0.01, 0.0208],
    q: [0.3424, -0.6399, -0.0464, 0.2553, 0.0249, -0.0126, 0.0005, -0.1819, 1, -0.0816, -0.1967, -0.0081, -0.0048, -0.7544, -0.2652, 0.1403, -0.1191, -0.0504, 0.5651, -0.3321, 0.0222, 0.1069, 0.2381, 0.3253, 0.0268, -0.2304, -0.0897, 0.0344],
  },
}));
