// Shared by the build and the browser: the figure's grid and tick labels for any view of its world window.
import type { ScaleLinear } from 'd3-scale';
import { formatNumber } from '../site/format.ts';

/** A tick: its screen position (px, 2 decimals) and its world value. */
export interface Tick { readonly at: number; readonly value: number }

/** Ticks never sit closer than this many px to the frame, so their labels are not cut. */
export const TICK_INSET = 12;

const round2 = (v: number) => Math.round(v * 100) / 100;

/** About six ticks per axis for the scales' current domains, at least TICK_INSET px inside a width × height frame. */
export function axisTicks(x: ScaleLinear<number, number>, y: ScaleLinear<number, number>, width: number, height: number): { xTicks: Tick[]; yTicks: Tick[] } {
  const on = (s: ScaleLinear<number, number>, size: number) =>
    s.ticks(6).map((v) => ({ at: round2(s(v)), value: v })).filter((t) => t.at > TICK_INSET && t.at < size - TICK_INSET);
  return { xTicks: on(x, width), yTicks: on(y, height) };
}

/** The grid lines (inside the clipped plot; the zero lines classed "axis") and the tick labels, as SVG text. */
export function gridSvg(width: number, height: number, xTicks: readonly Tick[], yTicks: readonly Tick[]): { grid: string; ticks: string } {
  const axis = (v: number) => (v === 0 ? ' class="axis"' : '');
  const grid = [
    ...xTicks.map((t) => `<line x1="${t.at}" x2="${t.at}" y1="0" y2="${height}"${axis(t.value)}/>`),
    ...yTicks.map((t) => `<line y1="${t.at}" y2="${t.at}" x1="0" x2="${width}"${axis(t.value)}/>`),
  ].join('');
  const ticks = [
    ...xTicks.map((t) => `<text x="${t.at}" y="${height - 5}" text-anchor="middle">${formatNumber(t.value, 4)}</text>`),
    ...yTicks.map((t) => `<text x="5" y="${t.at + 4}">${formatNumber(t.value, 4)}</text>`),
  ].join('');
  return { grid, ticks };
}
