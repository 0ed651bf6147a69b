/**
 * An error meant for the maintainer: its message says what is wrong and where (file and field), and its kind
 * picks the exit code (see generators/command/exit-codes.ts). The command prints only the message, never a stack.
 */
export class AtlasError extends Error {
  readonly kind: AtlasErrorKind;
  constructor(kind: AtlasErrorKind, message: string) {
    super(message);
    this.name = 'AtlasError';
    this.kind = kind;
  }
}

/** input: bad definition or arguments; solve: the engine could not finish; refused: worse result kept out; content: corrupt content file. */
export type AtlasErrorKind = 'input' | 'solve' | 'refused' | 'content';
