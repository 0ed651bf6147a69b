import type { FormulationDefinition } from '../../../src/atlas/definition.ts';

/** The expression builders a formulation is handed (add, sub, mul, neg, pow, dot, det, constant). */
export type Ops = Parameters<FormulationDefinition['equations']>[2];
