import { resolve } from 'node:path';
import { AtlasError } from '../pipeline/atlas-error.ts';
import { integerOption } from '../command/parse-options.ts';

/** The options `solve` and `regenerate` accept for a run on a Slurm cluster (node:util parseArgs specs). */
export const CLUSTER_OPTIONS = {
  slurm: { type: 'boolean' },
  shards: { type: 'string' },
  partition: { type: 'string' },
  workdir: { type: 'string' },
  detach: { type: 'boolean' },
} as const;

/** How many array tasks a cluster run uses when --shards is not given. */
export const DEFAULT_SHARDS = 8;

/** The folder (under the working directory) that holds cluster runs when --workdir is not given. */
export const DEFAULT_WORKDIR = '.cluster-runs';

/** A validated request to spread one problem over a job array. */
export interface ClusterRequest {
  /** Array tasks, one batch of paths each (1 ≤ shards ≤ 10000). */
  readonly shards: number;
  readonly partition?: string;
  /** Absolute path of the folder shared by the nodes; each run gets its own subfolder. */
  readonly workdir: string;
  /** Return right after submitting, printing the job ids, instead of waiting for the merge. */
  readonly detach: boolean;
}

type ClusterValues = { slurm?: boolean; shards?: string; partition?: string; workdir?: string; detach?: boolean };

/**
 * The cluster request in parsed option values, or undefined without --slurm. --shards, --partition, --workdir and
 * --detach without --slurm, or an out-of-range --shards, are AtlasError('input') naming the option.
 */
export function clusterRequest(values: ClusterValues, cwd = process.cwd()): ClusterRequest | undefined {
  if (!values.slurm) {
    const stray = (['shards', 'partition', 'workdir', 'detach'] as const).find((k) => values[k] !== undefined);
    if (stray) throw new AtlasError('input', `--${stray} goes with --slurm`);
    return undefined;
  }
  const shards = integerOption(values.shards, 'shards', 1) ?? DEFAULT_SHARDS;
  if (shards > 10_000) throw new AtlasError('input', `--shards: at most 10000 array tasks, got ${shards}`);
  const partition = values.partition?.trim();
  if (values.partition !== undefined && !/^[A-Za-z0-9_.-]+$/.test(partition ?? '')) throw new AtlasError('input', `--partition: a partition name (letters, digits, _ . -), got ${JSON.stringify(values.partition)}`);
  const workdir = resolve(cwd, values.workdir?.trim() || DEFAULT_WORKDIR);
  return { shards, ...(partition ? { partition } : {}), workdir, detach: Boolean(values.detach) };
}
