import type { TapeInstruction } from '../compile/tape.ts';
import { createDdEmitter, negatePart, scalarText, type Part } from './dd-emitter.ts';

/** A complex value of the tape while generating: its real and imaginary parts. */
interface ComplexParts {
  readonly re: Part;
  readonly im: Part;
}

/** The ids of the instructions the given outputs depend on (the tape is in evaluation order, so one backward pass). */
function neededFor(ins: readonly TapeInstruction[], roots: readonly number[]): Uint8Array {
  const needed = new Uint8Array(ins.length);
  for (const r of roots) needed[r] = 1;
  for (let id = ins.length - 1; id >= 0; id--) {
    if (needed[id] === 0) continue;
    const { op, a, b } = ins[id]!;
    if (op === 'add' || op === 'sub' || op === 'mul') { needed[a] = 1; needed[b] = 1; }
    else if (op === 'neg') needed[a] = 1;
  }
  return needed;
}

/**
 * Writes the JavaScript source of `function (xhi, xlo, p, v, vlo)` that evaluates the tape's value outputs in
 * double-double: x = xhi + xlo (packed complex, normalised pairs), p packed complex doubles (exact), constants the
 * tape's doubles. Every complex +, −, × is done in double-double, inlined as straight-line `const` code (no calls,
 * no allocation); negation is free. Per real part: sums ≤ 3u² + 13u³ relative (≤ 2u² with a double operand, exact
 * for two doubles); products ≤ 14u²·(|ar·br| + |ai·bi|) for the real part of a complex product (im alike), ≤ 7u²
 * relative for a real constant times a value, squares reuse xr·xi for im; u = 2⁻⁵³ (see dd-emitter.ts). Output k: v[2k], v[2k+1] = RN(value),
 * and when vlo is not null vlo[2k], vlo[2k+1] = value − RN(value) exactly (v + vlo is the double-double result).
 */
export function generateDoubleDoubleValuesSource(ins: readonly TapeInstruction[], values: readonly number[]): string {
  const emit = createDdEmitter();
  const needed = neededFor(ins, values);
  const parts: (ComplexParts | undefined)[] = new Array(ins.length);
  const at = (id: number): ComplexParts => parts[id]!;
  const variable = (name: string) => ({ name, negated: false });
  for (let id = 0; id < ins.length; id++) {
    if (needed[id] === 0) continue;
    const { op, a, b, re, im } = ins[id]!;
    switch (op) {
      case 'const':
        parts[id] = { re: { hi: { literal: re }, lo: null }, im: { hi: { literal: im }, lo: null } };
        break;
      case 'x':
        emit.lines.push(`const x${id}rh = xhi[${2 * a}], x${id}rl = xlo[${2 * a}], x${id}ih = xhi[${2 * a + 1}], x${id}il = xlo[${2 * a + 1}];`);
        parts[id] = { re: { hi: variable(`x${id}rh`), lo: variable(`x${id}rl`) }, im: { hi: variable(`x${id}ih`), lo: variable(`x${id}il`) } };
        break;
      case 'p':
        emit.lines.push(`const p${id}r = p[${2 * a}], p${id}i = p[${2 * a + 1}];`);
        parts[id] = { re: { hi: variable(`p${id}r`), lo: null }, im: { hi: variable(`p${id}i`), lo: null } };
        break;
      case 'neg':
        parts[id] = { re: negatePart(at(a).re), im: negatePart(at(a).im) };
        break;
      case 'add':
      case 'sub': {
        const x = at(a), y = op === 'add' ? at(b) : { re: negatePart(at(b).re), im: negatePart(at(b).im) };
        parts[id] = { re: emit.add(x.re, y.re), im: emit.add(x.im, y.im) };
        break;
      }
      case 'mul': {
        const x = at(a), y = at(b);
        // a square: re = xr² − xi², im = 2·xr·xi (one product fewer)
        if (a === b) {
          parts[id] = { re: emit.productSum([[x.re, x.re], [negatePart(x.im), x.im]]), im: emit.twice(emit.productSum([[x.re, x.im]])) };
          break;
        }
        parts[id] = {
          re: emit.productSum([[x.re, y.re], [negatePart(x.im), y.im]]),
          im: emit.productSum([[x.re, y.im], [x.im, y.re]]),
        };
        break;
      }
    }
  }
  const lows: string[] = [];
  values.forEach((id, k) => {
    const { re, im } = at(id);
    [re, im].forEach((part, c) => {
      const slot = 2 * k + c;
      if (part.lo === null) {
        emit.lines.push(`v[${slot}] = ${scalarText(part.hi)};`);
        lows.push(`vlo[${slot}] = 0;`);
        return;
      }
      const rounded = emit.bind(`${scalarText(part.hi)} + ${scalarText(part.lo)}`);
      emit.lines.push(`v[${slot}] = ${scalarText(rounded)};`);
      lows.push(`vlo[${slot}] = ${scalarText(part.lo)} - (${scalarText(rounded)} - ${scalarText(part.hi)});`);
    });
  });
  return ['"use strict";', 'return function evaluateInDoubleDouble(xhi, xlo, p, v, vlo) {', ...emit.lines, 'if (vlo === null) return;', ...lows, '};'].join('\n');
}
