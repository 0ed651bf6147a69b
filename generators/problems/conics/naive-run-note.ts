import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { TANGENCY_SETS_DIR as COMMITTED_DIR } from './tangency-store.ts';

/**
 * One sentence for the five-conic page on the committed naive run (write-naive-summary.ts): where the 7776 paths of
 * the total-degree homotopy on the sextic formulation ended. Empty when the summary has not been written.
 */
export function naiveRunSentence(slug: string): string {
  const file = join(COMMITTED_DIR, `naive-run-${slug}.json`);
  if (!existsSync(file)) return '';
  const s = JSON.parse(readFileSync(file, 'utf8')) as { paths: number; genuine: number; genuinePaths: number; excessPaths: number; doubleLinePaths: number; atInfinityPaths: number; singularPaths: number; failedPaths: number; extendedPaths: number; seed: number; engineVersion?: string };
  const elsewhere = s.atInfinityPaths + s.singularPaths;
  return ` In a naive total-degree run on this formulation (generic instance, homotopy seed ${s.seed}${s.engineVersion ? `, engine ${s.engineVersion}` : ''}), ${s.genuinePaths} of the ${s.paths} paths ended at ${s.genuine} distinct genuine conics and ${s.excessPaths} on the excess set (${s.doubleLinePaths} of them checked to be double lines)${elsewhere > 0 ? `, ${elsewhere} elsewhere (${s.atInfinityPaths} at infinity of the chart)` : ''}; ${s.failedPaths} failed. Near the double lines the sextic form is so ill-conditioned that double precision cannot decide where ${s.extendedPaths} of the paths end: the engine re-tracks their ends in double-double arithmetic. The atlas tracks the tangency-point formulation instead, which is far better conditioned.`;
}
