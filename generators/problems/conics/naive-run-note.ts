import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { COMMITTED_DIR } from './start-set.ts';

/**
 * One sentence for the five-conic page on the committed naive run (write-naive-summary.ts): where the 7776 paths of
 * the total-degree homotopy on the sextic formulation ended. Empty when the summary has not been written.
 */
export function naiveRunSentence(slug: string): string {
  const file = join(COMMITTED_DIR, `naive-run-${slug}.json`);
  if (!existsSync(file)) return '';
  const s = JSON.parse(readFileSync(file, 'utf8')) as { paths: number; genuine: number; genuinePaths: number; doubleLinePaths: number; otherPaths: number; failedPaths: number; seed: number; engineVersion?: string };
  return ` In a naive total-degree run on this formulation (generic instance, homotopy seed ${s.seed}${s.engineVersion ? `, engine ${s.engineVersion}` : ''}), ${s.genuinePaths} of the ${s.paths} paths ended at ${s.genuine} distinct genuine conics, ${s.doubleLinePaths} on double lines and ${s.otherPaths} elsewhere (${s.failedPaths} of all the paths failed): near the double lines the sextic form is so ill-conditioned that double precision loses a few genuine conics, which is why the atlas tracks the tangency-point formulation instead.`;
}
