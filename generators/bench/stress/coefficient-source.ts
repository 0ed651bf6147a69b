import { createRandom, exprBuilders, type ExprNode } from '../../../src/engine/index.ts';

const { param } = exprBuilders;

/** Hands out coefficient parameters one by one and records their values. */
export interface CoefficientSource {
  /** A fresh parameter node c<k> (index firstIndex + k); its value is the next Gaussian complex draw of the stream. */
  coefficient(): ExprNode;
  /** The parameter names handed out so far, in order. */
  names(): string[];
  /** Their values, packed complex (re, im interleaved), in the same order. */
  values(): Float64Array;
}

/**
 * Coefficients as parameters c0, c1, … (parameter indices firstIndex, firstIndex + 1, …) whose values are drawn in
 * order from createRandom(seed) (each a complex number with independent standard normal parts): the same seed gives
 * the same coefficients on every machine.
 */
export function coefficientSource(seed: number, firstIndex = 0): CoefficientSource {
  const random = createRandom(seed);
  const values: number[] = [];
  const draw = new Float64Array(2);
  return {
    coefficient() {
      random.gaussianComplex(draw, 0);
      const k = values.length / 2;
      values.push(draw[0]!, draw[1]!);
      return param(`c${k}`, firstIndex + k);
    },
    names: () => Array.from({ length: values.length / 2 }, (_, k) => `c${k}`),
    values: () => Float64Array.from(values),
  };
}
