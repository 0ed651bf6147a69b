import { defineProblem } from '../../../src/atlas/definition.ts';
import { pointLineProblem } from './point-line-conditions.ts';

export default defineProblem(pointLineProblem(3, 20260113, {
  id: 'flower-bed',
  label: 'A flower bed between stakes and hedges',
  description: 'A gardener plans a flower bed that must pass through 3 marker stakes and just touch 2 straight hedges (units: metres); every conic that does so is drawn, though only a closed one (an ellipse) can outline a bed.',
  points: [[3.4, -0.2], [0.4, 1.8], [-2.6, -0.2]],
  lines: [[0, 1, -2.6], [1, 0, 3.3]],
}));
