import { mkdirSync, readFileSync, renameSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { createStepper, DEFAULT_TRACKER_SETTINGS, type Homotopy } from '../../../src/engine/index.ts';

/** A generic solution set of one family member: chart constants, parameters and solutions (packed complex, working coordinates). */
export interface StoredSet {
  /** The file stem, chosen by the family (it names the member). */
  readonly name: string;
  /** The family's key of the member (small integers: degrees, numbers of conditions); checked on load. */
  readonly shape: Readonly<Record<string, number>>;
  /** The seed the set was found from (chart and monodromy). */
  readonly seed: number;
  readonly chart: Float64Array;
  readonly parameters: Float64Array;
  readonly solutions: Float64Array[];
}

/** Lengths (complex entries) a family expects of one member's set. */
export interface StoredSetSizes {
  readonly unknowns: number;
  readonly parameters: number;
  readonly chart: number;
}

/** The format tag in every header; bump the number when the layout changes. */
export const STORED_SET_FORMAT = 'stored-solution-set/1';

interface Header {
  readonly format: string;
  readonly name: string;
  readonly shape: Record<string, number>;
  readonly seed: number;
  readonly count: number;
  readonly unknowns: number;
  readonly solutions: string;
  readonly chart: number[];
  readonly parameters: number[];
}

/** The two files of a set: a JSON header and the float32 solutions beside it. */
export function storedSetPaths(dir: string, name: string): { readonly header: string; readonly solutions: string } {
  return { header: join(dir, `${name}.json`), solutions: join(dir, `${name}.f32`) };
}

const sortedShape = (shape: Readonly<Record<string, number>>): Record<string, number> =>
  Object.fromEntries(Object.entries(shape).sort(([a], [b]) => (a < b ? -1 : 1)));

/**
 * Writes a set as a JSON header (shape with sorted keys; chart and parameters in full double precision) plus a
 * little-endian float32 file of the solutions; reading refines each solution by Newton's method, so float32 (relative
 * error 6e-8) suffices. Atomic: temporary files, then rename. Returns the header's path.
 */
export function writeStoredSet(set: StoredSet, dir: string): string {
  mkdirSync(dir, { recursive: true });
  const paths = storedSetPaths(dir, set.name);
  const width = set.solutions[0]?.length ?? 0;
  if (set.solutions.some((x) => x.length !== width)) throw new RangeError(`stored set ${set.name}: solutions of different lengths`);
  const floats = new Float32Array(set.solutions.length * width);
  set.solutions.forEach((x, i) => floats.set(x, i * width));
  const header: Header = {
    format: STORED_SET_FORMAT, name: set.name, shape: sortedShape(set.shape), seed: set.seed, count: set.solutions.length,
    unknowns: width / 2, solutions: `${set.name}.f32`, chart: [...set.chart], parameters: [...set.parameters],
  };
  writeFileSync(`${paths.solutions}.tmp`, new Uint8Array(floats.buffer));
  writeFileSync(`${paths.header}.tmp`, `${JSON.stringify(header)}\n`);
  renameSync(`${paths.solutions}.tmp`, paths.solutions);
  renameSync(`${paths.header}.tmp`, paths.header);
  return paths.header;
}

/**
 * Reads a set written by writeStoredSet, checks it against the family's shape and sizes, and refines every solution by
 * Newton's method on `polish(chart, parameters)` at t = 0 (relative tolerance 1e-14, at most 8 iterations; a residual
 * above 1e-10 afterwards is a fault). Throws naming the file and the fault.
 */
export function readStoredSet(
  file: string,
  expected: { readonly shape: Readonly<Record<string, number>>; readonly sizes: StoredSetSizes },
  polish: (chart: Float64Array, parameters: Float64Array) => Homotopy,
): StoredSet {
  const header = JSON.parse(readFileSync(file, 'utf8')) as Header;
  if (header.format !== STORED_SET_FORMAT) throw new Error(`${file}: format "${header.format}" is not ${STORED_SET_FORMAT}`);
  const want = JSON.stringify(sortedShape(expected.shape)), got = JSON.stringify(sortedShape(header.shape ?? {}));
  if (want !== got) throw new Error(`${file}: shape ${got} is not the expected ${want}`);
  const { unknowns: n, parameters: np, chart: nc } = expected.sizes;
  if (header.unknowns !== n) throw new Error(`${file}: ${header.unknowns} unknowns, expected ${n}`);
  if (header.chart.length !== 2 * nc || header.parameters.length !== 2 * np) throw new Error(`${file}: chart or parameters have the wrong length`);
  const bytes = readFileSync(join(dirname(file), header.solutions));
  if (bytes.byteLength !== header.count * 2 * n * 4) throw new Error(`${file}: ${header.solutions} holds ${bytes.byteLength} bytes, expected ${header.count * 2 * n * 4}`);
  const floats = new Float32Array(bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength));
  const chart = Float64Array.from(header.chart), parameters = Float64Array.from(header.parameters);
  const stepper = createStepper(polish(chart, parameters), DEFAULT_TRACKER_SETTINGS);
  const solutions = Array.from({ length: header.count }, (_, i) => {
    const x = Float64Array.from(floats.subarray(i * 2 * n, (i + 1) * 2 * n));
    stepper.newton(x, 0, 0, 1e-14, 8);
    const r = stepper.residual(x, 0, 0);
    if (!(r < 1e-10)) throw new Error(`${file}: solution ${i} does not refine (residual ${r})`);
    return x;
  });
  return { name: header.name, shape: header.shape, seed: header.seed, chart, parameters, solutions };
}
