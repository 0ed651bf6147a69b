import type { TapeInstruction } from './tape.ts';

/** The outputs of a compiled program: tape ids for values, ∂/∂x (row-major neq×n), ∂/∂p (row-major neq×np). */
export interface ProgramOutputs {
  readonly values: readonly number[];
  readonly jx: readonly number[];
  readonly jp: readonly number[];
}

/**
 * Writes the JavaScript source of `function (x, p, v, jx, jp)` that evaluates the tape as straight-line code
 * in three sections: values into v, then (unless jx is null) ∂/∂x into jx, then (unless jp is null) ∂/∂p into jp.
 * Each instruction becomes two locals (re, im); products with a real constant cost two multiplications.
 * Constants print with JavaScript's shortest round-trip form, so the source evaluates bit-identically everywhere.
 */
export function generateSource(ins: readonly TapeInstruction[], out: ProgramOutputs): string {
  const section = new Int8Array(ins.length).fill(-1);
  const mark = (roots: readonly number[], s: number): void => {
    const stack = [...roots];
    while (stack.length > 0) {
      const id = stack.pop()!;
      if (section[id] !== -1) continue;
      section[id] = s;
      const { op, a, b } = ins[id]!;
      if (op === 'add' || op === 'sub' || op === 'mul') stack.push(a, b);
      else if (op === 'neg') stack.push(a);
    }
  };
  mark(out.values, 0);
  mark(out.jx, 1);
  mark(out.jp, 2);
  const isRealConst = (id: number): boolean => ins[id]!.op === 'const' && ins[id]!.im === 0;
  const re = (id: number): string => (ins[id]!.op === 'const' ? numberLiteral(ins[id]!.re) : `r${id}`);
  const im = (id: number): string => (ins[id]!.op === 'const' ? numberLiteral(ins[id]!.im) : `i${id}`);
  const line = (id: number): string => {
    const { op, a, b } = ins[id]!;
    switch (op) {
      case 'const': return '';
      case 'x': return `const r${id} = x[${2 * a}], i${id} = x[${2 * a + 1}];`;
      case 'p': return `const r${id} = p[${2 * a}], i${id} = p[${2 * a + 1}];`;
      case 'neg': return `const r${id} = -${re(a)}, i${id} = -${im(a)};`;
      case 'add':
        if (isRealConst(a)) return `const r${id} = ${re(a)} + ${re(b)}, i${id} = ${im(b)};`;
        return `const r${id} = ${re(a)} + ${re(b)}, i${id} = ${im(a)} + ${im(b)};`;
      case 'sub':
        if (isRealConst(b)) return `const r${id} = ${re(a)} - ${re(b)}, i${id} = ${im(a)};`;
        if (isRealConst(a)) return `const r${id} = ${re(a)} - ${re(b)}, i${id} = -${im(b)};`;
        return `const r${id} = ${re(a)} - ${re(b)}, i${id} = ${im(a)} - ${im(b)};`;
      case 'mul':
        if (isRealConst(a)) return `const r${id} = ${re(a)} * ${re(b)}, i${id} = ${re(a)} * ${im(b)};`;
        if (isRealConst(b)) return `const r${id} = ${re(b)} * ${re(a)}, i${id} = ${re(b)} * ${im(a)};`;
        return `const r${id} = ${re(a)} * ${re(b)} - ${im(a)} * ${im(b)}, i${id} = ${re(a)} * ${im(b)} + ${im(a)} * ${re(b)};`;
    }
  };
  const body: string[] = ['"use strict";', 'return function evaluate(x, p, v, jx, jp) {'];
  const emit = (s: number, target: string, roots: readonly number[]): void => {
    for (let id = 0; id < ins.length; id++) if (section[id] === s) { const l = line(id); if (l) body.push(l); }
    roots.forEach((id, k) => body.push(`${target}[${2 * k}] = ${re(id)}; ${target}[${2 * k + 1}] = ${im(id)};`));
  };
  emit(0, 'v', out.values);
  body.push('if (jx === null) return;');
  emit(1, 'jx', out.jx);
  body.push('if (jp === null) return;');
  emit(2, 'jp', out.jp);
  body.push('};');
  return body.join('\n');
}

/** A number literal that evaluates to exactly the same double (negative values parenthesised for `- -x`; −0 prints as 0). */
export function numberLiteral(value: number): string {
  const s = Object.is(value, -0) ? '0' : String(value);
  return value < 0 ? `(${s})` : s;
}
