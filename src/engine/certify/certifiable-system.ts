import type { PolynomialSystem } from '../expr/node.ts';
import { compileChunks, intervalHelpers, intervalLine, pointLine, type Kernel } from './emit-interval.ts';
import { exactValues } from './exact-values.ts';
import { lowerSystem, type SlotRef } from './straight-line.ts';

/**
 * A square system compiled once for certification: interval values and the interval Jacobian over a complex box
 * (rectangles, [reLo, reHi, imLo, imHi] per entry, outward rounded, so they enclose the exact ranges), and the
 * same in plain floating point at a point (for Newton steps and the approximate inverse Y). Parameters are set
 * as exact doubles (degenerate intervals). Buffers are made once; evaluation allocates nothing.
 */
export interface CertifiableSystem {
  readonly size: number;
  /** True when all constants of the graph are real: with real parameters the system then has real coefficients. */
  readonly realConstants: boolean;
  /** Structural non-zeros of the Jacobian, row-major n×n (1 where ∂f_i/∂x_j is not identically 0). */
  readonly jacobianPattern: Uint8Array;
  /** Sets the packed complex parameters (length 2·parameterCount); throws naming the problem on a bad length or value. */
  setParameters(parameters: Float64Array): void;
  /** Interval values F(X) into values (4n). */
  intervalValues(box: Float64Array, values: Float64Array): void;
  /** Interval values F(X) into values (4n) and Jacobian J(X) into jacobian (4n², row-major). */
  intervalJacobian(box: Float64Array, values: Float64Array, jacobian: Float64Array): void;
  /** An enclosure (4n, one to a few floats wide) of the exact F(x) at a point of doubles; slow (BigInt), for fallbacks. */
  exactValues(x: Float64Array, values: Float64Array): void;
  /** Floating-point F(x) into values (2n) and J(x) into jacobian (2n², row-major); x packed complex. */
  pointJacobian(x: Float64Array, values: Float64Array, jacobian: Float64Array): void;
}

function copyOut(refs: readonly SlotRef[], width: number, buffer: Float64Array, out: Float64Array): void {
  for (let k = 0; k < refs.length; k++) {
    const r = refs[k]!;
    const o = width * k;
    if (r === null) { out.fill(0, o, o + width); continue; }
    const s = width * r.slot;
    if (width === 2) {
      out[o] = r.neg ? -buffer[s]! : buffer[s]!;
      out[o + 1] = r.neg ? -buffer[s + 1]! : buffer[s + 1]!;
    } else if (r.neg) {
      out[o] = -buffer[s + 1]!; out[o + 1] = -buffer[s]!; out[o + 2] = -buffer[s + 3]!; out[o + 3] = -buffer[s + 2]!;
    } else {
      out[o] = buffer[s]!; out[o + 1] = buffer[s + 1]!; out[o + 2] = buffer[s + 2]!; out[o + 3] = buffer[s + 3]!;
    }
  }
}

function run(kernels: readonly Kernel[], buffer: Float64Array, input: Float64Array): void {
  for (let k = 0; k < kernels.length; k++) kernels[k]!(buffer, input);
}

/** Compiles a square system (once); throws a RangeError naming the problem when it is not square. */
export function compileCertifiableSystem(system: PolynomialSystem): CertifiableSystem {
  const program = lowerSystem(system);
  const n = program.unknownCount;
  const line = intervalLine(program.isPoint);
  const valueKernels = compileChunks(program.forward, line, intervalHelpers);
  const jacobianKernels = compileChunks(program.backward, line, intervalHelpers);
  const pointKernels = compileChunks([...program.forward, ...program.backward], pointLine, {});
  const ib = new Float64Array(4 * program.slotCount);
  const pb = new Float64Array(2 * program.slotCount);
  const put = (slot: number, re: number, im: number): void => {
    ib[4 * slot] = re; ib[4 * slot + 1] = re; ib[4 * slot + 2] = im; ib[4 * slot + 3] = im;
    pb[2 * slot] = re; pb[2 * slot + 1] = im;
  };
  for (const c of program.constants) put(c.slot, c.re, c.im);
  const parameterCount = system.parameters.length;
  return {
    size: n,
    realConstants: program.realConstants,
    jacobianPattern: Uint8Array.from(program.jacobian, (r) => (r === null ? 0 : 1)),
    setParameters(parameters) {
      if (parameters.length !== 2 * parameterCount) {
        throw new RangeError(`expected ${parameterCount} complex parameters (${2 * parameterCount} numbers), got ${parameters.length} numbers`);
      }
      for (let k = 0; k < parameters.length; k++) {
        if (!Number.isFinite(parameters[k]!)) throw new RangeError(`parameter ${system.parameters[k >> 1]} (number ${k}) is not finite: ${parameters[k]}`);
      }
      for (const p of program.parameters) put(p.slot, parameters[2 * p.index]!, parameters[2 * p.index + 1]!);
    },
    intervalValues(box, values) {
      run(valueKernels, ib, box);
      copyOut(program.values, 4, ib, values);
    },
    intervalJacobian(box, values, jacobian) {
      run(valueKernels, ib, box);
      run(jacobianKernels, ib, box);
      copyOut(program.values, 4, ib, values);
      copyOut(program.jacobian, 4, ib, jacobian);
    },
    exactValues(x, values) {
      exactValues(program, pb, x, values);
    },
    pointJacobian(x, values, jacobian) {
      run(pointKernels, pb, x);
      copyOut(program.values, 2, pb, values);
      copyOut(program.jacobian, 2, pb, jacobian);
    },
  };
}
