import type { TapeInstruction } from '../compile/tape.ts';
import type { Instruction, SlotRef } from './slot-instruction.ts';

/** The slot form of a tape's live part: what certification evaluates in interval and exact arithmetic. */
export interface SlotCode {
  readonly slotCount: number;
  readonly isPoint: readonly boolean[];
  readonly constants: readonly { slot: number; re: number; im: number }[];
  readonly parameters: readonly { slot: number; index: number }[];
  readonly forward: readonly Instruction[];
  readonly backward: readonly Instruction[];
  readonly values: readonly SlotRef[];
  readonly jacobian: readonly SlotRef[];
  readonly realConstants: boolean;
}

/**
 * Translates the tape instructions reachable from `valueRoots` and `jacobianRoots` into slot code: constants and
 * parameters become point slots (exact doubles set before a run), signs ride on references (a tape 'neg' emits
 * nothing), 0 is the null reference, products by ±1 fold, a·a becomes 'sqr', and a point operand comes first in a
 * product so interval code scales instead of multiplying rectangles. Instructions the values need are `forward`,
 * the rest `backward`; every value root must precede every other live instruction on the tape (values lowered
 * first), else it throws. No arithmetic is done: the slot code computes exactly what the tape computes.
 */
export function slotsOfTape(tape: readonly TapeInstruction[], valueRoots: readonly number[], jacobianRoots: readonly number[]): SlotCode {
  const live = reach(tape, [...valueRoots, ...jacobianRoots]);
  const forwardNeed = reach(tape, valueRoots);
  const isPoint: boolean[] = [];
  const constants: { slot: number; re: number; im: number }[] = [];
  const parameters: { slot: number; index: number }[] = [];
  const forward: Instruction[] = [], backward: Instruction[] = [];
  const inForward: boolean[] = [];
  const shared = new Map<string, number>();
  const refs: SlotRef[] = new Array<SlotRef>(tape.length).fill(null);
  let realConstants = true;

  const slotFor = (key: string, point: boolean, make: ((out: number) => Instruction) | null, toForward: boolean): number => {
    const found = shared.get(key);
    if (found !== undefined) return found;
    const slot = isPoint.length;
    isPoint.push(point);
    inForward.push(toForward);
    shared.set(key, slot);
    if (make) (toForward ? forward : backward).push(make(slot));
    return slot;
  };
  const constantSlot = (re: number, im: number): number => slotFor(`c${re},${im}`, true, null, true);
  const one = (): number => {
    if (!shared.has('c1,0')) constants.push({ slot: constantSlot(1, 0), re: 1, im: 0 });
    return shared.get('c1,0')!;
  };

  for (let id = 0; id < tape.length; id++) {
    if (!live[id]) continue;
    const ins = tape[id]!;
    const toForward = forwardNeed[id]!;
    const check = (r: SlotRef): SlotRef => {
      if (toForward && r !== null && !inForward[r.slot]) throw new Error(`slot code: value instruction ${id} reads slot ${r.slot} of the derivative part`);
      return r;
    };
    switch (ins.op) {
      case 'const': {
        if (ins.re === 0 && ins.im === 0) { refs[id] = null; break; }
        if (ins.im !== 0) realConstants = false;
        if (ins.im === 0 && Math.abs(ins.re) === 1) { refs[id] = { slot: one(), neg: ins.re < 0 }; break; }
        const key = `c${ins.re},${ins.im}`;
        if (!shared.has(key)) constants.push({ slot: constantSlot(ins.re, ins.im), re: ins.re, im: ins.im });
        refs[id] = { slot: shared.get(key)!, neg: false };
        break;
      }
      case 'p': {
        const key = `p${ins.a}`;
        if (!shared.has(key)) parameters.push({ slot: slotFor(key, true, null, true), index: ins.a });
        refs[id] = { slot: shared.get(key)!, neg: false };
        break;
      }
      case 'x':
        refs[id] = { slot: slotFor(`u${ins.a}`, false, (out) => ({ op: 'load', out, index: ins.a }), toForward), neg: false };
        break;
      case 'neg': {
        const r = check(refs[ins.a]!);
        refs[id] = r === null ? null : { slot: r.slot, neg: !r.neg };
        break;
      }
      case 'add': case 'sub': {
        const ra = check(refs[ins.a]!);
        let rb = check(refs[ins.b]!);
        if (ins.op === 'sub' && rb !== null) rb = { slot: rb.slot, neg: !rb.neg };
        if (ra === null || rb === null) { refs[id] = ra ?? rb; break; }
        const terms = [ra.slot, rb.slot], negs = [ra.neg, rb.neg];
        const key = `s${ra.neg ? '-' : '+'}${ra.slot}${rb.neg ? '-' : '+'}${rb.slot}`;
        refs[id] = { slot: slotFor(key, false, (out) => ({ op: 'sum', out, terms, negs }), toForward), neg: false };
        break;
      }
      case 'mul': {
        const ra = check(refs[ins.a]!), rb = check(refs[ins.b]!);
        if (ra === null || rb === null) { refs[id] = null; break; }
        const neg = ra.neg !== rb.neg;
        const unit = shared.get('c1,0');
        if (ra.slot === unit) { refs[id] = { slot: rb.slot, neg }; break; }
        if (rb.slot === unit) { refs[id] = { slot: ra.slot, neg }; break; }
        if (ra.slot === rb.slot) {
          refs[id] = { slot: slotFor(`q${ra.slot}`, false, (out) => ({ op: 'sqr', out, a: ra.slot }), toForward), neg };
          break;
        }
        const [x, y] = ra.slot < rb.slot ? [ra.slot, rb.slot] : [rb.slot, ra.slot];
        const [p, q] = isPoint[y] && !isPoint[x] ? [y, x] : [x, y];
        refs[id] = { slot: slotFor(`m${x},${y}`, false, (out) => ({ op: 'mul', out, a: p, b: q }), toForward), neg };
        break;
      }
    }
  }
  return {
    slotCount: isPoint.length, isPoint, constants, parameters, forward, backward,
    values: valueRoots.map((r) => refs[r]!), jacobian: jacobianRoots.map((r) => refs[r]!), realConstants,
  };
}

/** Marks every tape instruction the roots depend on (the roots included). */
function reach(tape: readonly TapeInstruction[], roots: readonly number[]): boolean[] {
  const seen: boolean[] = new Array<boolean>(tape.length).fill(false);
  const stack = [...roots];
  while (stack.length > 0) {
    const id = stack.pop()!;
    if (seen[id]) continue;
    seen[id] = true;
    const { op, a, b } = tape[id]!;
    if (op === 'add' || op === 'sub' || op === 'mul') stack.push(a, b);
    else if (op === 'neg') stack.push(a);
  }
  return seen;
}
