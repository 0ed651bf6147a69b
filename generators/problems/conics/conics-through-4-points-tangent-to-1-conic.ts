import { defineProblem } from '../../../src/atlas/definition.ts';
import { conicTangencyProblem } from './conic-tangency-problem.ts';
import { stageLightsDemo } from './stage-lights-demo.ts';

/** The rung of the conic-tangency ladder (Chasles 1864) with its stage-lights demo; seeds of its generic instance and stored set. */
export default defineProblem(conicTangencyProblem(4, { generic: 20261204, start: 3268 }, stageLightsDemo(4)));
