import { defineProblem } from '../../../src/atlas/definition.ts';
import { conicTangencyProblem } from './conic-tangency-problem.ts';
import { stageLightsDemo } from './stage-lights-demo.ts';

export default defineProblem(conicTangencyProblem(4, { generic: 20261204, start: 3268 }, stageLightsDemo(4)));
