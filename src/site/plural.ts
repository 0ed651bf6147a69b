/** "1 real solution" / "8 real solutions": a count with its noun, plural by appending "s" unless given. */
export function countNoun(n: number, singular: string, plural = `${singular}s`): string {
  return `${n.toLocaleString('en-US')} ${n === 1 ? singular : plural}`;
}
