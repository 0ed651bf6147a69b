import type { SolveRecord } from '../../src/atlas/record.ts';

/**
 * Why a new record would be worse than the published one, or [] when it is no worse. Per instance (matched by id):
 * fewer found, fewer certified or fewer certified-distinct solutions is worse, and so is a published instance that
 * is missing. Real counts may move either way (a changed configuration), so they are not guarded.
 */
export function regressionReasons(published: SolveRecord, next: SolveRecord): string[] {
  const reasons: string[] = [];
  for (const before of published.instances) {
    const after = next.instances.find((i) => i.id === before.id);
    if (!after) {
      reasons.push(`instance "${before.id}" would be removed`);
      continue;
    }
    for (const key of ['found', 'certified', 'certifiedDistinct'] as const) {
      if (after.counts[key] < before.counts[key]) reasons.push(`instance "${before.id}": ${key} ${after.counts[key]} < published ${before.counts[key]}`);
    }
  }
  return reasons;
}

/**
 * Why a record is not worth publishing on its own, or []: an instance that found no solution although the published
 * count is positive (a degenerate configuration, such as concentric circles, or a failed solve).
 */
export function emptyReasons(next: SolveRecord): string[] {
  return next.instances
    .filter((i) => i.counts.found === 0 && (i.counts.trueCount ?? 0) > 0)
    .map((i) => `instance "${i.id}": found no solution where the published count is ${i.counts.trueCount} (${i.paths.singular} singular, ${i.paths.atInfinity} at infinity, ${i.paths.failed} failed paths; is the configuration degenerate?)`);
}
