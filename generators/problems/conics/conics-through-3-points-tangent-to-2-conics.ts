import { defineProblem } from '../../../src/atlas/definition.ts';
import { conicTangencyProblem } from './conic-tangency-problem.ts';
import { stageLightsDemo } from './stage-lights-demo.ts';

export default defineProblem(conicTangencyProblem(3, { generic: 20261203, start: 3267 }, stageLightsDemo(3)));
