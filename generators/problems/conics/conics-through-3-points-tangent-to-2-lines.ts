import { defineProblem } from '../../../src/atlas/definition.ts';
import { pointLineProblem } from './point-line-conditions.ts';

export default defineProblem(pointLineProblem(3, 20260113, {
  id: 'flower-bed',
  label: 'An oval flower bed',
  description: 'A gardener plans an oval flower bed that must pass through 3 marker stakes and just touch 2 straight hedges (units: metres); each conic that does so is a candidate outline.',
  points: [[3.4, -0.2], [0.4, 1.8], [-2.6, -0.2]],
  lines: [[0, 1, -2.6], [1, 0, 3.3]],
}));
