import type { InstanceResult, SolveRecord } from '../../src/atlas/record.ts';
import { roundSignificant } from '../../src/atlas/digits.ts';

/** The instance a one-object summary describes: the first demo instance, else the first instance. */
export function summaryInstanceIndex(record: SolveRecord): number {
  const demo = record.instances.findIndex((i) => i.kind === 'demo');
  return demo >= 0 ? demo : 0;
}

/**
 * The `solve --json` object, for the first demo instance (else the first instance): counts as numbers, trueCount
 * null when unknown, path outcomes, and the seconds that instance took to solve and certify (3 significant digits).
 */
export function jsonSummary(record: SolveRecord, seconds: readonly number[]) {
  const k = summaryInstanceIndex(record);
  const { counts: c, paths: p } = record.instances[k]!;
  return {
    slug: record.slug,
    bezoutBound: c.bezoutBound,
    trueCount: c.trueCount,
    found: c.found,
    certified: c.certified,
    real: c.real,
    certifiedReal: c.certifiedReal,
    paths: { tracked: p.tracked, nonsingular: p.nonsingular, singular: p.singular, atInfinity: p.atInfinity, excess: p.excess, failed: p.failed },
    seconds: roundSignificant(seconds[k] ?? 0, 3),
  };
}

/**
 * One line per instance that found fewer solutions than the published count (`<slug>: instance "generic": found
 * 3261 of 3264 (3 missing)`); empty when every instance reached it or no count is published.
 */
export function shortfallLines(record: SolveRecord): string[] {
  return record.instances
    .filter((i) => i.counts.trueCount !== null && i.counts.found < i.counts.trueCount)
    .map((i) => `${record.slug}: instance "${i.id}": found ${i.counts.found} of ${i.counts.trueCount} (${i.counts.trueCount! - i.counts.found} missing)`);
}

/** Human-readable lines: the problem, then per instance its count ladder, paths, seconds and notes. */
export function textSummary(record: SolveRecord, seconds: readonly number[]): string {
  const lines = [`${record.slug} — ${record.title} (engine ${record.engineVersion})`];
  record.instances.forEach((instance, k) => {
    lines.push(`  ${instanceLine(instance)} · ${roundSignificant(seconds[k] ?? 0, 3)} s`);
    for (const note of instance.notes) lines.push(`    note: ${note}`);
  });
  return `${lines.join('\n')}\n`;
}

function instanceLine(i: InstanceResult): string {
  const c = i.counts, p = i.paths;
  return [
    `${i.id} (${i.kind}, seed ${i.seed}): Bézout ${c.bezoutBound}${c.multihomogeneousBound !== null ? ` (multihomogeneous ${c.multihomogeneousBound})` : ''}`,
    `true ${c.trueCount ?? 'unknown'}`,
    `found ${c.found}`,
    `certified ${c.certified} (${c.certifiedDistinct} distinct)`,
    `real ${c.real} (${c.certifiedReal} certified)`,
    `paths ${p.tracked}: ${p.nonsingular} nonsingular, ${p.singular} singular, ${p.excess} excess, ${p.atInfinity} at infinity, ${p.failed} failed`,
    c.complete ? 'complete' : '',
  ].filter(Boolean).join(' · ');
}
