/** The batches (1-based, ascending) whose part file is among `names` (a listing of the parts folder), for a run of `count`. */
export function batchesDone(names: readonly string[], count: number): number[] {
  const done = new Set<number>();
  for (const name of names) {
    const m = /^part-([1-9]\d*)\.json$/.exec(name);
    const k = m ? Number(m[1]) : 0;
    if (k >= 1 && k <= count) done.add(k);
  }
  return [...done].sort((a, b) => a - b);
}

/** The batches 1…count not in `done`, ascending. */
export function batchesMissing(done: readonly number[], count: number): number[] {
  const have = new Set(done);
  return Array.from({ length: count }, (_, i) => i + 1).filter((k) => !have.has(k));
}

/** A failed attempt as recorded in the attempts folder (`batch-k-attempt-a.failed`). */
export interface FailedAttempt {
  readonly batch: number;
  readonly attempt: number;
}

/** The failed attempts among `names` (a listing of the attempts folder), by batch then attempt. */
export function failedAttempts(names: readonly string[]): FailedAttempt[] {
  return names
    .map((name) => /^batch-([1-9]\d*)-attempt-([1-9]\d*)\.failed$/.exec(name))
    .filter((m): m is RegExpExecArray => m !== null)
    .map((m) => ({ batch: Number(m[1]), attempt: Number(m[2]) }))
    .sort((a, b) => a.batch - b.batch || a.attempt - b.attempt);
}

/** "3, 5 and 8" (ascending numbers in words for messages). */
export function listOfBatches(batches: readonly number[]): string {
  if (batches.length <= 1) return batches.join('');
  return `${batches.slice(0, -1).join(', ')} and ${batches.at(-1)}`;
}

/** The progress line of a run: `<slug>: 3/8 parts written (37%)`. */
export function partsProgressLine(slug: string, done: number, count: number): string {
  return `${slug}: ${done}/${count} parts written (${Math.floor((100 * done) / count)}%)`;
}
