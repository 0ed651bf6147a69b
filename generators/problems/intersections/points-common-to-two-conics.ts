import { defineProblem } from '../../../src/atlas/definition.ts';
import { curvePairProblem } from './curve-pair.ts';

// Coefficients in the order x², xy, y², x, y, 1.
export default defineProblem(curvePairProblem({
  slug: 'points-common-to-two-conics',
  degree: 2,
  noun: 'conic',
  genericSeed: 20260102,
  view: { xMin: -5, xMax: 5, yMin: -4, yMax: 4 },
  demo: {
    id: 'two-running-tracks',
    label: 'Two oval running tracks',
    description: 'A school paints two oval tracks on one field: a wide one, $x^2 + 4y^2 = 16$, and a tall one centred off the middle, $9x^2 + 0.5xy + 4y^2 - 18x - 4y = 26$. The line painter must stop wherever the two ovals cross (units: metres).',
    p: [1, 0, 4, 0, 0, -16],
    q: [9, 0.5, 4, -18, -4, -26],
  },
}));
