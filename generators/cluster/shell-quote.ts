/** One word for a POSIX shell: single-quoted, with each ' written as '\'' (any string round-trips exactly). */
export function shellQuote(word: string): string {
  return /^[A-Za-z0-9_./:=@%+,-]+$/.test(word) ? word : `'${word.replaceAll("'", `'\\''`)}'`;
}

/** A command line for a POSIX shell: every word quoted by shellQuote, joined by spaces. */
export function shellLine(words: readonly string[]): string {
  return words.map(shellQuote).join(' ');
}
