import { scaleLinear, type ScaleLinear } from 'd3-scale';

/** A world rectangle (xMin < xMax, yMin < yMax). */
export interface WorldWindow { readonly xMin: number; readonly xMax: number; readonly yMin: number; readonly yMax: number }

/** Screen scales for a window at `width` px, aspect preserved (height = width · Δy/Δx), y pointing up. Throws on an empty window. */
export function windowScales(window: WorldWindow, width: number): { x: ScaleLinear<number, number>; y: ScaleLinear<number, number>; width: number; height: number } {
  const dx = window.xMax - window.xMin, dy = window.yMax - window.yMin;
  if (!(dx > 0) || !(dy > 0) || !Number.isFinite(dx) || !Number.isFinite(dy)) {
    throw new Error(`figure window [${window.xMin}, ${window.xMax}] × [${window.yMin}, ${window.yMax}] is empty or not finite`);
  }
  const height = Math.round((width * dy) / dx);
  return {
    x: scaleLinear().domain([window.xMin, window.xMax]).range([0, width]),
    y: scaleLinear().domain([window.yMin, window.yMax]).range([height, 0]),
    width,
    height,
  };
}

/** The window grown by `fraction` of its width and height on every side (fraction 0.5: twice as wide and tall). */
export function expandWindow(window: WorldWindow, fraction: number): WorldWindow {
  const dx = (window.xMax - window.xMin) * fraction, dy = (window.yMax - window.yMin) * fraction;
  return { xMin: window.xMin - dx, xMax: window.xMax + dx, yMin: window.yMin - dy, yMax: window.yMax + dy };
}
