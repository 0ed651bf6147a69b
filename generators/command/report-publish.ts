import type { PublishOutcome } from '../write/publish.ts';
import type { CommandContext } from './context.ts';
import { EXIT } from './exit-codes.ts';

/** Says on stderr what publishing did (and why it refused); returns EXIT.failed for a refusal, else EXIT.ok. */
export function reportPublished(ctx: CommandContext, slug: string, outcome: PublishOutcome): number {
  switch (outcome.status) {
    case 'created':
      ctx.stderr.write(`${slug}: record and page written\n`);
      return EXIT.ok;
    case 'unchanged':
      ctx.stderr.write(`${slug}: unchanged (same bytes; nothing written)\n`);
      return EXIT.ok;
    case 'replaced':
      ctx.stderr.write(`${slug}: replaced; history: ${outcome.change}\n`);
      return EXIT.ok;
    case 'refused':
      ctx.stderr.write(`${slug}: refused to write the new record:\n${outcome.reasons.map((r) => `  - ${r}\n`).join('')}  content is left as it was; pass --force to write it anyway\n`);
      return EXIT.failed;
  }
}
