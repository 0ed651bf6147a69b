import { defineProblem } from '../../../src/atlas/definition.ts';
import { pointLineProblem } from './point-line-conditions.ts';

export default defineProblem(pointLineProblem(5, 20260105, {
  id: 'flower-bed',
  label: 'A flower bed through five stakes',
  description: 'A gardener plans a flower bed that must pass through 5 marker stakes (units: metres); every conic that does so is drawn, though only a closed one (an ellipse) can outline a bed.',
  points: [[3.4, -0.2], [0.4, 1.8], [-2.6, -0.2], [0.9, -2.1], [2.5, 1.3]],
  lines: [],
}));
