import { describe, expect, it } from 'vitest';
import { canonicalJson } from '../../../src/atlas/canonical-json.ts';
import { loadDefinitionFile } from '../../../generators/pipeline/load-definition.ts';
import { mergeParts } from '../../../generators/pipeline/merge-parts.ts';
import { partSchema, type SolvePart } from '../../../generators/pipeline/part-file.ts';
import { solveShard } from '../../../generators/pipeline/solve-shard.ts';
import { solveProblem } from '../../../generators/pipeline/solve-problem.ts';
import { fakeEngine } from './fixtures/fake-engine.ts';
import { TWO_CONICS } from './fixtures/solved-fixture.ts';

/** The parts of a solve split into `count` batches, written to JSON and read back as a merging machine would. */
async function parts(count: number, engine = fakeEngine()): Promise<SolvePart[]> {
  const loaded = await loadDefinitionFile(TWO_CONICS);
  const out: SolvePart[] = [];
  for (let index = 0; index < count; index++) {
    const file = canonicalJson(await solveShard(loaded, TWO_CONICS, engine, { index, count }));
    out.push(partSchema.parse(JSON.parse(file)));
  }
  return out;
}

describe('sharded solves', () => {
  it.each([1, 2, 3, 4])('merged from %i parts in any order give the record of a single run', async (count) => {
    const loaded = await loadDefinitionFile(TWO_CONICS);
    const single = await solveProblem(loaded, fakeEngine());
    const merged = await mergeParts(loaded, fakeEngine(), (await parts(count)).reverse());
    expect(canonicalJson(merged.record)).toBe(canonicalJson(single.record));
  });

  it.each([
    ['a missing batch', async () => (await parts(3)).slice(0, 2), /2 parts given, but the solve was split into 3/],
    ['a batch given twice', async () => { const p = await parts(2); return [p[0]!, p[0]!]; }, /batch 2 of 2 \(missing or given twice\)/],
    ['a part from another engine', async () => { const p = await parts(2); return [p[0]!, { ...p[1]!, engineVersion: 'other' }]; }, /does not match on engine version/],
    ['a part of an edited definition', async () => { const p = await parts(2); return [p[0]!, { ...p[1]!, definitionHash: 'f'.repeat(64) }]; }, /definition hash/],
  ])('refuses %s', async (_name, make, message) => {
    const loaded = await loadDefinitionFile(TWO_CONICS);
    await expect(mergeParts(loaded, fakeEngine(), await make())).rejects.toThrow(message);
  });
});
