import { createHash } from 'node:crypto';

/** The SHA-256 digest of the UTF-8 bytes of the given texts joined by NUL characters, as 64 hex digits. */
export function sha256Hex(...texts: readonly string[]): string {
  return createHash('sha256').update(texts.join('\u0000'), 'utf8').digest('hex');
}
