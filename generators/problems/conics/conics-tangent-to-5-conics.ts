import { defineProblem } from '../../../src/atlas/definition.ts';
import { conicTangencyProblem } from './conic-tangency-problem.ts';
import { stageLightsDemo } from './stage-lights-demo.ts';

export default defineProblem(conicTangencyProblem(0, { generic: 20261200, start: 3264 }, stageLightsDemo(0)));
