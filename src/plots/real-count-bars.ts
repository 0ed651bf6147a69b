import { scaleBand, scaleLinear } from 'd3';

/** One bar of the real-count histogram: its count of real solutions, how many samples had it, and its box in px. */
export interface CountBar {
  readonly real: number;
  readonly samples: number;
  readonly x: number;
  readonly y: number;
  readonly width: number;
  readonly height: number;
}

/**
 * Lays out the histogram of real counts as bars in a width × height box (d3 band and linear scales, computed at build
 * time): one band for every count from 0 to `degree` (empty bands keep the axis honest about counts never seen), the
 * tallest bar filling the plot height. Pure; deterministic.
 */
export function realCountBars(distribution: readonly { real: number; samples: number }[], degree: number, width: number, height: number): { bars: CountBar[]; band: number; x: (real: number) => number } {
  const counts = Array.from({ length: degree + 1 }, (_, k) => k);
  const x = scaleBand<number>().domain(counts).range([0, width]).paddingInner(0.15);
  const top = Math.max(1, ...distribution.map((d) => d.samples));
  const y = scaleLinear().domain([0, top]).range([height, 0]);
  const bars = distribution.map((d) => ({ real: d.real, samples: d.samples, x: x(d.real)!, y: y(d.samples), width: x.bandwidth(), height: height - y(d.samples) }));
  return { bars, band: x.bandwidth(), x: (real) => x(real)! + x.bandwidth() / 2 };
}
