import { describe, expect, it } from 'vitest';
import { DEFAULT_VIEW, pageCount, pageList, pageOfPosition, pageRows, viewRows, type RowView } from '../../../src/site/table/row-order.ts';
import type { SolutionRow } from '../../../src/site/table/solution-rows.ts';

// Table conventions are our own (common practice, no source): real solutions first, stable ties by record index.
const row = (index: number, o: Partial<SolutionRow> = {}): SolutionRow => ({
  index, values: [[index, 0]], residual: 1e-15, condition: 10, real: false, certified: true, certifiedReal: false, ...o,
});
const rows: SolutionRow[] = [
  row(0),
  row(1, { real: true, certifiedReal: true, values: [[5, 0]], residual: 3e-16 }),
  row(2, { real: true, values: [[-1, 0]], condition: null }),
  row(3, { certified: false, values: [[2, -1]], residual: 1e-9, condition: 1e8 }),
  row(4, { real: true, certifiedReal: true, values: [[2, 0]] }),
];
const order = (view: RowView) => viewRows(rows, view).map((r) => r.index);

describe('viewRows', () => {
  it('opens with proven-real solutions, then real ones, then the rest, each by record index', () => {
    expect(order(DEFAULT_VIEW)).toEqual([1, 4, 2, 0, 3]);
  });
  it.each([
    ['real only', { filter: 'real', key: 'index', descending: false }, [1, 2, 4]],
    ['certified only', { filter: 'certified', key: 'index', descending: false }, [0, 1, 2, 4]],
    ['by residual, smallest first', { filter: 'all', key: 'residual', descending: false }, [1, 0, 2, 4, 3]],
    ['by condition, a singular Jacobian last', { filter: 'all', key: 'condition', descending: false }, [0, 1, 4, 3, 2]],
    ['by condition descending, the singular one first', { filter: 'all', key: 'condition', descending: true }, [2, 3, 0, 1, 4]],
    ['by a coordinate, real part then imaginary part', { filter: 'all', key: 'value-0', descending: false }, [2, 0, 3, 4, 1]],
    ['by index descending', { filter: 'all', key: 'index', descending: true }, [0, 1, 2, 3, 4]],
  ] as const)('%s', (_, view, want) => expect(order(view as RowView)).toEqual(want));
  it('returns a new array and leaves the input alone', () => {
    const copy = [...rows];
    expect(viewRows(rows, DEFAULT_VIEW)).not.toBe(rows);
    expect(rows).toEqual(copy);
  });
});

describe('paging', () => {
  it.each([[0, 1], [1, 1], [100, 1], [101, 2], [3264, 33]])('%d rows need %d pages of 100', (n, pages) => expect(pageCount(n)).toBe(pages));
  it.each([[0, 1], [99, 1], [100, 2], [3263, 33]])('the row at position %d is on page %d', (p, page) => expect(pageOfPosition(p)).toBe(page));
  it('slices a page', () => expect(pageRows([1, 2, 3, 4, 5], 2, 2)).toEqual([3, 4]));
  it.each([
    [1, 1, [1]],
    [1, 33, [1, 2, 'gap', 33]],
    [5, 33, [1, 'gap', 4, 5, 6, 'gap', 33]],
    [33, 33, [1, 'gap', 32, 33]],
    [2, 3, [1, 2, 3]],
  ] as const)('page %d of %d lists %j', (page, pages, want) => expect(pageList(page, pages)).toEqual(want));
});
