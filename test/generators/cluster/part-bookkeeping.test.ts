import { describe, expect, it } from 'vitest';
import { batchesDone, batchesMissing, failedAttempts, listOfBatches, partsProgressLine } from '../../../generators/cluster/part-bookkeeping.ts';

// Bookkeeping of file names; common practice, no source.
describe('part bookkeeping', () => {
  it.each([
    ['an empty folder', [], 4, []],
    ['parts in any order', ['part-3.json', 'part-1.json'], 4, [1, 3]],
    ['ignores temporary files of atomic writes, strangers and out-of-range batches', ['.part-2.json.77-0.tmp', 'notes.txt', 'part-0.json', 'part-5.json', 'part-02.json', 'part-4.json'], 4, [4]],
  ])('batchesDone: %s', (_name, names, count, expected) => {
    expect(batchesDone(names, count)).toEqual(expected);
  });

  it.each([
    [[], 3, [1, 2, 3]],
    [[1, 3], 3, [2]],
    [[1, 2, 3], 3, []],
  ])('batchesMissing(%j, %i) = %j', (done, count, expected) => {
    expect(batchesMissing(done, count)).toEqual(expected);
  });

  it('failedAttempts reads the markers by batch then attempt', () => {
    expect(failedAttempts(['batch-3-attempt-1.failed', 'batch-1-attempt-2.failed', 'batch-1-attempt-1.failed', 'readme'])).toEqual([
      { batch: 1, attempt: 1 }, { batch: 1, attempt: 2 }, { batch: 3, attempt: 1 },
    ]);
  });

  it.each([
    [[], ''],
    [[2], '2'],
    [[2, 5], '2 and 5'],
    [[1, 4, 9], '1, 4 and 9'],
  ])('listOfBatches(%j) = %j', (batches, text) => {
    expect(listOfBatches(batches)).toBe(text);
  });

  it.each([
    [0, 8, 'p: 0/8 parts written (0%)'],
    [3, 8, 'p: 3/8 parts written (37%)'],
    [8, 8, 'p: 8/8 parts written (100%)'],
  ])('partsProgressLine(%i, %i)', (done, count, line) => {
    expect(partsProgressLine('p', done, count)).toBe(line);
  });
});
