import { defineProblem } from '../../../src/atlas/definition.ts';
import { conicTangencyProblem } from './conic-tangency-problem.ts';
import { stageLightsDemo } from './stage-lights-demo.ts';

export default defineProblem(conicTangencyProblem(1, { generic: 20261201, start: 3265 }, stageLightsDemo(1)));
