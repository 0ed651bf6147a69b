import type { NaiveRunFigures } from '../problems/conics/naive-run-figures.ts';

/** Every field of the recorded figures whose measured value differs, as "field: recorded → measured", in field order. */
export function naiveRunDifferences(recorded: NaiveRunFigures, measured: NaiveRunFigures): string[] {
  return (Object.keys(recorded) as (keyof NaiveRunFigures)[])
    .filter((key) => recorded[key] !== measured[key])
    .map((key) => `${key}: ${String(recorded[key])} → ${String(measured[key])}`);
}
