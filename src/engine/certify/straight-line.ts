import type { ExprNode, PolynomialSystem } from '../expr/node.ts';
import { createProgramBuilder } from './program-builder.ts';
import { differentiate } from './reverse-mode.ts';
import type { Instruction, SlotRef } from './slot-instruction.ts';

export type { Instruction, SlotRef } from './slot-instruction.ts';

/**
 * A system lowered to straight-line code: forward instructions give the equation values, backward ones
 * (reverse-mode differentiation, one sweep per equation) give the Jacobian in the unknowns. Leaves that are
 * exact doubles (constants, parameters) sit in "point" slots filled before a run. Common subexpressions are
 * shared (structural hashing), products by ±1 and sums with 0 are folded, signs ride on references.
 */
export interface StraightLineProgram {
  readonly unknownCount: number;
  readonly slotCount: number;
  readonly isPoint: readonly boolean[];
  readonly constants: readonly { slot: number; re: number; im: number }[];
  readonly parameters: readonly { slot: number; index: number }[];
  readonly forward: readonly Instruction[];
  readonly backward: readonly Instruction[];
  readonly values: readonly SlotRef[];
  /** Row-major n×n: jacobian[i·n + j] = ∂f_i/∂x_j. */
  readonly jacobian: readonly SlotRef[];
  /** True when every constant is real (then real parameters give a system with real coefficients). */
  readonly realConstants: boolean;
}

/** Lowers a square polynomial system to a straight-line program; throws (naming the sizes) when it is not square. */
export function lowerSystem(system: PolynomialSystem): StraightLineProgram {
  const n = system.unknowns.length;
  if (system.equations.length !== n) {
    throw new RangeError(`certification needs a square system: ${system.equations.length} equations in ${n} unknowns`);
  }
  const forward: Instruction[] = [];
  const backward: Instruction[] = [];
  const builder = createProgramBuilder(forward);
  let realConstants = true;
  const memo = new Map<ExprNode, SlotRef>();
  const lower = (node: ExprNode): SlotRef => {
    const cached = memo.get(node);
    if (cached !== undefined) return cached;
    let ref: SlotRef;
    switch (node.kind) {
      case 'const':
        if (node.im !== 0) realConstants = false;
        ref = builder.constant(node.re, node.im);
        break;
      case 'param': ref = builder.parameter(node.index); break;
      case 'unknown':
        if (!(node.index >= 0 && node.index < n)) throw new RangeError(`unknown ${node.name} has index ${node.index}, outside 0…${n - 1}`);
        ref = builder.load(node.index);
        break;
      case 'add': ref = builder.sum(node.terms.map(lower)); break;
      case 'neg': {
        const r = lower(node.arg);
        ref = r === null ? null : { slot: r.slot, neg: !r.neg };
        break;
      }
      case 'mul': ref = node.factors.map(lower).reduce<SlotRef>((acc, f) => builder.product(acc, f), builder.one()); break;
      case 'pow': ref = builder.power(lower(node.base), node.exponent); break;
    }
    memo.set(node, ref);
    return ref;
  };
  const values = system.equations.map(lower);
  builder.code = backward;
  const jacobian = differentiate(builder, forward, values, n);
  const { isPoint, constants, parameters } = builder;
  return { unknownCount: n, slotCount: isPoint.length, isPoint, constants, parameters, forward, backward, values, jacobian, realConstants };
}
