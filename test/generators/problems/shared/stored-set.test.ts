import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { systemOf } from '../../../../src/atlas/system-of.ts';
import { solveByParameterHomotopy } from '../../../../src/engine/index.ts';
import { buildStoredSet, loadStoredSet, readSetOf, storedSetReads } from '../../../../generators/problems/shared/stored-set.ts';
import { STORED_SET_FORMAT, storedSetPaths, writeStoredSet } from '../../../../generators/problems/shared/stored-set-file.ts';
import { productOfLines, toyDefinition, toySpec } from './conic-cubic-toy.ts';

const dir = mkdtempSync(join(tmpdir(), 'stored-set-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

type Line = readonly [number, number, number];
// Our own lines: the conic is two lines, the cubic three; no three meet, so the 6 points are the pairwise crossings.
const conicLines: Line[] = [[1, 2, -3], [2, -1, 1]];
const cubicLines: Line[] = [[1, 0, -4], [0, 1, 2], [1, 1, -1]];
/** Where a·x + b·y + c = 0 meets a'·x + b'·y + c' = 0, by Cramer's rule (exact in rationals, here in doubles). */
const crossing = ([a, b, c]: Line, [d, e, f]: Line): [number, number] => {
  const det = a * e - b * d;
  return [(b * f - c * e) / det, (c * d - a * f) / det];
};

describe('a stored solution set of a second family (a conic meets a cubic in 2 · 3 = 6 points: Bézout 1779; Fulton, Algebraic Curves, 1969)', () => {
  it('is built by monodromy from a solution-first seed up to the published count', async () => {
    const { set, monodromy } = await buildStoredSet(toySpec(dir, 5));
    expect(monodromy.stop).toBe('known-count');
    expect(set.solutions).toHaveLength(6);
  });

  it('survives a float32 round trip in a format that names no family: reading polishes each solution back to double precision', async () => {
    const spec = toySpec(dir, 6);
    const { set } = await buildStoredSet(spec);
    const file = writeStoredSet(set, dir);
    const header = JSON.parse(readFileSync(file, 'utf8'));
    expect(header).toMatchObject({ format: STORED_SET_FORMAT, name: 'toy-conic-cubic', shape: { first: 2, second: 3 }, count: 6, unknowns: 2 });
    expect(STORED_SET_FORMAT).not.toMatch(/conic|cubic|tangen/);
    const back = readSetOf(spec, file);
    back.solutions.forEach((x, i) => x.forEach((v, j) => expect(Math.abs(v - set.solutions[i]![j]!)).toBeLessThan(1e-10 * (1 + Math.abs(v)))));
  });

  it('is carried by its solver to a target: the six crossings of two lines with three lines, by Cramer\'s rule', async () => {
    const committed = mkdtempSync(join(dir, 'committed-'));
    const spec = toySpec(committed, 7);
    writeStoredSet((await buildStoredSet(spec)).set, committed);
    const definition = toyDefinition(spec);
    if (definition.solver?.kind !== 'parameter-homotopy') throw new Error('the toy is solved by parameter homotopy');
    const problem = await definition.solver.prepare(systemOf(definition));
    const target = Float64Array.from([...productOfLines(conicLines), ...productOfLines(cubicLines)].flatMap((v) => [v, 0]));
    const report = await solveByParameterHomotopy(problem, target, { seed: 1 });
    expect(report.solutions).toHaveLength(6);
    for (const l of conicLines) for (const m of cubicLines) {
      const [x, y] = crossing(l, m);
      const near = report.solutions.filter((s) => Math.hypot(s.point[0]! - x, s.point[1]!, s.point[2]! - y, s.point[3]!) < 1e-9 * (1 + Math.hypot(x, y)));
      expect(near, `crossing (${x}, ${y})`).toHaveLength(1);
    }
  });

  it('is rebuilt by monodromy and cached when no committed file exists, then read from the cache', async () => {
    const cache = mkdtempSync(join(dir, 'cache-'));
    const spec = toySpec(join(dir, 'nothing-committed'), 8);
    const first = await loadStoredSet(spec, undefined, cache);
    expect(existsSync(storedSetPaths(cache, 'toy-conic-cubic').header)).toBe(true);
    const second = await loadStoredSet(spec, undefined, cache);
    expect(second.solutions).toHaveLength(first.solutions.length);
    second.solutions.forEach((x, i) => expect(Math.hypot(...x.map((v, j) => v - first.solutions[i]![j]!))).toBeLessThan(1e-10));
  });

  it.each([
    ['the shape is another family member\'s', (file: string) => writeFileSync(file, readFileSync(file, 'utf8').replace('"second":3', '"second":4')), /shape \{"first":2,"second":4\} is not the expected/],
    ['the solutions file is cut short', (file: string) => writeFileSync(file.replace(/\.json$/, '.f32'), new Uint8Array(8)), /toy-conic-cubic\.json: toy-conic-cubic\.f32 holds 8 bytes, expected 96/],
    ['the format tag is another', (file: string) => writeFileSync(file, readFileSync(file, 'utf8').replace(STORED_SET_FORMAT, 'other/1')), /format "other\/1" is not stored-solution-set\/1/],
  ])('is refused, naming the file and the fault, when %s', async (_name, spoil, message) => {
    const here = mkdtempSync(join(dir, 'spoilt-'));
    const spec = toySpec(here, 9);
    const file = writeStoredSet((await buildStoredSet(spec)).set, here);
    spoil(file);
    expect(() => readSetOf(spec, file)).toThrow(message);
  });

  it('lists its committed header and solutions file as the data a definition reads', () => {
    expect(storedSetReads(toySpec('/data', 1))).toEqual(['/data/toy-conic-cubic.json', '/data/toy-conic-cubic.f32']);
  });
});
