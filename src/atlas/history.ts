import type { Counts, SolveRecord } from './record.ts';

const LADDER: readonly (keyof Counts)[] = ['found', 'certified', 'certifiedDistinct', 'real', 'certifiedReal'];

/**
 * What changed from a published record to its replacement, in words for the history: engine version, definition,
 * and per instance the counts that moved (`generic: found 3261 → 3264, certified 3200 → 3264`), or a note that only
 * numbers or the figure changed. Instances are matched by id.
 */
export function describeChange(previous: SolveRecord, next: SolveRecord): string {
  const parts: string[] = [];
  if (previous.engineVersion !== next.engineVersion) parts.push(`engine ${previous.engineVersion} → ${next.engineVersion}`);
  if (previous.definitionHash !== next.definitionHash) parts.push('definition changed');
  for (const instance of next.instances) {
    const before = previous.instances.find((i) => i.id === instance.id);
    if (!before) {
      parts.push(`instance ${instance.id} added`);
      continue;
    }
    const moved = LADDER.filter((k) => before.counts[k] !== instance.counts[k]).map((k) => `${k} ${before.counts[k]} → ${instance.counts[k]}`);
    if (moved.length > 0) parts.push(`${instance.id}: ${moved.join(', ')}`);
  }
  for (const gone of previous.instances.filter((i) => !next.instances.some((n) => n.id === i.id))) parts.push(`instance ${gone.id} removed`);
  return parts.length > 0 ? parts.join('; ') : 're-solved with the same counts (solution digits, notes or figure changed)';
}

/** The history entry's words for a record's first publication: per instance, found of the true count, certified and real. */
export function describeFirst(record: SolveRecord): string {
  const parts = record.instances.map((i) => {
    const of = i.counts.trueCount === null ? '' : ` of ${i.counts.trueCount}`;
    return `${i.id}: found ${i.counts.found}${of}, certified ${i.counts.certified}, real ${i.counts.real}`;
  });
  return `first published; ${parts.join('; ')}`;
}

/** Today's date in UTC as YYYY-MM-DD, or the override (for tests: env ATLAS_TODAY), which must have that form. */
export function utcDate(now: Date = new Date(), override: string | undefined = process.env.ATLAS_TODAY): string {
  if (override !== undefined && override !== '') {
    if (!/^\d{4}-\d{2}-\d{2}$/.test(override)) throw new RangeError(`ATLAS_TODAY must be YYYY-MM-DD, got ${JSON.stringify(override)}`);
    return override;
  }
  return now.toISOString().slice(0, 10);
}
