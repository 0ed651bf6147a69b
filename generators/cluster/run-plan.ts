/**
 * Everything a cluster run needs, written to the run folder as plan.json before submission: what to solve, how it
 * is split, what the merge does with the record, and the absolute paths every node must see the same way.
 */
export interface RunPlan {
  /** Registry slug, or the absolute path of a definition file. */
  readonly target: string;
  readonly slug: string;
  readonly shards: number;
  /** The run folder (absolute, shared by the nodes). */
  readonly dir: string;
  /** The project's root and the Node binary the tasks run (same paths on every node). */
  readonly project: string;
  readonly node: string;
  readonly seed?: number;
  /** Worker threads per task; also the CPUs each task asks Slurm for. */
  readonly workers?: number;
  readonly partition?: string;
  /** The content root the merge publishes into (absolute), or null when the merged record is only kept in the run folder. */
  readonly publishTo: string | null;
  readonly force: boolean;
}
