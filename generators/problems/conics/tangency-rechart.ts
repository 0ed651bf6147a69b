import { dotu } from '../../../src/engine/index.ts';
import { cross3 } from './conic-kernels.ts';
import { chartIndex, contactIndex, pointOf, unknownCount, type TangencyShape } from './tangency-layout.ts';

/** z / w for complex numbers given as pairs. */
function divide(zr: number, zi: number, wr: number, wi: number): [number, number] {
  const d = wr * wr + wi * wi;
  return [(zr * wr + zi * wi) / d, (zi * wr - zr * wi) / d];
}

/**
 * The same geometric solution (the conic and its points of contact) in another chart: u ↦ u / (ℓ′·u), and each point
 * P ↦ P / (m′·P), written as o′ + s′v′ + r′w′ with s′ = ((P′ − o′) × w′)·c / ((v′ × w′)·c), r′ = (v′ × (P′ − o′))·c / ((v′ × w′)·c), c = conj(v′ × w′).
 */
export function convertChart(shape: TangencyShape, x: Float64Array, from: Float64Array, to: Float64Array): Float64Array {
  const out = new Float64Array(2 * unknownCount(shape)), t = new Float64Array(2);
  dotu(t, to, x, 6);
  for (let k = 0; k < 6; k++) [out[2 * k], out[2 * k + 1]] = divide(x[2 * k]!, x[2 * k + 1]!, t[0]!, t[1]!);
  const P = new Float64Array(6), D = new Float64Array(6), vw = new Float64Array(6), num = new Float64Array(6), c = new Float64Array(6);
  for (let i = 0; i < shape.conics; i++) {
    const co = 2 * chartIndex(i), so = 2 * contactIndex(i);
    pointOf(from, i, x, P, 0);
    dotu(t, to, P, 3, co + 18);
    for (let j = 0; j < 3; j++) {
      const [pr, pi] = divide(P[2 * j]!, P[2 * j + 1]!, t[0]!, t[1]!);
      D[2 * j] = pr - to[co + 2 * j]!; D[2 * j + 1] = pi - to[co + 2 * j + 1]!;
    }
    cross3(to, co + 6, to, co + 12, vw, 0);
    for (let j = 0; j < 6; j++) c[j] = j % 2 === 0 ? vw[j]! : -vw[j]!;
    const den = new Float64Array(2);
    dotu(den, vw, c, 3);
    cross3(D, 0, to, co + 12, num, 0);
    dotu(t, num, c, 3);
    [out[so], out[so + 1]] = divide(t[0]!, t[1]!, den[0]!, den[1]!);
    cross3(to, co + 6, D, 0, num, 0);
    dotu(t, num, c, 3);
    [out[so + 2], out[so + 3]] = divide(t[0]!, t[1]!, den[0]!, den[1]!);
  }
  return out;
}
