import { complexAdd, complexMul, complexNeg, complexScale, complexSqr, complexSub } from '../interval/complex-interval.ts';
import type { Instruction } from './straight-line.ts';

/** A compiled piece of straight-line code over one buffer B of slots and an input vector X. */
export type Kernel = (B: Float64Array, X: Float64Array) => void;

/** Instructions per generated function: keeps each function small enough for the optimising compiler. */
const CHUNK = 100;

/** Compiles instructions to JavaScript source chunks and instantiates them (new Function), in order. */
export function compileChunks(instructions: readonly Instruction[], line: (ins: Instruction) => string, helpers: Record<string, unknown>): Kernel[] {
  const names = Object.keys(helpers);
  const kernels: Kernel[] = [];
  for (let start = 0; start < instructions.length; start += CHUNK) {
    const body = instructions.slice(start, start + CHUNK).map(line).join('\n');
    const factory = new Function(...names, `'use strict';\nreturn function (B, X) {\n${body}\n};`) as (...h: unknown[]) => Kernel;
    kernels.push(factory(...names.map((k) => helpers[k])));
  }
  return kernels;
}

/** One instruction as interval code: slots are complex rectangles, 4 doubles at B[4·slot]. */
export function intervalLine(isPoint: readonly boolean[]): (ins: Instruction) => string {
  return (ins) => {
    const o = 4 * ins.out;
    switch (ins.op) {
      case 'load': {
        const x = 4 * ins.index;
        return `B[${o}]=X[${x}];B[${o + 1}]=X[${x + 1}];B[${o + 2}]=X[${x + 2}];B[${o + 3}]=X[${x + 3}];`;
      }
      case 'mul':
        return isPoint[ins.a]
          ? `K(B,${o},B,${4 * ins.a},B,${4 * ins.b});`
          : `M(B,${o},B,${4 * ins.a},B,${4 * ins.b});`;
      case 'sqr':
        return `Q(B,${o},B,${4 * ins.a});`;
      case 'sum': {
        const t = ins.terms.map((s) => 4 * s);
        const [n0, n1] = [ins.negs[0], ins.negs[1]];
        let text = n0 === n1 ? `A(B,${o},B,${t[0]},B,${t[1]});` : n0 ? `S(B,${o},B,${t[1]},B,${t[0]});` : `S(B,${o},B,${t[0]},B,${t[1]});`;
        const negated = n0 && n1; // −a − b: accumulate a + b + … with flipped signs, negate at the end
        for (let k = 2; k < t.length; k++) {
          const plus = ins.negs[k] === negated;
          text += plus ? `A(B,${o},B,${o},B,${t[k]});` : `S(B,${o},B,${o},B,${t[k]});`;
        }
        return negated ? `${text}N(B,${o},B,${o});` : text;
      }
    }
  };
}

/** The interval helpers the generated code calls (outward-rounded complex rectangle operations). */
export const intervalHelpers = { A: complexAdd, S: complexSub, N: complexNeg, M: complexMul, K: complexScale, Q: complexSqr };

/** One instruction as plain complex floating-point code: 2 doubles per slot at B[2·slot] (for Newton, Y ≈ J⁻¹). */
export function pointLine(ins: Instruction): string {
  const o = 2 * ins.out;
  switch (ins.op) {
    case 'load':
      return `B[${o}]=X[${2 * ins.index}];B[${o + 1}]=X[${2 * ins.index + 1}];`;
    case 'mul': {
      const a = 2 * ins.a, b = 2 * ins.b;
      return `B[${o}]=B[${a}]*B[${b}]-B[${a + 1}]*B[${b + 1}];B[${o + 1}]=B[${a}]*B[${b + 1}]+B[${a + 1}]*B[${b}];`;
    }
    case 'sqr': {
      const a = 2 * ins.a;
      return `B[${o}]=B[${a}]*B[${a}]-B[${a + 1}]*B[${a + 1}];B[${o + 1}]=2*B[${a}]*B[${a + 1}];`;
    }
    case 'sum': {
      const part = (d: number): string => ins.terms.map((s, k) => `${ins.negs[k] ? '-' : '+'}B[${2 * s + d}]`).join('');
      return `B[${o}]=${part(0)};B[${o + 1}]=${part(1)};`;
    }
  }
}
