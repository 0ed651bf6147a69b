import { scaleLog } from 'd3-scale';

/** One problem for the home chart: its naive Bézout bound and its true count (null when unknown). */
export interface BoundsRow { readonly slug: string; readonly title: string; readonly href: string; readonly bezout: number; readonly trueCount: number | null }

/** The laid-out chart: one row per problem (input order) with x positions on a shared log scale, and decade ticks. */
export interface BoundsChart {
  readonly width: number;
  readonly height: number;
  readonly plotLeft: number;
  readonly plotRight: number;
  readonly rows: (BoundsRow & { readonly y: number; readonly xBezout: number; readonly xTrue: number | null })[];
  readonly ticks: { readonly x: number; readonly value: number; readonly label: string }[];
}

const ROW = 34, TOP = 30, BOTTOM = 14;
const SUPERSCRIPT = '⁰¹²³⁴⁵⁶⁷⁸⁹';

/** "10ⁿ" with superscript digits for n ≥ 1; 1 and 10 stay plain. */
export function decadeLabel(value: number): string {
  const n = Math.round(Math.log10(value));
  if (n <= 1) return String(10 ** n);
  return `10${[...String(n)].map((d) => SUPERSCRIPT[Number(d)]).join('')}`;
}

/**
 * Dumbbell chart of Bézout bound against true count on a log₁₀ axis from 1 to the next decade above the largest
 * bound; a count of 0 sits at the axis start. Rows in input order (callers sort). Throws on a bound below 1.
 */
export function boundsChart(rows: readonly BoundsRow[], width = 720, labelWidth = 0): BoundsChart {
  for (const r of rows) if (!(r.bezout >= 1)) throw new Error(`home chart: "${r.slug}" has Bézout bound ${r.bezout} (must be ≥ 1)`);
  const max = Math.max(10, ...rows.map((r) => Math.max(r.bezout, r.trueCount ?? 1)));
  const top = 10 ** Math.ceil(Math.log10(max) + 1e-12);
  const plotLeft = labelWidth + 12, plotRight = width - 24;
  const x = scaleLog().domain([1, top]).range([plotLeft, plotRight]);
  const at = (v: number) => Math.round(x(Math.max(1, v)) * 100) / 100;
  const decades = Math.round(Math.log10(top));
  return {
    width,
    height: TOP + rows.length * ROW + BOTTOM,
    plotLeft,
    plotRight,
    rows: rows.map((r, i) => ({ ...r, y: TOP + i * ROW + ROW / 2, xBezout: at(r.bezout), xTrue: r.trueCount === null ? null : at(r.trueCount) })),
    ticks: Array.from({ length: decades + 1 }, (_, k) => ({ x: at(10 ** k), value: 10 ** k, label: decadeLabel(10 ** k) })),
  };
}
