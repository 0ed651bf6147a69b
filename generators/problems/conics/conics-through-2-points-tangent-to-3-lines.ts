import { defineProblem } from '../../../src/atlas/definition.ts';
import { pointLineProblem } from './point-line-conditions.ts';

export default defineProblem(pointLineProblem(2, 20260112, {
  id: 'flower-bed',
  label: 'An oval flower bed',
  description: 'A gardener plans an oval flower bed that must pass through 2 marker stakes and just touch 3 straight hedges (units: metres); each conic that does so is a candidate outline.',
  points: [[3.4, -0.2], [0.4, 1.8]],
  lines: [[0, 1, -2.6], [1, 0, 3.3], [1, 1, -4.8]],
}));
