import { existsSync, mkdirSync, readFileSync, renameSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { createRandom } from '../../../src/engine/random.ts';
import { createStepper } from '../../../src/engine/track/stepper.ts';
import { DEFAULT_TRACKER_SETTINGS } from '../../../src/engine/track/settings.ts';
import { discoverByMonodromy, type MonodromyResult } from '../../../src/engine/monodromy/discover.ts';
import type { LegTracker } from '../../../src/engine/parameter/route.ts';
import { createHomotopy } from './tangency-homotopy.ts';
import { randomChart, tangencySeed } from './tangency-seed.ts';
import { chartCount, parameterCount, unknownCount, type TangencyShape } from './tangency-layout.ts';

/** A generic solution set of one rung: chart constants, parameters and solutions (packed complex, working coordinates). */
export interface StartSet {
  readonly shape: TangencyShape;
  readonly seed: number;
  readonly chart: Float64Array;
  readonly parameters: Float64Array;
  readonly solutions: Float64Array[];
}

const FORMAT = 'conic-tangency-start-set/1';
const here = dirname(fileURLToPath(import.meta.url));
/** Committed sets live beside the definitions. */
export const COMMITTED_DIR = join(here, 'data');
/** Sets rebuilt by monodromy are cached here (gitignored). */
export const CACHE_DIR = join(here, '../../../.cache/conics');

function fileStem(shape: TangencyShape): string {
  return `start-${shape.points}-points-${shape.conics}-conics`;
}

/**
 * Writes a set as JSON (header, chart and parameters in full double precision) plus a little-endian float32 file
 * of the solutions; loading refines each solution by Newton's method, so float32 (relative error 6e-8) suffices.
 * Atomic: temporary files, then rename.
 */
export function writeStartSet(set: StartSet, dir: string): string {
  mkdirSync(dir, { recursive: true });
  const stem = fileStem(set.shape);
  const n = unknownCount(set.shape);
  const floats = new Float32Array(set.solutions.length * 2 * n);
  set.solutions.forEach((x, i) => floats.set(x, i * 2 * n));
  const header = { format: FORMAT, points: set.shape.points, conics: set.shape.conics, seed: set.seed, count: set.solutions.length, solutions: `${stem}.f32`, chart: [...set.chart], parameters: [...set.parameters] };
  writeFileSync(join(dir, `${stem}.f32.tmp`), new Uint8Array(floats.buffer));
  writeFileSync(join(dir, `${stem}.json.tmp`), `${JSON.stringify(header)}\n`);
  renameSync(join(dir, `${stem}.f32.tmp`), join(dir, `${stem}.f32`));
  renameSync(join(dir, `${stem}.json.tmp`), join(dir, `${stem}.json`));
  return join(dir, `${stem}.json`);
}

/** Reads a set written by writeStartSet and refines every solution (Newton, relative tolerance 1e-14); throws naming the file on any fault. */
export function readStartSet(file: string): StartSet {
  const header = JSON.parse(readFileSync(file, 'utf8')) as { format: string; points: number; conics: number; seed: number; count: number; solutions: string; chart: number[]; parameters: number[] };
  if (header.format !== FORMAT) throw new Error(`${file}: format "${header.format}" is not ${FORMAT}`);
  const shape = { points: header.points, conics: header.conics };
  const n = unknownCount(shape);
  if (header.chart.length !== 2 * chartCount(shape) || header.parameters.length !== 2 * parameterCount(shape)) throw new Error(`${file}: chart or parameters have the wrong length`);
  const bytes = readFileSync(join(dirname(file), header.solutions));
  if (bytes.byteLength !== header.count * 2 * n * 4) throw new Error(`${file}: ${header.solutions} holds ${bytes.byteLength} bytes, expected ${header.count * 2 * n * 4}`);
  const floats = new Float32Array(bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength));
  const chart = Float64Array.from(header.chart), parameters = Float64Array.from(header.parameters);
  const H = createHomotopy({ ...shape, chart, from: parameters, to: parameters, gamma: [1, 0] });
  const stepper = createStepper(H, DEFAULT_TRACKER_SETTINGS);
  const solutions = Array.from({ length: header.count }, (_, i) => {
    const x = Float64Array.from(floats.subarray(i * 2 * n, (i + 1) * 2 * n));
    stepper.newton(x, 0, 0, 1e-14, 8);
    const r = stepper.residual(x, 0, 0);
    if (!(r < 1e-10)) throw new Error(`${file}: solution ${i} does not refine (residual ${r})`);
    return x;
  });
  return { shape, seed: header.seed, chart, parameters, solutions };
}

/** Finds a set by monodromy from a solution-first seed (chart and seed from `seed`), stopping at `expected` solutions. */
export async function buildStartSet(shape: TangencyShape, seed: number, expected: number, track?: (chart: Float64Array) => LegTracker): Promise<{ set: StartSet; monodromy: MonodromyResult }> {
  const random = createRandom(seed);
  const chart = randomChart(shape, random);
  const start = tangencySeed(shape, chart, random);
  const legTracker = track ? track(chart) : (await import('../../../src/engine/parameter/in-process-tracker.ts')).createInProcessLegTracker((leg) => createHomotopy({ ...shape, chart, ...leg }));
  const monodromy = await discoverByMonodromy({ track: legTracker, seed: start, random, expected });
  if (monodromy.solutions.length !== expected) {
    throw new Error(`monodromy for ${shape.points} points and ${shape.conics} conics found ${monodromy.solutions.length} solutions, not the published ${expected} (stop: ${monodromy.stop})`);
  }
  return { set: { shape, seed, chart, parameters: monodromy.parameters, solutions: monodromy.solutions }, monodromy };
}

/** The committed set if present, else the cached one, else a new one built by monodromy and cached. */
export async function loadStartSet(shape: TangencyShape, seed: number, expected: number, track?: (chart: Float64Array) => LegTracker): Promise<StartSet> {
  for (const dir of [COMMITTED_DIR, CACHE_DIR]) {
    const file = join(dir, `${fileStem(shape)}.json`);
    if (existsSync(file)) {
      const set = readStartSet(file);
      if (set.solutions.length !== expected) throw new Error(`${file}: holds ${set.solutions.length} solutions, expected ${expected}`);
      return set;
    }
  }
  const { set } = await buildStartSet(shape, seed, expected, track);
  writeStartSet(set, CACHE_DIR);
  return set;
}
