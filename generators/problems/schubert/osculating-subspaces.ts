import type { ComplexInput } from '../../../src/atlas/definition.ts';
import { conditionCount, subspaceParameters, type SchubertShape } from './schubert-chart.ts';

/**
 * Parameters placing given subspace j at the osculating (n − k)-space of the moment curve
 * γ(t) = (1, t, t², …, t^{n−1}) at t = stations[j − 1]: the point γ(t) and the directions γ^{(m)}(t)/m!, m = 1 … n − k − 1,
 * in the affine chart x₀ = 1 (exact polynomial values in binary64). Needs one station per condition.
 */
export function osculatingParameters(shape: SchubertShape, stations: readonly number[]): Record<string, ComplexInput> {
  if (stations.length !== conditionCount(shape)) throw new RangeError(`osculatingParameters: need ${conditionCount(shape)} stations, got ${stations.length}`);
  const binomial = (a: number, b: number): number => (b < 0 || b > a ? 0 : b === 0 ? 1 : (binomial(a - 1, b - 1) * a) / b);
  // The m-th derivative of t^i divided by m! is C(i, m) t^{i−m}; coordinate i = 1 … n − 1 of the affine chart.
  const derivative = (t: number, m: number, i: number): number => binomial(i, m) * t ** (i - m);
  const out: Record<string, ComplexInput> = {};
  stations.forEach((t, index) => {
    const { point, directions } = subspaceParameters(shape, index + 1);
    point.forEach((name, a) => (out[name] = derivative(t, 0, a + 1)));
    directions.forEach((names, m) => names.forEach((name, a) => (out[name] = derivative(t, m + 1, a + 1))));
  });
  return out;
}
