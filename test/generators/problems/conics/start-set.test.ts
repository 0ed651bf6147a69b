import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { buildStartSet, readStartSet, writeStartSet } from '../../../../generators/problems/conics/start-set.ts';

const dir = mkdtempSync(join(tmpdir(), 'conic-start-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('stored generic solution sets', () => {
  it('are built by monodromy up to the published count: 6 conics through 4 points tangent to 1 conic (Chasles 1864)', async () => {
    const { set, monodromy } = await buildStartSet({ points: 4, conics: 1 }, 11, 6);
    expect(monodromy.stop).toBe('known-count');
    expect(set.solutions).toHaveLength(6);
  });

  it('survive a float32 round trip: reading refines every solution back to double precision', async () => {
    const { set } = await buildStartSet({ points: 3, conics: 2 }, 12, 36);
    const file = writeStartSet(set, dir);
    const back = readStartSet(file);
    expect(back.solutions).toHaveLength(36);
    back.solutions.forEach((x, i) => x.forEach((v, j) => expect(Math.abs(v - set.solutions[i]![j]!)).toBeLessThan(1e-10 * (1 + Math.abs(v)))));
  });

  it('name the file and the fault when the solutions file is cut short', async () => {
    const { set } = await buildStartSet({ points: 4, conics: 1 }, 13, 6);
    const file = writeStartSet(set, dir);
    writeFileSync(file.replace(/\.json$/, '.f32'), new Uint8Array(8));
    expect(() => readStartSet(file)).toThrow(/start-4-points-1-conics\.json: start-4-points-1-conics\.f32 holds 8 bytes/);
  });
});
