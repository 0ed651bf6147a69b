import type { ProgramBuilder } from './program-builder.ts';
import type { Instruction, SlotRef } from './slot-instruction.ts';

/**
 * Reverse-mode differentiation of forward straight-line code, one backward sweep per equation: adjoints are
 * accumulated as lists of signed references and summed where consumed, emitted through the builder (so shared
 * products are reused). Returns the row-major n×n Jacobian refs (null where ∂f_i/∂x_j is identically 0).
 */
export function differentiate(builder: ProgramBuilder, forward: readonly Instruction[], values: readonly SlotRef[], n: number): SlotRef[] {
  const { varies } = builder;
  const jacobian: SlotRef[] = new Array<SlotRef>(n * n).fill(null);
  const flip = (r: SlotRef, neg: boolean): SlotRef => (r === null || !neg ? r : { slot: r.slot, neg: !r.neg });
  values.forEach((root, i) => {
    if (root === null || !varies[root.slot]) return;
    const adjoint = new Map<number, SlotRef[]>([[root.slot, [builder.one(root.neg)]]]);
    const push = (slot: number, r: SlotRef): void => {
      if (r === null || !varies[slot]) return;
      const list = adjoint.get(slot);
      if (list) list.push(r); else adjoint.set(slot, [r]);
    };
    for (let k = forward.length - 1; k >= 0; k--) {
      const ins = forward[k]!;
      const list = adjoint.get(ins.out);
      if (list === undefined) continue;
      const bar = builder.sum(list);
      switch (ins.op) {
        case 'load': jacobian[i * n + ins.index] = bar; break;
        case 'sum': ins.terms.forEach((t, j) => push(t, flip(bar, ins.negs[j]!))); break;
        case 'mul':
          push(ins.a, builder.product(bar, { slot: ins.b, neg: false }));
          push(ins.b, builder.product(bar, { slot: ins.a, neg: false }));
          break;
        case 'sqr': {
          const half = builder.product(bar, { slot: ins.a, neg: false });
          push(ins.a, half);
          push(ins.a, half);
          break;
        }
      }
    }
  });
  return jacobian;
}
