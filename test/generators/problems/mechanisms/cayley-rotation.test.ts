import { describe, expect, it } from 'vitest';
import { cayleyRotation, transposeTimes } from '../../../../generators/problems/mechanisms/cayley-rotation.ts';
import { rotate } from '../../../../generators/problems/mechanisms/study-pose.ts';
import type { Vector3 } from '../../../../generators/problems/mechanisms/vector3.ts';

// Cayley's parametrisation: s = tan(θ/2)·axis turns by θ about the axis, and Euler–Rodrigues parameters (1, e) with
// e = tan(θ/2)·axis give the same rotation (common practice, no source).
describe('rotations of the mechanism pages', () => {
  const turns: [string, Vector3, Vector3, Vector3][] = [
    ['a quarter turn about z takes x to y', [0, 0, 1], [1, 0, 0], [0, 1, 0]],
    ['a quarter turn about x takes y to z', [1, 0, 0], [0, 1, 0], [0, 0, 1]],
    ['a third of a turn about (1, 1, 1) cycles the axes', [Math.tan(Math.PI / 3) / Math.sqrt(3), Math.tan(Math.PI / 3) / Math.sqrt(3), Math.tan(Math.PI / 3) / Math.sqrt(3)], [1, 0, 0], [0, 1, 0]],
  ];

  it.each(turns)('Cayley: %s', (_, s, from, to) => {
    const R = cayleyRotation(s);
    const image = R.map((row) => row[0] * from[0] + row[1] * from[1] + row[2] * from[2]);
    image.forEach((v, k) => expect(v).toBeCloseTo(to[k]!, 12));
    transposeTimes(R, to).forEach((v, k) => expect(v).toBeCloseTo(from[k]!, 12));
  });

  it.each(turns)('Euler–Rodrigues: %s', (_, e, from, to) => {
    rotate(e, from).forEach((v, k) => expect(v).toBeCloseTo(to[k]!, 12));
  });
});
