// Writes the naive-run summary the five-conic page shows: node --experimental-strip-types generators/problems/conics/write-naive-summary.ts [workers]
import { writeFileSync, renameSync } from 'node:fs';
import { join } from 'node:path';
import { closeSharedPool } from '../../../src/engine/pool/shared-pool.ts';
import { ENGINE_VERSION } from '../../../src/engine/version.ts';
import { TANGENCY_SETS_DIR as COMMITTED_DIR } from './tangency-store.ts';
import { naiveRun } from './naive-run.ts';
import fiveConics from './conics-tangent-to-5-conics.ts';

/** The committed summary file of the naive 7776-path run on the sextic formulation (generic instance, seed 1). */
export const NAIVE_SUMMARY_FILE = join(COMMITTED_DIR, 'naive-run-conics-tangent-to-5-conics.json');

if (process.argv[1] !== undefined && import.meta.url.endsWith(process.argv[1].split('/').pop()!)) {
  const workers = Number(process.argv[2] ?? 2);
  const summary = await naiveRun(fiveConics, 'generic', 1, workers);
  const sorted = Object.fromEntries(Object.entries({ ...summary, seconds: Number(summary.seconds.toFixed(1)), workers, engineVersion: ENGINE_VERSION }).sort(([a], [b]) => a.localeCompare(b)));
  writeFileSync(`${NAIVE_SUMMARY_FILE}.tmp`, `${JSON.stringify(sorted, null, 2)}\n`);
  renameSync(`${NAIVE_SUMMARY_FILE}.tmp`, NAIVE_SUMMARY_FILE);
  console.log(sorted);
  await closeSharedPool();
}
