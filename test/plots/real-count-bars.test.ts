import { describe, expect, it } from 'vitest';
import { realCountBars } from '../../src/plots/real-count-bars.ts';

describe('real-count histogram layout', () => {
  const { bars, band, x } = realCountBars([{ real: 3, samples: 10 }, { real: 7, samples: 2 }, { real: 15, samples: 1 }], 27, 560, 120);
  it('gives the tallest bar the full height and the others in proportion', () => {
    expect(bars[0]!.height).toBeCloseTo(120, 9);
    expect(bars[1]!.height).toBeCloseTo(24, 9);
    expect(bars[2]!.height).toBeCloseTo(12, 9);
  });
  it('keeps one band for every count from 0 to the degree, in order', () => {
    expect(band).toBeGreaterThan(0);
    expect(x(0)).toBeLessThan(x(27));
    expect(bars[1]!.x).toBeGreaterThan(bars[0]!.x);
    expect(x(27) + band / 2).toBeLessThanOrEqual(560 + 1e-9);
  });
});
