import { pathRound } from 'd3-path';
import type { ScaleLinear } from 'd3-scale';
import type { Point } from './clip.ts';
import { conicPieces } from './conic-pieces.ts';
import { fitCubics, insideIntervals, type ParametricCurve } from './cubic-fit.ts';
import type { WorldWindow } from './world-window.ts';

/**
 * The SVG path (screen px, 2 decimals) of a conic's real points inside `window`: each smooth branch as cubic Bézier
 * segments within `tolerance` px of the true curve (an ellipse wholly inside as one closed run), degenerate lines as
 * straight segments. Empty string when nothing real lies in the window.
 */
export function conicPath(coefficients: readonly number[], window: WorldWindow, x: ScaleLinear<number, number>, y: ScaleLinear<number, number>, tolerance: number): string {
  const pieces = conicPieces(coefficients, window);
  const kx = x(1) - x(0), ky = y(1) - y(0);
  const rect = { xMin: x(window.xMin), xMax: x(window.xMax), yMin: Math.min(y(window.yMin), y(window.yMax)), yMax: Math.max(y(window.yMin), y(window.yMax)) };
  const path = pathRound(2);
  for (const [p, q] of pieces.segments) {
    path.moveTo(x(p[0]), y(p[1]));
    path.lineTo(x(q[0]), y(q[1]));
  }
  for (const branch of pieces.branches) {
    const screen: ParametricCurve = {
      at: (t) => { const p = branch.at(t); return [x(p[0]), y(p[1])] as Point; },
      velocity: (t) => { const v = branch.velocity(t); return [kx * v[0], ky * v[1]] as Point; },
    };
    for (const [a, b] of insideIntervals(screen.at, branch.t0, branch.t1, rect, branch.closed)) {
      const whole = branch.closed && a === branch.t0 && b === branch.t1;
      const cubics = fitCubics(screen, a, b, tolerance);
      path.moveTo(cubics[0]![0][0], cubics[0]![0][1]);
      for (const [, c1, c2, end] of cubics) path.bezierCurveTo(c1[0], c1[1], c2[0], c2[1], end[0], end[1]);
      if (whole) path.closePath();
    }
  }
  return path.toString();
}
