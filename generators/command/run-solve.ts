import type { LoadedDefinition } from '../pipeline/load-definition.ts';
import { solveProblem, type SolvedProblem } from '../pipeline/solve-problem.ts';
import type { EngineServices } from '../pipeline/engine-services.ts';
import type { CommandContext } from './context.ts';
import { createProgress } from './progress.ts';

/** Solves a loaded definition with progress on stderr (label `<slug> <instance>`), returning the record and seconds. */
export async function solveWithProgress(
  ctx: CommandContext,
  engine: EngineServices,
  loaded: LoadedDefinition,
  options: { seed?: number; workers?: number },
): Promise<SolvedProblem> {
  const progress = createProgress(ctx.stderr, ctx.now);
  let current = '';
  try {
    return await solveProblem(loaded, engine, {
      ...options,
      onProgress: (instance, p) => {
        if (instance.id !== current) {
          if (current) progress.finish();
          current = instance.id;
          progress.start(`${loaded.definition.slug} ${instance.id}`);
        }
        progress.update(p.done, p.total);
      },
    });
  } finally {
    progress.finish();
  }
}
