import { defineProblem } from '../../../src/atlas/definition.ts';
import { conicTangencyProblem } from './conic-tangency-problem.ts';
import { stageLightsDemo } from './stage-lights-demo.ts';

export default defineProblem(conicTangencyProblem(2, { generic: 20261202, start: 3266 }, stageLightsDemo(2)));
