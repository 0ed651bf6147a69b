import { isExactComplexProduct, isExactSum } from './exact-fold.ts';

/**
 * A straight-line program over complex numbers in static single assignment form: every instruction is a
 * constant, an unknown x_j, a parameter p_k, or a binary/unary operation on earlier instructions, so ids are
 * already in evaluation order. Identical instructions are hash-consed (one id), constants are folded with
 * the usual complex arithmetic, and the identities 0 + a = a, 0·a = 0, 1·a = a, −1·a = −a, −(−a) = a hold.
 * This is the common-subexpression elimination of the compiler: equal subtrees get equal ids. With
 * `exactFolding`, constants are folded only where the result is exact (Dekker's error terms are zero), so an
 * interval evaluation of the tape encloses the true value (certification); otherwise the operation stays.
 */
export type TapeOp = 'const' | 'x' | 'p' | 'add' | 'sub' | 'mul' | 'neg';

/** One instruction: `a`, `b` are operand ids (for 'x' and 'p', `a` is the variable index); `re`, `im` for constants. */
export interface TapeInstruction {
  readonly op: TapeOp;
  readonly a: number;
  readonly b: number;
  readonly re: number;
  readonly im: number;
}

/** Builds a tape; every method returns the id of the (possibly shared) instruction. */
export interface TapeBuilder {
  readonly instructions: readonly TapeInstruction[];
  constant(re: number, im: number): number;
  unknown(index: number): number;
  parameter(index: number): number;
  add(a: number, b: number): number;
  sub(a: number, b: number): number;
  mul(a: number, b: number): number;
  neg(a: number): number;
}

/** Options of a tape: `exactFolding` keeps constant operations whose folded result would be rounded. */
export interface TapeOptions {
  readonly exactFolding?: boolean;
}

/** Creates an empty tape builder (constant folding in floating point unless `exactFolding`). */
export function createTape(options: TapeOptions = {}): TapeBuilder {
  const exact = options.exactFolding === true;
  const instructions: TapeInstruction[] = [];
  const index = new Map<string, number>();
  const push = (key: string, ins: TapeInstruction): number => {
    const found = index.get(key);
    if (found !== undefined) return found;
    const id = instructions.length;
    instructions.push(ins);
    index.set(key, id);
    return id;
  };
  const at = (id: number): TapeInstruction => instructions[id]!;
  const isConst = (id: number, re: number, im: number): boolean => {
    const ins = at(id);
    return ins.op === 'const' && ins.re === re && ins.im === im;
  };
  const constant = (re: number, im: number): number => {
    const r = re === 0 ? 0 : re, i = im === 0 ? 0 : im;
    return push(`c${r},${i}`, { op: 'const', a: -1, b: -1, re: r, im: i });
  };
  const neg = (a: number): number => {
    const ia = at(a);
    if (ia.op === 'const') return constant(-ia.re, -ia.im);
    if (ia.op === 'neg') return ia.a;
    return push(`n${a}`, { op: 'neg', a, b: -1, re: 0, im: 0 });
  };
  const add = (a: number, b: number): number => {
    const ia = at(a), ib = at(b);
    if (ia.op === 'const' && ib.op === 'const' && (!exact || (isExactSum(ia.re, ib.re) && isExactSum(ia.im, ib.im)))) {
      return constant(ia.re + ib.re, ia.im + ib.im);
    }
    if (isConst(a, 0, 0)) return b;
    if (isConst(b, 0, 0)) return a;
    if (ib.op === 'neg') return sub(a, ib.a);
    if (ia.op === 'neg') return sub(b, ia.a);
    const [lo, hi] = a <= b ? [a, b] : [b, a];
    return push(`+${lo},${hi}`, { op: 'add', a: lo, b: hi, re: 0, im: 0 });
  };
  const sub = (a: number, b: number): number => {
    const ia = at(a), ib = at(b);
    if (ia.op === 'const' && ib.op === 'const' && (!exact || (isExactSum(ia.re, -ib.re) && isExactSum(ia.im, -ib.im)))) {
      return constant(ia.re - ib.re, ia.im - ib.im);
    }
    if (a === b) return constant(0, 0);
    if (isConst(b, 0, 0)) return a;
    if (isConst(a, 0, 0)) return neg(b);
    if (ib.op === 'neg') return add(a, ib.a);
    return push(`-${a},${b}`, { op: 'sub', a, b, re: 0, im: 0 });
  };
  const mul = (a: number, b: number): number => {
    const ia = at(a), ib = at(b);
    if (ia.op === 'const' && ib.op === 'const' && (!exact || isExactComplexProduct(ia.re, ia.im, ib.re, ib.im))) {
      return constant(ia.re * ib.re - ia.im * ib.im, ia.re * ib.im + ia.im * ib.re);
    }
    if (isConst(a, 0, 0) || isConst(b, 0, 0)) return constant(0, 0);
    if (isConst(a, 1, 0)) return b;
    if (isConst(b, 1, 0)) return a;
    if (isConst(a, -1, 0)) return neg(b);
    if (isConst(b, -1, 0)) return neg(a);
    if (ia.op === 'neg' && ib.op === 'neg') return mul(ia.a, ib.a);
    if (ia.op === 'neg') return neg(mul(ia.a, b));
    if (ib.op === 'neg') return neg(mul(a, ib.a));
    const [lo, hi] = a <= b ? [a, b] : [b, a];
    return push(`*${lo},${hi}`, { op: 'mul', a: lo, b: hi, re: 0, im: 0 });
  };
  return {
    instructions,
    constant,
    unknown: (i) => push(`x${i}`, { op: 'x', a: i, b: -1, re: 0, im: 0 }),
    parameter: (i) => push(`p${i}`, { op: 'p', a: i, b: -1, re: 0, im: 0 }),
    add,
    sub,
    mul,
    neg,
  };
}
