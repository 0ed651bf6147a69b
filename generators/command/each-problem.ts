import { AtlasError } from '../pipeline/atlas-error.ts';
import type { CommandContext } from './context.ts';
import { EXIT, exitCodeOf } from './exit-codes.ts';

/**
 * Runs `work` for each item, reporting an AtlasError of one item on stderr and going on with the next, so one
 * bad problem does not stop the others. Returns the largest exit code met (0 when all went well).
 */
export async function eachProblem<T>(ctx: CommandContext, items: readonly T[], work: (item: T) => Promise<number>): Promise<number> {
  let code: number = EXIT.ok;
  for (const item of items) {
    try {
      code = Math.max(code, await work(item));
    } catch (error) {
      if (!(error instanceof AtlasError)) throw error;
      ctx.stderr.write(`${error.message}\n`);
      code = Math.max(code, exitCodeOf(error.kind));
    }
  }
  return code;
}
