import { describe, expect, it } from 'vitest';
import { naiveRunSentence } from '../../../../generators/problems/conics/naive-run-note.ts';
import { NAIVE_FIVE_CONICS_RUN } from '../../../../generators/problems/conics/naive-run-figures.ts';

describe('the naive-run sentence of a conic page', () => {
  it('states the recorded figures of the five-conic run', () => {
    const sentence = naiveRunSentence('conics-tangent-to-5-conics');
    // 7776 = 6⁵ paths (Steiner 1848); 3264 genuine conics (Chasles 1864); the rest (4512 here) on the double lines.
    expect(sentence).toContain('3264 of the 7776 paths ended at 3264 distinct genuine conics and 4512 on the excess set (4512 of them checked to be double lines); 0 failed.');
    expect(sentence).toContain('homotopy seed 1, engine 0.2.0');
  });

  it('mentions paths elsewhere only when there are some, with those at infinity named', () => {
    const figures = { ...NAIVE_FIVE_CONICS_RUN, slug: 'other', atInfinityPaths: 3, singularPaths: 2 };
    expect(naiveRunSentence('other', [figures])).toContain(', 5 elsewhere (3 at infinity of the chart); 0 failed.');
  });

  it('is empty for a page without measured figures', () => {
    expect(naiveRunSentence('conics-through-1-point-tangent-to-4-conics')).toBe('');
  });
});
