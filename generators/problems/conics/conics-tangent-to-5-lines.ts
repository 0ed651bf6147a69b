import { defineProblem } from '../../../src/atlas/definition.ts';
import { pointLineProblem } from './point-line-conditions.ts';

export default defineProblem(pointLineProblem(0, 20260110, {
  id: 'flower-bed',
  label: 'A flower bed touching five hedges',
  description: 'A gardener plans a flower bed that must just touch 5 straight hedges (units: metres); every conic that does so is drawn, though only a closed one (an ellipse) can outline a bed.',
  points: [],
  lines: [[0, 1, -2.6], [1, 0, 3.3], [1, 1, -4.8], [1, -1, 4.5], [0.3, 1, 2.7]],
}));
