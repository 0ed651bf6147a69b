// Shared by the build and the browser: the text of each cell of a solutions-table row.
import { complexParts, formatCondition, formatResidual } from '../format.ts';
import type { SolutionRow } from './solution-rows.ts';

/** One cell: its text parts (a complex value's real and imaginary parts may wrap between parts) and its class. */
export interface Cell { readonly parts: readonly string[]; readonly className: 'n' | 'num' | 'flag' }

/** The realness cell: "yes (proven)" when a certified box proves it real, "yes", or "no". */
export function realText(row: SolutionRow): string {
  return row.real ? (row.certifiedReal ? 'yes (proven)' : 'yes') : 'no';
}

/** The cells of a row in column order: #, real, certified, residual, condition, then one per coordinate. */
export function rowCells(row: SolutionRow): Cell[] {
  return [
    { parts: [String(row.index + 1)], className: 'n' },
    { parts: [realText(row)], className: 'flag' },
    { parts: [row.certified ? 'yes' : 'no'], className: 'flag' },
    { parts: [formatResidual(row.residual)], className: 'n' },
    { parts: [formatCondition(row.condition)], className: 'n' },
    ...row.values.map((v): Cell => ({ parts: complexParts(v), className: 'num' })),
  ];
}

/** The column headings, in the order of rowCells, with the sort key each column sorts by. */
export function columnHeads(coordinates: readonly string[]): { readonly label: string; readonly key: string; readonly numeric: boolean }[] {
  return [
    { label: '#', key: 'index', numeric: true },
    { label: 'Real?', key: 'real', numeric: false },
    { label: 'Certified?', key: 'certified', numeric: false },
    { label: 'Residual', key: 'residual', numeric: true },
    { label: 'Condition', key: 'condition', numeric: true },
    ...coordinates.map((c, j) => ({ label: c, key: `value-${j}`, numeric: true })),
  ];
}
