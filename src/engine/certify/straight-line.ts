import type { PolynomialSystem } from '../expr/node.ts';
import { createTape } from '../compile/tape.ts';
import { lowerExpression } from '../compile/lower.ts';
import { gradient } from '../compile/differentiate.ts';
import { slotsOfTape, type SlotCode } from './slots-of-tape.ts';

export type { Instruction, SlotRef } from './slot-instruction.ts';

/**
 * A system lowered to straight-line code for certification: the engine's one program form (the tape of
 * compile/tape.ts, with its symbolic reverse-mode Jacobian from compile/differentiate.ts) in slot form. Forward
 * instructions give the equation values, backward ones the Jacobian in the unknowns; leaves that are exact doubles
 * (constants, parameters) sit in point slots filled before a run. Constants are folded only where the result is
 * exact, so interval and exact evaluations of this code enclose the true values.
 */
export interface StraightLineProgram extends SlotCode {
  readonly unknownCount: number;
}

/** Lowers a square polynomial system to a straight-line program; throws (naming the sizes or the equation) when it is not square or an index is out of range. */
export function lowerSystem(system: PolynomialSystem): StraightLineProgram {
  const n = system.unknowns.length, np = system.parameters.length;
  if (system.equations.length !== n) {
    throw new RangeError(`certification needs a square system: ${system.equations.length} equations in ${n} unknowns`);
  }
  const tape = createTape({ exactFolding: true });
  const memo = new Map();
  let where = 0;
  const leaves = {
    unknown: (i: number): number => {
      if (!(Number.isInteger(i) && i >= 0 && i < n)) throw new RangeError(`equation ${where}: unknown index ${i} is outside 0…${n - 1}`);
      return tape.unknown(i);
    },
    parameter: (i: number): number => {
      if (!(Number.isInteger(i) && i >= 0 && i < np)) throw new RangeError(`equation ${where}: parameter index ${i} is outside 0…${np - 1}`);
      return tape.parameter(i);
    },
  };
  const values = system.equations.map((e, i) => {
    where = i;
    return lowerExpression(tape, e, leaves, memo);
  });
  const jacobian = values.flatMap((root) => gradient(tape, root, n, 0).dx);
  return { unknownCount: n, ...slotsOfTape(tape.instructions, values, jacobian) };
}
