import { describe, expect, it } from 'vitest';
import { boundsChart, decadeLabel } from '../../src/plots/bounds-chart.ts';

// Counts from /work/shared/REFERENCES.md: Apollonius 8 of Bézout 8 (Viète 1600; Drechsler–Sterz 1999);
// conics tangent to five conics 3264 of Bézout 7776 (Chasles 1864; Fulton, Intersection Theory 1984).
const rows = [
  { slug: 'apollonius', title: 'Circles tangent to three circles', href: '/problems/apollonius/', bezout: 8, trueCount: 8 },
  { slug: 'five-conics', title: 'Conics tangent to five conics', href: '/problems/five-conics/', bezout: 7776, trueCount: 3264 },
  { slug: 'open', title: 'An open count', href: '/problems/open/', bezout: 16, trueCount: null },
];

describe('boundsChart', () => {
  const chart = boundsChart(rows);
  it('keeps one row per problem in input order', () => {
    expect(chart.rows.map((r) => r.slug)).toEqual(['apollonius', 'five-conics', 'open']);
  });
  it('puts an exact bound and its true count at the same x', () => {
    expect(chart.rows[0]!.xTrue).toBe(chart.rows[0]!.xBezout);
  });
  it('places counts on a log scale: 3264 sits left of 7776 by log10(7776/3264) of a decade', () => {
    const decade = chart.ticks[1]!.x - chart.ticks[0]!.x;
    const r = chart.rows[1]!;
    expect((r.xBezout - r.xTrue!) / decade).toBeCloseTo(Math.log10(7776 / 3264), 2);
  });
  it('runs the axis from 1 to the next decade above the largest bound', () => {
    expect(chart.ticks.map((t) => t.value)).toEqual([1, 10, 100, 1000, 10000]);
    expect(chart.ticks.map((t) => t.x)).toEqual([0, 0.25, 0.5, 0.75, 1]);
  });
  it('leaves an unknown true count undrawn', () => {
    expect(chart.rows[2]!.xTrue).toBeNull();
  });
  it('rejects a bound below 1, naming the problem', () => {
    expect(() => boundsChart([{ ...rows[0]!, bezout: 0 }])).toThrow(/apollonius/);
  });
});

describe('decadeLabel', () => {
  it.each([[1, '1'], [10, '10'], [100, '10²'], [1e12, '10¹²']])('labels %d as %s', (v, label) => {
    expect(decadeLabel(v)).toBe(label);
  });
});
