/**
 * The command's exit codes. 0: done. 1: a solve failed or a worse result was refused (published content kept).
 * 2: bad input (usage, a definition that fails validation, a file that cannot be loaded). 3: a content file is
 * corrupt (named with its field). 4: an internal error (a bug; rerun with --debug for the stack trace).
 */
export const EXIT = { ok: 0, failed: 1, input: 2, content: 3, internal: 4 } as const;

/** The exit code for an error kind. */
export function exitCodeOf(kind: 'input' | 'solve' | 'refused' | 'content'): number {
  return kind === 'input' ? EXIT.input : kind === 'content' ? EXIT.content : EXIT.failed;
}
