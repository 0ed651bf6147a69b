import type { InstanceResult, SolveRecord } from '../atlas/record.ts';
import { sourceShort } from './source-text.ts';

/** One rung of the count ladder: a labelled count, a short note, and its bar length in [0, 1] (log scale). */
export interface LadderStep {
  readonly key: 'bezout' | 'multihomogeneous' | 'true' | 'found' | 'certified' | 'real' | 'certifiedReal';
  readonly label: string;
  readonly value: number | null;
  readonly note: string;
  readonly fraction: number;
}

/** The Bézout bound of a formulation: the product of its equations' degrees (exact integer; throws past 2^53). */
export function bezoutFromDegrees(degrees: readonly number[]): number {
  if (degrees.length === 0) throw new Error('bezoutFromDegrees: a formulation needs at least one equation');
  const product = degrees.reduce((p, d) => p * d, 1);
  if (!Number.isSafeInteger(product)) throw new Error(`bezoutFromDegrees: product of [${degrees.join(', ')}] is not a safe integer`);
  return product;
}

/** Bar length of `value` against `max` on log(1 + v): 0 → 0, max → 1; null or max ≤ 0 → 0. */
export function ladderFraction(value: number | null, max: number): number {
  if (value === null || max <= 0 || value <= 0) return 0;
  return Math.min(1, Math.log1p(value) / Math.log1p(max));
}

/**
 * The count ladder of one instance: Bézout bound (from the formulation's degrees, checked against the record),
 * multihomogeneous bound when present, true count with its source, found, certified distinct, real, certified real.
 */
export function countLadder(record: SolveRecord, instance: InstanceResult): LadderStep[] {
  const bezout = bezoutFromDegrees(record.formulation.equationDegrees);
  const c = instance.counts;
  if (c.bezoutBound !== bezout) {
    throw new Error(
      `count ladder of "${record.slug}" (instance "${instance.id}"): counts.bezoutBound is ${c.bezoutBound}, ` +
        `but the formulation's degrees [${record.formulation.equationDegrees.join(', ')}] give ${bezout}`,
    );
  }
  const degrees = record.formulation.equationDegrees.join(' · ');
  const rows: Omit<LadderStep, 'fraction'>[] = [
    { key: 'bezout', label: 'Bézout bound', value: bezout, note: `product of the degrees ${degrees}` },
  ];
  if (c.multihomogeneousBound !== null) {
    rows.push({ key: 'multihomogeneous', label: 'Multihomogeneous bound', value: c.multihomogeneousBound, note: 'from the variable groups' });
  }
  rows.push(
    { key: 'true', label: 'True count', value: record.trueCount, note: sourceShort(record.source) },
    { key: 'found', label: 'Found', value: c.found, note: `${instance.paths.tracked} paths tracked` },
    { key: 'certified', label: 'Certified', value: c.certifiedDistinct, note: 'proven distinct solutions' },
    { key: 'real', label: 'Real', value: c.real, note: instance.kind === 'demo' ? 'real solutions for real data' : 'real among the found' },
    { key: 'certifiedReal', label: 'Certified real', value: c.certifiedReal, note: 'proven real' },
  );
  return rows.map((r) => ({ ...r, fraction: ladderFraction(r.value, bezout) }));
}

/** Instances in page order: demo configurations first (record order kept), then the generic instance(s). */
export function instancesInPageOrder(record: SolveRecord): InstanceResult[] {
  return [...record.instances.filter((i) => i.kind === 'demo'), ...record.instances.filter((i) => i.kind !== 'demo')];
}
