import type { Instruction, SlotRef } from './slot-instruction.ts';

/**
 * Builds straight-line code with structural hashing: every sum, product and square is emitted once per distinct
 * operand list; products by ±1 and sums with 0 fold away; signs ride on references. Leaves that are exact doubles
 * (constants, parameters) live in "point" slots; `varies` marks slots that depend on an unknown. Instructions go
 * to `code`, which the caller may switch (forward, then backward).
 */
export interface ProgramBuilder {
  readonly isPoint: boolean[];
  readonly varies: boolean[];
  readonly constants: { slot: number; re: number; im: number }[];
  readonly parameters: { slot: number; index: number }[];
  code: Instruction[];
  constant(re: number, im: number): SlotRef;
  parameter(index: number): SlotRef;
  load(index: number): SlotRef;
  one(neg?: boolean): SlotRef;
  sum(refs: readonly SlotRef[]): SlotRef;
  product(a: SlotRef, b: SlotRef): SlotRef;
  power(base: SlotRef, exponent: number): SlotRef;
}

/** A fresh builder writing to the given instruction list. */
export function createProgramBuilder(code: Instruction[]): ProgramBuilder {
  const isPoint: boolean[] = [], varies: boolean[] = [];
  const constants: { slot: number; re: number; im: number }[] = [];
  const parameters: { slot: number; index: number }[] = [];
  const shared = new Map<string, number>();
  const newSlot = (point: boolean, vary: boolean): number => {
    isPoint.push(point);
    varies.push(vary);
    return isPoint.length - 1;
  };
  const leaf = (key: string, make: (slot: number) => void): number => {
    let slot = shared.get(key);
    if (slot === undefined) { slot = newSlot(true, false); shared.set(key, slot); make(slot); }
    return slot;
  };
  const emit = (key: string, vary: boolean, make: (out: number) => Instruction): number => {
    let slot = shared.get(key);
    if (slot === undefined) { slot = newSlot(false, vary); shared.set(key, slot); builder.code.push(make(slot)); }
    return slot;
  };
  const constantSlot = (re: number, im: number): number => leaf(`c${re},${im}`, (slot) => constants.push({ slot, re, im }));
  const isOne = (r: SlotRef): boolean => r !== null && r.slot === shared.get('c1,0');

  const builder: ProgramBuilder = {
    isPoint, varies, constants, parameters, code,
    constant: (re, im) => {
      if (re === 0 && im === 0) return null;
      if (im === 0 && Math.abs(re) === 1) return { slot: constantSlot(1, 0), neg: re < 0 };
      return { slot: constantSlot(re, im), neg: false };
    },
    parameter: (index) => ({ slot: leaf(`p${index}`, (slot) => parameters.push({ slot, index })), neg: false }),
    load: (index) => ({ slot: emit(`u${index}`, true, (out) => ({ op: 'load', out, index })), neg: false }),
    one: (neg = false) => ({ slot: constantSlot(1, 0), neg }),
    sum(refs) {
      const live = refs.filter((r): r is NonNullable<SlotRef> => r !== null);
      if (live.length === 0) return null;
      if (live.length === 1) return live[0]!;
      const terms = live.map((r) => r.slot);
      const negs = live.map((r) => r.neg);
      const key = `s${live.map((r) => (r.neg ? '-' : '+') + r.slot).join('')}`;
      return { slot: emit(key, terms.some((t) => varies[t]), (out) => ({ op: 'sum', out, terms, negs })), neg: false };
    },
    product(a, b) {
      if (a === null || b === null) return null;
      const neg = a.neg !== b.neg; // (−a)·a = −a², (−a)·(−a) = a²
      if (isOne(a)) return { slot: b.slot, neg };
      if (isOne(b)) return { slot: a.slot, neg };
      if (a.slot === b.slot) return { slot: emit(`q${a.slot}`, varies[a.slot]!, (out) => ({ op: 'sqr', out, a: a.slot })), neg };
      const [x, y] = a.slot < b.slot ? [a.slot, b.slot] : [b.slot, a.slot];
      // keep a point operand first so the emitters can scale instead of multiplying rectangles
      const [p, q] = isPoint[y] && !isPoint[x] ? [y, x] : [x, y];
      return { slot: emit(`m${x},${y}`, varies[x]! || varies[y]!, (out) => ({ op: 'mul', out, a: p, b: q })), neg };
    },
    power(base, exponent) {
      let result = builder.one();
      let square = base;
      for (let e = exponent; e > 0; e >>= 1) {
        if (e & 1) result = builder.product(result, square);
        if (e > 1) square = builder.product(square, square);
      }
      return result;
    },
  };
  return builder;
}
