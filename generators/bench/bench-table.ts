/** One case's measurements. */
export interface BenchRow {
  readonly name: string;
  readonly cores: number;
  readonly runs: number;
  readonly seconds: readonly number[];
  readonly paths: number;
  readonly found: number;
  readonly expected: number;
  readonly failedPaths: number;
  readonly steps?: readonly number[];
}

/** The median of the values (any order; NaN when empty). */
export const sortedMedian = (values: readonly number[]): number => {
  const s = [...values].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length === 0 ? NaN : s.length % 2 === 1 ? s[m]! : (s[m - 1]! + s[m]!) / 2;
};

/** A fixed-width text table: median seconds, paths per second, steps per path (median, max), found/expected, failures. */
export function formatTable(rows: readonly BenchRow[]): string {
  const header = ['case', 'median s', 'paths', 'paths/s', 'steps med', 'steps max', 'found/expected', 'failed'];
  const body = rows.map((r) => {
    const t = sortedMedian(r.seconds);
    const steps = r.steps ?? [];
    return [
      r.name,
      t.toFixed(3),
      String(r.paths),
      (r.paths / t).toFixed(0),
      steps.length ? String(sortedMedian(steps)) : '–',
      steps.length ? String(Math.max(...steps)) : '–',
      `${r.found}/${r.expected}`,
      String(r.failedPaths),
    ];
  });
  const widths = header.map((h, i) => Math.max(h.length, ...body.map((b) => b[i]!.length)));
  const line = (cells: string[]): string => cells.map((c, i) => (i === 0 ? c.padEnd(widths[i]!) : c.padStart(widths[i]!))).join('  ');
  const cores = rows[0]?.cores ?? 0;
  return [`cores: ${cores}, runs per case: ${rows[0]?.runs ?? 0}`, line(header), line(widths.map((w) => '-'.repeat(w))), ...body.map(line)].join('\n');
}
