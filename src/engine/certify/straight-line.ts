import type { ExprNode, PolynomialSystem } from '../expr/node.ts';

/** A signed reference to a slot; null stands for the exact value 0. */
export type SlotRef = { readonly slot: number; readonly neg: boolean } | null;

/** One instruction of the straight-line program; every slot is written once (SSA). */
export type Instruction =
  | { readonly op: 'load'; readonly out: number; readonly index: number }
  | { readonly op: 'sum'; readonly out: number; readonly terms: readonly number[]; readonly negs: readonly boolean[] }
  | { readonly op: 'mul'; readonly out: number; readonly a: number; readonly b: number }
  | { readonly op: 'sqr'; readonly out: number; readonly a: number };

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
  const isPoint: boolean[] = [];
  const varies: boolean[] = []; // slot depends on an unknown
  const constants: { slot: number; re: number; im: number }[] = [];
  const parameters: { slot: number; index: number }[] = [];
  const forward: Instruction[] = [];
  const backward: Instruction[] = [];
  let code = forward;
  const shared = new Map<string, number>();
  let realConstants = true;

  const newSlot = (point: boolean, vary: boolean): number => {
    isPoint.push(point);
    varies.push(vary);
    return isPoint.length - 1;
  };
  const leaf = (key: string, make: (slot: number) => void): number => {
    let slot = shared.get(key);
    if (slot === undefined) {
      slot = newSlot(true, false);
      shared.set(key, slot);
      make(slot);
    }
    return slot;
  };
  const constantSlot = (re: number, im: number): number =>
    leaf(`c${re},${im}`, (slot) => constants.push({ slot, re, im }));
  const one = (neg = false): SlotRef => ({ slot: constantSlot(1, 0), neg });
  const isOne = (r: SlotRef): boolean => r !== null && r.slot === shared.get('c1,0');

  const emit = (key: string, vary: boolean, make: (out: number) => Instruction): number => {
    let slot = shared.get(key);
    if (slot === undefined) {
      slot = newSlot(false, vary);
      shared.set(key, slot);
      code.push(make(slot));
    }
    return slot;
  };

  const sum = (refs: readonly SlotRef[]): SlotRef => {
    const live = refs.filter((r): r is NonNullable<SlotRef> => r !== null);
    if (live.length === 0) return null;
    if (live.length === 1) return live[0]!;
    const terms = live.map((r) => r.slot);
    const negs = live.map((r) => r.neg);
    const key = `s${live.map((r) => (r.neg ? '-' : '+') + r.slot).join('')}`;
    const slot = emit(key, terms.some((t) => varies[t]), (out) => ({ op: 'sum', out, terms, negs }));
    return { slot, neg: false };
  };

  const product = (a: SlotRef, b: SlotRef): SlotRef => {
    if (a === null || b === null) return null;
    const neg = a.neg !== b.neg;
    if (isOne(a)) return { slot: b.slot, neg };
    if (isOne(b)) return { slot: a.slot, neg };
    if (a.slot === b.slot) {
      const slot = emit(`q${a.slot}`, varies[a.slot]!, (out) => ({ op: 'sqr', out, a: a.slot }));
      return { slot, neg }; // (−a)·a = −a², (−a)·(−a) = a²
    }
    const [x, y] = a.slot < b.slot ? [a.slot, b.slot] : [b.slot, a.slot];
    // keep a point operand first so the emitters can scale instead of multiplying rectangles
    const [p, q] = isPoint[y] && !isPoint[x] ? [y, x] : [x, y];
    const slot = emit(`m${x},${y}`, varies[x]! || varies[y]!, (out) => ({ op: 'mul', out, a: p, b: q }));
    return { slot, neg };
  };

  const power = (base: SlotRef, exponent: number): SlotRef => {
    let result: SlotRef = one();
    let square = base;
    for (let e = exponent; e > 0; e >>= 1) {
      if (e & 1) result = product(result, square);
      if (e > 1) square = product(square, square);
    }
    return result;
  };

  const memo = new Map<ExprNode, SlotRef>();
  const lower = (node: ExprNode): SlotRef => {
    const cached = memo.get(node);
    if (cached !== undefined) return cached;
    let ref: SlotRef;
    switch (node.kind) {
      case 'const':
        if (node.im !== 0) realConstants = false;
        if (node.re === 0 && node.im === 0) ref = null;
        else if (node.im === 0 && Math.abs(node.re) === 1) ref = one(node.re < 0);
        else ref = { slot: constantSlot(node.re, node.im), neg: false };
        break;
      case 'param':
        ref = { slot: leaf(`p${node.index}`, (slot) => parameters.push({ slot, index: node.index })), neg: false };
        break;
      case 'unknown':
        if (!(node.index >= 0 && node.index < n)) throw new RangeError(`unknown ${node.name} has index ${node.index}, outside 0…${n - 1}`);
        ref = { slot: emit(`u${node.index}`, true, (out) => ({ op: 'load', out, index: node.index })), neg: false };
        break;
      case 'add':
        ref = sum(node.terms.map(lower));
        break;
      case 'neg': {
        const r = lower(node.arg);
        ref = r === null ? null : { slot: r.slot, neg: !r.neg };
        break;
      }
      case 'mul':
        ref = node.factors.map(lower).reduce<SlotRef>((acc, f) => product(acc, f), one());
        break;
      case 'pow':
        ref = power(lower(node.base), node.exponent);
        break;
    }
    memo.set(node, ref);
    return ref;
  };

  const values = system.equations.map(lower);
  code = backward;
  const jacobian: SlotRef[] = new Array<SlotRef>(n * n).fill(null);
  const flip = (r: SlotRef, neg: boolean): SlotRef => (r === null || !neg ? r : { slot: r.slot, neg: !r.neg });
  values.forEach((root, i) => {
    if (root === null || !varies[root.slot]) return;
    const adjoint = new Map<number, SlotRef[]>([[root.slot, [one(root.neg)]]]);
    const push = (slot: number, r: SlotRef): void => {
      if (r === null || !varies[slot]) return;
      const list = adjoint.get(slot);
      if (list) list.push(r); else adjoint.set(slot, [r]);
    };
    for (let k = forward.length - 1; k >= 0; k--) {
      const ins = forward[k]!;
      const list = adjoint.get(ins.out);
      if (list === undefined) continue;
      const bar = sum(list);
      switch (ins.op) {
        case 'load': jacobian[i * n + ins.index] = bar; break;
        case 'sum': ins.terms.forEach((t, j) => push(t, flip(bar, ins.negs[j]!))); break;
        case 'mul':
          push(ins.a, product(bar, { slot: ins.b, neg: false }));
          push(ins.b, product(bar, { slot: ins.a, neg: false }));
          break;
        case 'sqr': {
          const half = product(bar, { slot: ins.a, neg: false });
          push(ins.a, half);
          push(ins.a, half);
          break;
        }
      }
    }
  });
  return { unknownCount: n, slotCount: isPoint.length, isPoint, constants, parameters, forward, backward, values, jacobian, realConstants };
}
