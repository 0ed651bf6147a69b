import { join } from 'node:path';

/** The files of one cluster run inside its folder (shared by every node). */
export interface RunLayout {
  readonly dir: string;
  /** The run's inputs as JSON: target, shard count, seed, options, project and Node paths. */
  readonly plan: string;
  readonly batchScript: string;
  readonly mergeScript: string;
  /** Where batch k writes `part-k.json` (atomically: a dot-file renamed into place). */
  readonly parts: string;
  /** One file `batch-k-attempt-a.failed` (holding the exit code) per failed attempt. */
  readonly attempts: string;
  readonly logs: string;
  /** The merged record (canonical JSON), written by the merge job. */
  readonly record: string;
  /** Written last by the merge job: its exit code. */
  readonly mergeExit: string;
  readonly mergeOut: string;
  readonly mergeErr: string;
}

/** The layout of the run folder `dir`. */
export function runLayout(dir: string): RunLayout {
  const logs = join(dir, 'logs');
  return {
    dir,
    plan: join(dir, 'plan.json'),
    batchScript: join(dir, 'batch.sh'),
    mergeScript: join(dir, 'merge.sh'),
    parts: join(dir, 'parts'),
    attempts: join(dir, 'attempts'),
    logs,
    record: join(dir, 'record.json'),
    mergeExit: join(dir, 'merge-exit'),
    mergeOut: join(logs, 'merge.out'),
    mergeErr: join(logs, 'merge.err'),
  };
}

/** The part file name of batch k (1-based), as the merge job's glob `part-*.json` finds it. */
export function partFileName(batch: number): string {
  return `part-${batch}.json`;
}

/** A run folder name: the slug and the UTC time to the second (`<slug>-20261205T073619Z`), sortable by start. */
export function runFolderName(slug: string, when: Date): string {
  return `${slug}-${when.toISOString().replace(/[-:]/g, '').replace(/\.\d+Z$/, 'Z')}`;
}
