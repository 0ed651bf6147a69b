import { describe, expect, it } from 'vitest';
import { AtlasError } from '../../../generators/pipeline/atlas-error.ts';
import { loadDefinitionFile } from '../../../generators/pipeline/load-definition.ts';
import { solveProblem } from '../../../generators/pipeline/solve-problem.ts';
import { solveRecordSchema } from '../../../src/atlas/record.ts';
import { fakeEngine } from './fixtures/fake-engine.ts';
import { TWO_CONICS } from './fixtures/solved-fixture.ts';

describe('solving a definition through an engine', () => {
  it('assembles a schema-valid record with the count ladder, path statistics and figure of each instance', async () => {
    const { record } = await solveProblem(await loadDefinitionFile(TWO_CONICS), fakeEngine());
    expect(solveRecordSchema.safeParse(record).success).toBe(true);
    expect(record.formulation.equationDegrees).toEqual([2, 2]);
    const [generic, demo] = record.instances;
    expect(generic!.counts).toMatchObject({ bezoutBound: 4, trueCount: 4, found: 4, certifiedDistinct: 4, complete: true });
    expect(demo!.counts.complete).toBe(false); // completeness rests on the published count for a generic instance only
    expect(generic!.figure).toBeNull(); // complex parameters: nothing to draw
    expect(demo!.figure!.items.filter((i) => i.layer === 'solution')).toHaveLength(4);
    expect(demo!.parameters.c2).toEqual([9, 0]);
  });

  it('rounds coordinates to 15 and diagnostics to 3 significant digits', async () => {
    const { record } = await solveProblem(await loadDefinitionFile(TWO_CONICS), fakeEngine());
    const s = record.instances[1]!.solutions[0]!;
    expect(s.values[0]![0]).toBe(Number(Math.sqrt(27 / 8).toPrecision(15)));
    expect(record.instances[1]!.paths.stepsMedian).toBe(21.5);
  });

  it('says in a note why found falls short of the true count', async () => {
    const { record } = await solveProblem(await loadDefinitionFile(TWO_CONICS), fakeEngine({ lose: 1 }));
    expect(record.instances[0]!.notes).toContain('found 3 of 4: 1 path failed (1 step-budget)');
  });

  it('replaces every instance seed by --seed', async () => {
    const { record } = await solveProblem(await loadDefinitionFile(TWO_CONICS), fakeEngine(), { seed: 99 });
    expect(record.instances.map((i) => i.seed)).toEqual([99, 99]);
  });

  it('refuses a solver kind no strategy knows, naming the file and field', async () => {
    const loaded = await loadDefinitionFile(TWO_CONICS);
    const odd = { ...loaded, definition: { ...loaded.definition, solver: { kind: 'guesswork' } as never } };
    await expect(solveProblem(odd, fakeEngine())).rejects.toThrow(/two-conics\.ts: solver\.kind: unknown solver "guesswork" \(known: total-degree\)/);
  });

  it('turns an engine failure into a solve error naming the instance', async () => {
    const engine = fakeEngine();
    const broken = { ...engine, strategies: { 'total-degree': { ...engine.strategies['total-degree']!, solve: async () => { throw new RangeError('matrix is singular'); } } } };
    const error = await solveProblem(await loadDefinitionFile(TWO_CONICS), broken).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(AtlasError);
    expect((error as AtlasError).kind).toBe('solve');
    expect((error as AtlasError).message).toMatch(/instance "generic": the engine failed: matrix is singular/);
  });
});
