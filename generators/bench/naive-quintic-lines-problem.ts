import { defineProblem } from '../../src/atlas/definition.ts';
import quinticLines from '../problems/surfaces/lines-on-a-quintic-threefold.ts';

/**
 * The naive total-degree run on the quintic-lines chart formulation as a problem definition of its own (generic
 * instance only, 5⁶ = 15625 paths), so that `solve … --shard` and `solve … --slurm` can split it. For measurement
 * only; never registered, never published (solve without --write).
 */
export default defineProblem({
  ...quinticLines,
  instances: quinticLines.instances.filter((instance) => instance.kind === 'generic'),
  solver: { kind: 'total-degree' },
});
