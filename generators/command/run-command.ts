import { AtlasError } from '../pipeline/atlas-error.ts';
import { checkCommand } from './check-command.ts';
import type { CommandContext } from './context.ts';
import { EXIT, exitCodeOf } from './exit-codes.ts';
import { exploreCommand } from './explore-command.ts';
import { mergeCommand } from './merge-command.ts';
import { refreshCommand } from './refresh-command.ts';
import { regenerateCommand } from './regenerate-command.ts';
import { solveCommand } from './solve-command.ts';

const COMMANDS: Record<string, (args: readonly string[], ctx: CommandContext) => Promise<number>> = {
  solve: solveCommand,
  regenerate: regenerateCommand,
  refresh: refreshCommand,
  check: checkCommand,
  merge: mergeCommand,
  explore: exploreCommand,
};

/** The command's help text: every subcommand with its options, and the exit codes. */
export const HELP = `usage: node --experimental-strip-types generators/cli.ts <command> [options]

  solve <slug | path/to/definition.ts> [--json] [--seed N] [--workers N] [--write [--force]]
        [--shard k/n --out part.json]       solve one problem; print a summary (--json: one JSON object)
  regenerate [<slug | path>… | --all] [--force] [--workers N]
                                            solve and write records and pages (never worse unless --force)
  solve|regenerate <slug | path> --slurm [--shards N] [--partition P] [--workdir DIR] [--detach]
                                            run as a Slurm job array (one task per batch of paths), merge in a
                                            dependent job; wait showing parts written, or --detach: print job ids
  refresh [--workers N]                     regenerate only stale problems (npm start runs this)
  check                                     validate every content file and every definition
  explore <slug | path> [--samples N] [--climb N] [--seed N]
                                            real counts over random real instances and a climb toward more
                                            real solutions; writes content/explorations/<slug>.json
  merge <part.json>… [--json] [--force] [--record-file FILE] [--unpublished]
                                            merge shard parts into one record and write it

  every command: --content DIR (default: env ATLAS_CONTENT_DIR, else ./content), --debug (stack traces)
exit codes: 0 ok · 1 solve failed or worse result refused · 2 bad input · 3 corrupt content · 4 internal error
`;

/**
 * Runs one command line (argv without node and script) and returns the exit code; never throws. AtlasErrors print
 * their message only; any other error prints "internal error: …" and, with --debug, its stack.
 */
export async function runCommand(argv: readonly string[], ctx: CommandContext): Promise<number> {
  const [name, ...args] = argv;
  try {
    if (name === undefined || name === 'help' || name === '--help' || name === '-h') {
      (name === undefined ? ctx.stderr : ctx.stdout).write(HELP);
      return name === undefined ? EXIT.input : EXIT.ok;
    }
    const command = Object.hasOwn(COMMANDS, name) ? COMMANDS[name] : undefined;
    if (!command) throw new AtlasError('input', `unknown command "${name}"\n${HELP}`);
    return await command(args, ctx);
  } catch (error) {
    if (error instanceof AtlasError) {
      ctx.stderr.write(`${error.message}\n`);
      return exitCodeOf(error.kind);
    }
    const e = error instanceof Error ? error : new Error(String(error));
    ctx.stderr.write(`internal error: ${e.message}\n${argv.includes('--debug') ? `${e.stack}\n` : '(rerun with --debug for the stack trace)\n'}`);
    return EXIT.internal;
  }
}
