import { describe, expect, it } from 'vitest';
import { createTape } from '../../../src/engine/compile/tape.ts';
import { gradient } from '../../../src/engine/compile/differentiate.ts';
import { slotsOfTape } from '../../../src/engine/certify/slots-of-tape.ts';

// The slot form must compute exactly what the tape computes: these checks pin its structure (a specification of
// the translation, no outside source needed).
describe('slot code of a tape', () => {
  it('puts leaves in point slots, signs on references, squares as sqr and the point operand first', () => {
    const tape = createTape({ exactFolding: true });
    const x = tape.unknown(0), c = tape.constant(2.5, 0), p = tape.parameter(0);
    const f = tape.sub(tape.mul(x, x), tape.mul(x, tape.mul(c, p))); // x² − x·(2.5·p)
    const code = slotsOfTape(tape.instructions, [f], gradient(tape, f, 1, 0).dx);
    expect(code.constants.map((k) => k.re)).toContain(2.5);
    expect(code.parameters).toHaveLength(1);
    expect(code.forward.filter((i) => i.op === 'sqr')).toHaveLength(1);
    const mulOfPoints = code.forward.find((i) => i.op === 'mul' && code.isPoint[i.a] && code.isPoint[i.b]);
    expect(mulOfPoints).toBeDefined();
    const mixed = code.forward.find((i) => i.op === 'mul' && !(code.isPoint[i.a] && code.isPoint[i.b]));
    expect(mixed && mixed.op === 'mul' && !code.isPoint[mixed.a]).toBe(true); // the 2.5·p slot is not a point slot
    expect(code.values[0]).not.toBeNull();
    expect(code.jacobian).toHaveLength(1);
    expect(code.realConstants).toBe(true);
  });

  it('emits nothing for a negation and folds products by ±1', () => {
    const tape = createTape({ exactFolding: true });
    const x = tape.unknown(0), y = tape.unknown(1);
    const f = tape.neg(tape.mul(x, y));
    const code = slotsOfTape(tape.instructions, [f], []);
    expect(code.forward.map((i) => i.op)).toEqual(['load', 'load', 'mul']);
    expect(code.values[0]).toEqual({ slot: code.forward[2]!.out, neg: true });
  });

  it('splits value code (forward) from derivative code (backward) and maps a zero derivative to null', () => {
    const tape = createTape({ exactFolding: true });
    const x = tape.unknown(0), y = tape.unknown(1);
    const f = tape.mul(tape.mul(x, x), tape.constant(0, 1)); // i·x², independent of y
    const g = gradient(tape, f, 2, 0).dx;
    const code = slotsOfTape(tape.instructions, [f], g);
    expect(code.realConstants).toBe(false);
    expect(code.jacobian[1]).toBeNull();
    expect(code.backward.length).toBeGreaterThan(0);
    expect(code.forward.some((i) => i.op === 'load' && i.index === 1)).toBe(false);
    void y;
  });
});
