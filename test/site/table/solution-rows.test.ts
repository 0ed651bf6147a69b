import { describe, expect, it } from 'vitest';
import { packRows, solutionRows, unpackRows } from '../../../src/site/table/solution-rows.ts';
import { columnHeads, realText, rowCells } from '../../../src/site/table/solution-cells.ts';
import { fixtureRecord } from '../fixture-record.ts';

describe('solution rows', () => {
  // Apollonius fixture: 8 circles tangent to three circles (Viète 1600; Drechsler–Sterz 1999), all real in the demo.
  const demo = fixtureRecord('apollonius-circles').instances.find((i) => i.kind === 'demo')!;
  const rows = solutionRows(demo.solutions);

  it('keep each solution with its record index', () => {
    expect(rows.map((r) => r.index)).toEqual([0, 1, 2, 3, 4, 5, 6, 7]);
    expect(rows[3]!.values).toEqual(demo.solutions[3]!.values);
  });
  it('survive packing to compact JSON and back, bit for bit', () => {
    const back = unpackRows(JSON.parse(JSON.stringify(packRows(rows))), 3);
    expect(back).toEqual(rows);
  });
  it('refuse a packed row of the wrong length, naming it', () => {
    expect(() => unpackRows([[0, true, true, true, 1e-16, 1]], 3)).toThrow(/row 0: 6 fields, expected 12/);
  });
});

describe('row cells', () => {
  const row = { index: 4, values: [[1.5, -0.25], [2, 0]] as [number, number][], residual: 5.07e-16, condition: null, real: false, certified: true, certifiedReal: false };
  it('put the columns that matter first: #, real, certified, residual, condition, then the coordinates', () => {
    expect(rowCells(row).map((c) => c.parts)).toEqual([['5'], ['no'], ['yes'], ['5.1e−16'], ['∞ (singular)'], ['1.5', '− 0.25i'], ['2']]);
    expect(columnHeads(['x', 'y']).map((h) => h.label)).toEqual(['#', 'Real?', 'Certified?', 'Residual', 'Condition', 'x', 'y']);
  });
  it.each([
    [{ real: true, certifiedReal: true }, 'yes (proven)'],
    [{ real: true, certifiedReal: false }, 'yes'],
    [{ real: false, certifiedReal: false }, 'no'],
  ])('reads %j as %s', (flags, want) => expect(realText({ ...row, ...flags })).toBe(want));
});
