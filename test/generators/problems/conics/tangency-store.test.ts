import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { buildStoredSet, readSetOf } from '../../../../generators/problems/shared/stored-set.ts';
import { writeStoredSet } from '../../../../generators/problems/shared/stored-set-file.ts';
import { CONIC_LADDER, readCommittedTangencySet, tangencyStoreSpec } from '../../../../generators/problems/conics/tangency-store.ts';

const dir = mkdtempSync(join(tmpdir(), 'conic-start-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('stored generic solution sets of the conic ladder', () => {
  it('are built by monodromy up to the published count: 6 conics through 4 points tangent to 1 conic (Chasles 1864)', async () => {
    const { set, monodromy } = await buildStoredSet(tangencyStoreSpec({ points: 4, conics: 1 }, 11, 6));
    expect(monodromy.stop).toBe('known-count');
    expect(set.solutions).toHaveLength(6);
  });

  it('survive a float32 round trip: reading refines every solution back to double precision', async () => {
    const spec = tangencyStoreSpec({ points: 3, conics: 2 }, 12, 36);
    const { set } = await buildStoredSet(spec);
    const back = readSetOf(spec, writeStoredSet(set, dir));
    expect(back.solutions).toHaveLength(36);
    back.solutions.forEach((x, i) => x.forEach((v, j) => expect(Math.abs(v - set.solutions[i]![j]!)).toBeLessThan(1e-10 * (1 + Math.abs(v)))));
  });

  // Chasles (1864): 6, 36, 184, 816 conics through 4, 3, 2, 1 points tangent to the remaining general conics.
  it.each([4, 3, 2, 1])('are committed for %i points, each holding the published count and polishing to double precision', (points) => {
    const set = readCommittedTangencySet(points);
    expect(set.solutions).toHaveLength(CONIC_LADDER[points]!);
    expect(set.seed).toBe(3264 + points);
  });
});
