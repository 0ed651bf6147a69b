import type { TapeBuilder } from './tape.ts';

/**
 * Reverse-mode differentiation on the tape (Griewank–Walther, Evaluating Derivatives, 2008, ch. 3), done
 * symbolically: the adjoints become new tape instructions, so the derivative code shares subexpressions with
 * the values through hash-consing. Returns, for the output `root`, the ids of ∂root/∂x_j (j < n) and
 * ∂root/∂p_k (k < np); the id of the constant 0 where the output does not depend on the variable.
 */
export function gradient(tape: TapeBuilder, root: number, n: number, np: number): { dx: number[]; dp: number[] } {
  const zero = tape.constant(0, 0);
  const adjoint = new Map<number, number>([[root, tape.constant(1, 0)]]);
  const accumulate = (id: number, value: number, negate: boolean): void => {
    const old = adjoint.get(id);
    if (old === undefined) adjoint.set(id, negate ? tape.neg(value) : value);
    else adjoint.set(id, negate ? tape.sub(old, value) : tape.add(old, value));
  };
  const dx: number[] = new Array<number>(n).fill(zero);
  const dp: number[] = new Array<number>(np).fill(zero);
  const ins = tape.instructions;
  for (let id = root; id >= 0; id--) {
    const bar = adjoint.get(id);
    if (bar === undefined) continue;
    const { op, a, b } = ins[id]!;
    switch (op) {
      case 'const':
        break;
      case 'x':
        dx[a] = bar;
        break;
      case 'p':
        dp[a] = bar;
        break;
      case 'add':
        accumulate(a, bar, false);
        accumulate(b, bar, false);
        break;
      case 'sub':
        accumulate(a, bar, false);
        accumulate(b, bar, true);
        break;
      case 'mul':
        accumulate(a, tape.mul(bar, b), false);
        accumulate(b, tape.mul(bar, a), false);
        break;
      case 'neg':
        accumulate(a, bar, true);
        break;
    }
  }
  return { dx, dp };
}
