import type { Counts, PathStats } from '../../src/atlas/record.ts';

/**
 * Plain-language notes on one instance's solve, deterministic (no timings): why found falls short of the true
 * count (`found 3261 of 3264: 3 paths failed (step-budget)`), paths at infinity or singular, retries, and
 * solutions left uncertified.
 */
export function pathNotes(counts: Counts, paths: PathStats, kind: 'generic' | 'demo'): string[] {
  const notes: string[] = [];
  const failures = Object.entries(paths.failures).filter(([, n]) => n > 0).sort(([a], [b]) => (a < b ? -1 : 1)).map(([why, n]) => `${n} ${why}`).join(', ');
  const failed = paths.failed > 0 ? `${plural(paths.failed, 'path')} failed (${failures || 'no reason given'})` : '';
  if (counts.trueCount !== null && counts.found < counts.trueCount) {
    notes.push(`found ${counts.found} of ${counts.trueCount}${failed ? `: ${failed}` : kind === 'demo' ? ': this configuration may be special' : ''}`);
  } else if (failed) notes.push(failed);
  if (counts.trueCount !== null && kind === 'generic' && counts.found > counts.trueCount) {
    notes.push(`found ${counts.found}, more than the published count ${counts.trueCount}: some solutions may be duplicates or spurious`);
  }
  if (paths.atInfinity > 0) notes.push(`${plural(paths.atInfinity, 'path')} went to infinity`);
  if (paths.excess > 0) notes.push(`${plural(paths.excess, 'path')} ended on a positive-dimensional solution set (the naive count's excess)`);
  if (paths.singular > 0) notes.push(`${plural(paths.singular, 'path')} ended at isolated singular points (not counted as found)`);
  const r = paths.retracks;
  if (r && r.jumpPaths > 0) notes.push(`${plural(r.jumpPaths, 'path')} re-tracked after a path jump (${r.recoveredJumps} recovered${r.unresolvedJumps > 0 ? `, ${r.unresolvedJumps} still shared` : ''})`);
  if (r && r.extendedPaths > 0) notes.push(`${plural(r.extendedPaths, 'path')} re-tracked in double-double precision (${r.extendedDecided} decided)`);
  if (paths.retries > 0) notes.push(`${plural(paths.retries, 're-track')} in all (stricter steps or double-double precision)`);
  if (counts.certified < counts.found) notes.push(`${counts.found - counts.certified} of ${counts.found} solutions not certified`);
  return notes;
}

function plural(n: number, word: string): string {
  return `${n} ${word}${n === 1 ? '' : 's'}`;
}
