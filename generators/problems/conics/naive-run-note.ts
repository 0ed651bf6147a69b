import { NAIVE_FIVE_CONICS_RUN, type NaiveRunFigures } from './naive-run-figures.ts';

/**
 * One sentence for a conic page on the measured naive run (naive-run-figures.ts): where the paths of the
 * total-degree homotopy on the sextic formulation ended. Empty for a page without measured figures.
 */
export function naiveRunSentence(slug: string, runs: readonly NaiveRunFigures[] = [NAIVE_FIVE_CONICS_RUN]): string {
  const s = runs.find((r) => r.slug === slug);
  if (s === undefined) return '';
  const elsewhere = s.atInfinityPaths + s.singularPaths;
  return ` In a naive total-degree run on this formulation (generic instance, homotopy seed ${s.seed}, engine ${s.engineVersion}), ${s.genuinePaths} of the ${s.paths} paths ended at ${s.genuine} distinct genuine conics and ${s.excessPaths} on the excess set (${s.doubleLinePaths} of them checked to be double lines)${elsewhere > 0 ? `, ${elsewhere} elsewhere (${s.atInfinityPaths} at infinity of the chart)` : ''}; ${s.failedPaths} failed. Near the double lines the sextic form is so ill-conditioned that double precision cannot decide where ${s.extendedPaths} of the paths end: the engine re-tracks their ends in double-double arithmetic. The atlas tracks the tangency-point formulation instead, which is far better conditioned.`;
}
