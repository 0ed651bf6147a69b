import { scaleLog } from 'd3-scale';

/** One problem for the home chart: its naive Bézout bound and its true count (null when unknown). */
export interface BoundsRow { readonly slug: string; readonly title: string; readonly href: string; readonly bezout: number; readonly trueCount: number | null }

/**
 * The laid-out chart: one row per problem (input order) with positions on a shared log scale as fractions of the
 * track (0 = 1 solution, 1 = the axis end), and decade ticks. Pages place the track at any width, so text never scales.
 */
export interface BoundsChart {
  readonly rows: (BoundsRow & { readonly xBezout: number; readonly xTrue: number | null })[];
  readonly ticks: { readonly x: number; readonly value: number; readonly label: string }[];
}

const SUPERSCRIPT = '⁰¹²³⁴⁵⁶⁷⁸⁹';

/** "10ⁿ" with superscript digits for n ≥ 1; 1 and 10 stay plain. */
export function decadeLabel(value: number): string {
  const n = Math.round(Math.log10(value));
  if (n <= 1) return String(10 ** n);
  return `10${[...String(n)].map((d) => SUPERSCRIPT[Number(d)]).join('')}`;
}

/**
 * Dumbbell chart of Bézout bound against true count on a log₁₀ axis from 1 to the next decade above the largest
 * bound; a count of 0 sits at the axis start. Positions are fractions of the track rounded to 1e-4. Rows in input
 * order (callers sort). Throws on a bound below 1, naming the problem.
 */
export function boundsChart(rows: readonly BoundsRow[]): BoundsChart {
  for (const r of rows) if (!(r.bezout >= 1)) throw new Error(`home chart: "${r.slug}" has Bézout bound ${r.bezout} (must be ≥ 1)`);
  const max = Math.max(10, ...rows.map((r) => Math.max(r.bezout, r.trueCount ?? 1)));
  const top = 10 ** Math.ceil(Math.log10(max) + 1e-12);
  const x = scaleLog().domain([1, top]).range([0, 1]);
  const at = (v: number) => Math.round(x(Math.max(1, v)) * 1e4) / 1e4;
  const decades = Math.round(Math.log10(top));
  return {
    rows: rows.map((r) => ({ ...r, xBezout: at(r.bezout), xTrue: r.trueCount === null ? null : at(r.trueCount) })),
    ticks: Array.from({ length: decades + 1 }, (_, k) => ({ x: at(10 ** k), value: 10 ** k, label: decadeLabel(10 ** k) })),
  };
}
