import { describe, expect, it } from 'vitest';
import { sampleConic } from '../../src/plots/sample-conic.ts';

const W = { xMin: -4, xMax: 4, yMin: -3, yMax: 3 };
const q = ([a, b, c, d, e, f]: readonly number[], x: number, y: number) => a! * x * x + b! * x * y + c! * y * y + d! * x + e! * y + f!;
const scale = (co: readonly number[]) => Math.max(...co.map(Math.abs));

// Classification follows the standard invariants of a plane conic (discriminant b² − 4ac and the 3×3 determinant;
// e.g. Salmon, A Treatise on Conic Sections, 1855). Sampled points must satisfy the equation (relative 1e-9)
// except where a run was cut at the window edge, and lie inside the window.
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
  const sampled = sampleConic(co, W);
  it(`is classified as ${kind}`, () => expect(sampled.kind).toBe(kind));
  it('has real points inside the window', () => {
    expect(sampled.runs.length).toBeGreaterThan(0);
    for (const run of sampled.runs) for (const [x, y] of run) {
      expect(x).toBeGreaterThanOrEqual(W.xMin - 1e-9);
      expect(x).toBeLessThanOrEqual(W.xMax + 1e-9);
      expect(y).toBeGreaterThanOrEqual(W.yMin - 1e-9);
      expect(y).toBeLessThanOrEqual(W.yMax + 1e-9);
    }
  });
  it('samples points on the conic', () => {
    for (const run of sampled.runs) for (const [x, y] of run.slice(1, -1)) {
      expect(Math.abs(q(co, x, y)) / scale(co)).toBeLessThan(1e-9 * (1 + x * x + y * y));
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
    const sampled = sampleConic(co, W);
    expect(sampled.kind).toBe(kind);
    expect(sampled.runs).toEqual([]);
  });
  it('reports an ellipse outside the window with no runs', () => {
    expect(sampleConic([1, 0, 1, -20, 0, 99], W)).toEqual({ kind: 'ellipse', runs: [] });
  });
  it('rejects a coefficient list that is not 6 finite numbers, naming it', () => {
    expect(() => sampleConic([1, 2, 3], W)).toThrow(/6 finite numbers/);
    expect(() => sampleConic([1, 0, 1, 0, 0, Number.NaN], W)).toThrow(/NaN/);
  });
});

describe('hyperbola branches', () => {
  it('draws both branches of x² − y² = 1 reaching the window edge', () => {
    const { runs } = sampleConic([1, 0, -1, 0, 0, -1], W);
    expect(runs.filter((r) => r[0]![0] > 0)).toHaveLength(1);
    expect(runs.filter((r) => r[0]![0] < 0)).toHaveLength(1);
    for (const r of runs) expect(Math.abs(r[0]![1])).toBeCloseTo(3, 9);
  });
});

describe('sampling density', () => {
  it('keeps a huge circle smooth inside a small window (steps under 1/100 of the diagonal)', () => {
    const { runs } = sampleConic([1, 0, 1, 0, 200, -201], W);
    const diag = Math.hypot(8, 6);
    for (const r of runs) for (let i = 1; i < r.length; i++) {
      expect(Math.hypot(r[i]![0] - r[i - 1]![0], r[i]![1] - r[i - 1]![1])).toBeLessThan(diag / 100);
    }
  });
});
