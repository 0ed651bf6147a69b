import { describe, expect, it } from 'vitest';
import { imageLine } from '../../../../generators/problems/shared/complex-chart.ts';

describe('a complex chart of plane lines', () => {
  it('maps Y = mX + k through the identity to the line mx − y + k = 0', () => {
    const line = imageLine([[1, 0], [0, 0], [0, 0], [1, 0]], [2, 0], [3, 0]);
    expect(Array.from(line)).toEqual([2, 0, -1, 0, 3, 0]);
  });

  it('maps through a complex matrix to the line that contains the images of its points', () => {
    const A = [[1, 0], [0.35, 0.55], [-0.25, 0.45], [1, 0]] as const;
    const [m, k] = [[0.7, -0.2], [1.1, 0.4]] as const;
    const [u, v, w] = [0, 2, 4].map((i) => imageLine(A, m, k).slice(i, i + 2));
    for (const X of [-1, 0.5, 2]) {
      // Y = mX + k, (x, y) = A·(X, Y), all complex; check u·x + v·y + w = 0.
      const Y = [m[0] * X + k[0], m[1] * X + k[1]];
      const mul = (p: ArrayLike<number>, q: ArrayLike<number>) => [p[0]! * q[0]! - p[1]! * q[1]!, p[0]! * q[1]! + p[1]! * q[0]!];
      const x = [A[0][0] * X + mul(A[1], Y)[0]!, A[0][1] * X + mul(A[1], Y)[1]!];
      const y = [A[2][0] * X + mul(A[3], Y)[0]!, A[2][1] * X + mul(A[3], Y)[1]!];
      const r = [mul(u!, x)[0]! + mul(v!, y)[0]! + w![0]!, mul(u!, x)[1]! + mul(v!, y)[1]! + w![1]!];
      expect(Math.hypot(r[0]!, r[1]!)).toBeLessThan(1e-12);
    }
  });
});
