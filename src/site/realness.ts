import type { InstanceResult, SolveRecord } from '../atlas/record.ts';
import { instancesInPageOrder } from './ladder.ts';

/** Search-filter value for realness of the page's first instance (demo first): all found real, some, or none. */
export type Realness = 'all real found' | 'some real' | 'none real';

/** Realness of one instance: 'all real found' needs at least one solution found and every found one real. */
export function realnessOf(instance: InstanceResult): Realness {
  const { found, real } = instance.counts;
  if (found > 0 && real === found) return 'all real found';
  return real > 0 ? 'some real' : 'none real';
}

/** Realness of a record as shown and filtered: that of its first instance in page order. */
export function recordRealness(record: SolveRecord): Realness {
  const first = instancesInPageOrder(record)[0];
  if (!first) throw new Error(`record "${record.slug}" has no instance`);
  return realnessOf(first);
}
