import type { ProblemDefinition } from '../../src/atlas/definition.ts';
import { AtlasError } from './atlas-error.ts';
import type { EngineServices, SolveStrategy } from './engine-services.ts';

/** The strategy named by the definition's solver.kind (total degree when omitted); AtlasError('input') if unknown. */
export function strategyFor(definition: ProblemDefinition, engine: EngineServices, file: string): SolveStrategy {
  const kind = definition.solver?.kind ?? 'total-degree';
  const strategy = Object.hasOwn(engine.strategies, kind) ? engine.strategies[kind] : undefined;
  if (!strategy) throw new AtlasError('input', `${file}: solver.kind: unknown solver "${kind}" (known: ${Object.keys(engine.strategies).join(', ')})`);
  return strategy;
}
