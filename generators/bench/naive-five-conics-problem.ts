import { defineProblem } from '../../src/atlas/definition.ts';
import fiveConics from '../problems/conics/conics-tangent-to-5-conics.ts';

/**
 * The naive total-degree run on the five-conic problem's sextic formulation as a problem definition of its own
 * (generic instance only, 6⁵ = 7776 paths), so that `solve … --shard` and `solve … --slurm` can split it: the
 * catalog's largest path count. For measurement only; never registered, never published (solve without --write).
 */
export default defineProblem({
  ...fiveConics,
  instances: fiveConics.instances.filter((instance) => instance.kind === 'generic'),
  solver: { kind: 'total-degree' },
});
