import type { ExprNode } from '../expr/node.ts';
import type { TapeBuilder } from './tape.ts';

/** How leaves are mapped while lowering: unknown j → tape id, parameter k → tape id. */
export interface LeafMap {
  unknown(index: number): number;
  parameter(index: number): number;
}

/**
 * Lowers an expression graph onto a tape: n-ary sums and products fold left into binary operations, powers
 * use repeated squaring (⌊log₂ e⌋ squarings plus one product per set bit). Shared nodes are lowered once
 * (memo by node identity); structurally equal nodes meet again through the tape's hash-consing.
 */
export function lowerExpression(tape: TapeBuilder, node: ExprNode, leaves: LeafMap, memo = new Map<ExprNode, number>()): number {
  const cached = memo.get(node);
  if (cached !== undefined) return cached;
  let id: number;
  switch (node.kind) {
    case 'const':
      id = tape.constant(node.re, node.im);
      break;
    case 'unknown':
      id = leaves.unknown(node.index);
      break;
    case 'param':
      id = leaves.parameter(node.index);
      break;
    case 'add': {
      id = tape.constant(0, 0);
      for (const t of node.terms) id = tape.add(id, lowerExpression(tape, t, leaves, memo));
      break;
    }
    case 'mul': {
      id = tape.constant(1, 0);
      for (const f of node.factors) id = tape.mul(id, lowerExpression(tape, f, leaves, memo));
      break;
    }
    case 'neg':
      id = tape.neg(lowerExpression(tape, node.arg, leaves, memo));
      break;
    case 'pow':
      id = power(tape, lowerExpression(tape, node.base, leaves, memo), node.exponent);
      break;
  }
  memo.set(node, id);
  return id;
}

/** base^e on the tape by repeated squaring; e = 0 gives the constant 1. */
export function power(tape: TapeBuilder, base: number, e: number): number {
  let result = tape.constant(1, 0);
  let square = base;
  while (e > 0) {
    if (e & 1) result = tape.mul(result, square);
    e >>>= 1;
    if (e > 0) square = tape.mul(square, square);
  }
  return result;
}
