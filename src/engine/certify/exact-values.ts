import { widenDown, widenUp } from '../interval/outward.ts';
import type { StraightLineProgram } from './straight-line.ts';

/**
 * Exact evaluation of a system's values at a point of doubles, for solutions too ill-conditioned for interval
 * arithmetic in double precision: every double is a dyadic rational m·2ᵉ (BigInt m), sums and products of dyadics
 * are exact, and only the final value is rounded (outward) to a double interval, one or two floats wide. Slow
 * (BigInt), so used only as a fallback.
 */
interface Dyadic { m: bigint; e: number }

const f64 = new Float64Array(1);
const u32 = new Uint32Array(f64.buffer);
const littleEndian = new Uint8Array(new Uint16Array([1]).buffer)[0] === 1;
const HI = littleEndian ? 1 : 0, LO = littleEndian ? 0 : 1;

/** The exact dyadic value of a finite double (bit pattern: sign, biased exponent, 52-bit fraction). */
function dyadicOf(x: number): Dyadic {
  if (x === 0) return { m: 0n, e: 0 };
  f64[0] = x;
  const hi = u32[HI]!, lo = u32[LO]!;
  const biased = (hi >>> 20) & 0x7ff;
  let m = (BigInt(hi & 0xfffff) << 32n) | BigInt(lo);
  if (biased !== 0) m |= 1n << 52n;
  const e = (biased === 0 ? 1 : biased) - 1075;
  return { m: hi >>> 31 ? -m : m, e };
}

/** 2ᵏ as a double, exactly, for −1074 ≤ k ≤ 1023 (built from its bit pattern). */
function powerOfTwo(k: number): number {
  if (k >= -1022) { u32[HI] = (k + 1023) << 20; u32[LO] = 0; return f64[0]!; }
  const shift = k + 1074; // subnormal: a single fraction bit
  if (shift >= 32) { u32[HI] = 1 << (shift - 32); u32[LO] = 0; } else { u32[HI] = 0; u32[LO] = (1 << shift) >>> 0; }
  return f64[0]!;
}

function add(a: Dyadic, b: Dyadic): Dyadic {
  if (a.m === 0n) return b;
  if (b.m === 0n) return a;
  return a.e <= b.e ? { m: a.m + (b.m << BigInt(b.e - a.e)), e: a.e } : { m: b.m + (a.m << BigInt(a.e - b.e)), e: b.e };
}
const mul = (a: Dyadic, b: Dyadic): Dyadic => ({ m: a.m * b.m, e: a.e + b.e });
const neg = (a: Dyadic): Dyadic => ({ m: -a.m, e: a.e });

/** Writes doubles lo ≤ value ≤ hi for an exact dyadic (correctly rounded conversion, then outward by one rounding each). */
function enclose(d: Dyadic, out: Float64Array, o: number): void {
  if (d.m === 0n) { out[o] = 0; out[o + 1] = 0; return; }
  // keep 64 significant bits plus a sticky bit so that Number() rounds once
  let m = d.m, e = d.e;
  const negative = m < 0n;
  if (negative) m = -m;
  const bits = m.toString(2).length;
  if (bits > 64) {
    const drop = BigInt(bits - 64);
    const sticky = (m & ((1n << drop) - 1n)) === 0n ? 0n : 1n;
    m = (m >> drop) | sticky;
    e += bits - 64;
  }
  // value = m·2ᵉ with m < 2⁶⁴: scale in two exact-or-once-rounded steps
  let v = Number(m); // correctly rounded
  let k = e;
  while (k > 1023) { v *= powerOfTwo(1023); k -= 1023; }
  while (k < -1022) { v *= powerOfTwo(-1022); k += 1022; }
  v *= powerOfTwo(k);
  if (negative) v = -v;
  // at most a few roundings happened (Number(), subnormal scaling): widen generously, twice each way
  out[o] = widenDown(widenDown(widenDown(v)));
  out[o + 1] = widenUp(widenUp(widenUp(v)));
}

/** Evaluates the forward program exactly at x (packed complex doubles) with the given point-slot values, writing an
 * enclosure of each equation's value (4n: [reLo, reHi, imLo, imHi]). pointSlots holds the constants and parameters
 * as packed complex doubles at 2·slot. */
export function exactValues(program: StraightLineProgram, pointSlots: Float64Array, x: Float64Array, out: Float64Array): void {
  const re: Dyadic[] = new Array(program.slotCount), im: Dyadic[] = new Array(program.slotCount);
  for (const c of [...program.constants, ...program.parameters]) {
    re[c.slot] = dyadicOf(pointSlots[2 * c.slot]!);
    im[c.slot] = dyadicOf(pointSlots[2 * c.slot + 1]!);
  }
  for (const ins of program.forward) {
    switch (ins.op) {
      case 'load': re[ins.out] = dyadicOf(x[2 * ins.index]!); im[ins.out] = dyadicOf(x[2 * ins.index + 1]!); break;
      case 'sum': {
        let r: Dyadic = { m: 0n, e: 0 }, i: Dyadic = { m: 0n, e: 0 };
        ins.terms.forEach((t, k) => {
          r = add(r, ins.negs[k] ? neg(re[t]!) : re[t]!);
          i = add(i, ins.negs[k] ? neg(im[t]!) : im[t]!);
        });
        re[ins.out] = r; im[ins.out] = i;
        break;
      }
      case 'mul': case 'sqr': {
        const b = ins.op === 'mul' ? ins.b : ins.a;
        re[ins.out] = add(mul(re[ins.a]!, re[b]!), neg(mul(im[ins.a]!, im[b]!)));
        im[ins.out] = add(mul(re[ins.a]!, im[b]!), mul(im[ins.a]!, re[b]!));
        break;
      }
    }
  }
  program.values.forEach((ref, k) => {
    if (ref === null) { out.fill(0, 4 * k, 4 * k + 4); return; }
    const r = ref.neg ? neg(re[ref.slot]!) : re[ref.slot]!, i = ref.neg ? neg(im[ref.slot]!) : im[ref.slot]!;
    enclose(r, out, 4 * k);
    enclose(i, out, 4 * k + 2);
  });
}
