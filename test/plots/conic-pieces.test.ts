import { describe, expect, it } from 'vitest';
import { conicPieces } from '../../src/plots/conic-pieces.ts';

const W = { xMin: -4, xMax: 4, yMin: -3, yMax: 3 };
const q = ([a, b, c, d, e, f]: readonly number[], x: number, y: number) => a! * x * x + b! * x * y + c! * y * y + d! * x + e! * y + f!;
const scale = (co: readonly number[]) => Math.max(...co.map(Math.abs));
const gradient = ([a, b, c, d, e]: readonly number[], x: number, y: number) => [2 * a! * x + b! * y + d!, b! * x + 2 * c! * y + e!] as const;

// Classification follows the standard invariants of a plane conic (discriminant b² − 4ac and the 3×3 determinant;
// e.g. Salmon, A Treatise on Conic Sections, 1855). Every branch point must satisfy the equation (relative 1e-9) and
// its velocity must be tangent to the curve (orthogonal to the gradient); segments must lie on the conic and inside.
describe.each([
  ['ellipse', 'ellipse', [1 / 4, 0, 1, 0, 0, -1]],
  ['rotated ellipse off centre', 'ellipse', [2, 1.2, 1, -1, 0.5, -2]],
  ['huge circle crossing the window (centre (0, −100), radius 101)', 'ellipse', [1, 0, 1, 0, 200, -201]],
  ['hyperbola', 'hyperbola', [1, 0, -1, 0, 0, -1]],
  ['hyperbola opening up and down', 'hyperbola', [-1, 0, 1, 0, 0, -1]],
  ['rectangular hyperbola xy = 1', 'hyperbola', [0, 1, 0, 0, 0, -1]],
  ['parabola y = x²', 'parabola', [1, 0, 0, 0, -1, 0]],
  ['rotated parabola', 'parabola', [1, -2, 1, 1, 1, 0]],
  ['line pair x² = y²', 'line-pair', [1, 0, -1, 0, 0, 0]],
  ['parallel lines x² = 1', 'parallel-lines', [1, 0, 0, 0, 0, -1]],
  ['double line x² = 0', 'line', [1, 0, 0, 0, 0, 0]],
  ['line 2x + y − 1 = 0 written as a conic', 'line', [0, 0, 0, 2, 1, -1]],
] as const)('%s', (_, kind, co) => {
  const pieces = conicPieces(co, W);
  it(`is classified as ${kind}`, () => expect(pieces.kind).toBe(kind));
  it('has real pieces', () => expect(pieces.branches.length + pieces.segments.length).toBeGreaterThan(0));
  it('parametrises points on the conic with tangent velocities', () => {
    for (const b of pieces.branches) for (let k = 0; k <= 64; k++) {
      const t = b.t0 + ((b.t1 - b.t0) * k) / 64;
      const [x, y] = b.at(t), [vx, vy] = b.velocity(t), [gx, gy] = gradient(co, x, y);
      expect(Math.abs(q(co, x, y)) / scale(co)).toBeLessThan(1e-9 * (1 + x * x + y * y));
      expect(Math.abs(gx * vx + gy * vy)).toBeLessThan(1e-9 * (1 + Math.hypot(gx, gy) * Math.hypot(vx, vy)));
    }
  });
  it('clips straight pieces to the window, on the conic', () => {
    for (const seg of pieces.segments) for (const [x, y] of seg) {
      expect(x).toBeGreaterThanOrEqual(W.xMin - 1e-9);
      expect(x).toBeLessThanOrEqual(W.xMax + 1e-9);
      expect(y).toBeGreaterThanOrEqual(W.yMin - 1e-9);
      expect(y).toBeLessThanOrEqual(W.yMax + 1e-9);
      expect(Math.abs(q(co, x, y)) / scale(co)).toBeLessThan(1e-9);
    }
  });
});

describe('degenerate and empty conics', () => {
  it.each([
    ['x² + y² + 1 = 0 has no real points', 'empty', [1, 0, 1, 0, 0, 1]],
    ['x² + y² = 0 is a single point', 'point', [1, 0, 1, 0, 0, 0]],
    ['x² + 1 = 0 has no real points', 'empty', [1, 0, 0, 0, 0, 1]],
    ['the zero polynomial is empty', 'empty', [0, 0, 0, 0, 0, 0]],
  ] as const)('%s', (_, kind, co) => {
    const pieces = conicPieces(co, W);
    expect(pieces).toEqual({ kind, branches: [], segments: [] });
  });
  it('rejects a coefficient list that is not 6 finite numbers, naming it', () => {
    expect(() => conicPieces([1, 2, 3], W)).toThrow(/6 finite numbers/);
    expect(() => conicPieces([1, 0, 1, 0, 0, Number.NaN], W)).toThrow(/NaN/);
  });
});

describe('parameter ranges', () => {
  it('runs an ellipse once around, closed', () => {
    const [b] = conicPieces([1 / 4, 0, 1, 0, 0, -1], W).branches;
    expect([b!.t0, b!.t1, b!.closed]).toEqual([0, 2 * Math.PI, true]);
  });
  it('runs both hyperbola branches beyond every window corner', () => {
    const { branches } = conicPieces([1, 0, -1, 0, 0, -1], W);
    expect(branches).toHaveLength(2);
    const far = Math.hypot(4, 3);
    for (const b of branches) for (const t of [b.t0, b.t1]) expect(Math.hypot(...b.at(t))).toBeGreaterThan(far);
    expect(branches.map((b) => Math.sign(b.at(0)[0]))).toEqual([1, -1]);
  });
  it('runs a parabola over the window extent along its axis', () => {
    const [b] = conicPieces([1, 0, 0, 0, -1, 0], W).branches;
    expect(b!.at(b!.t0)[0]).toBeCloseTo(-4, 12);
    expect(b!.at(b!.t1)[0]).toBeCloseTo(4, 12);
  });
});
