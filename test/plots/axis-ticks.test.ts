import { describe, expect, it } from 'vitest';
import { scaleLinear } from 'd3-scale';
import { axisTicks, gridSvg, TICK_INSET } from '../../src/plots/axis-ticks.ts';

// Tick placement is d3-scale's (ticks(6)); the inset is our own convention (common practice, no source).
describe('axisTicks', () => {
  const x = scaleLinear().domain([-2, 2]).range([0, 400]), y = scaleLinear().domain([-1, 1]).range([200, 0]);
  it('keeps ticks at least TICK_INSET px inside the frame', () => {
    const { xTicks, yTicks } = axisTicks(x, y, 400, 200);
    expect(xTicks.map((t) => t.value)).toEqual([-1.5, -1, -0.5, 0, 0.5, 1, 1.5]);
    for (const t of [...xTicks, ...yTicks]) expect(t.at).toBeGreaterThan(TICK_INSET);
  });
  it('labels a zoomed view with its own values (10× around the origin)', () => {
    const { xTicks } = axisTicks(x.copy().domain([-0.2, 0.2]), y, 400, 200);
    expect(xTicks.map((t) => t.value)).toEqual([-0.15, -0.1, -0.05, 0, 0.05, 0.1, 0.15]);
  });
});

describe('gridSvg', () => {
  it('draws a line per tick (the zero line classed axis) and a label per tick', () => {
    const { grid, ticks } = gridSvg(400, 200, [{ at: 200, value: 0 }, { at: 300, value: 1 }], [{ at: 100, value: -0.5 }]);
    expect(grid).toBe('<line x1="200" x2="200" y1="0" y2="200" class="axis"/><line x1="300" x2="300" y1="0" y2="200"/><line y1="100" y2="100" x1="0" x2="400"/>');
    expect(ticks).toBe('<text x="200" y="195" text-anchor="middle">0</text><text x="300" y="195" text-anchor="middle">1</text><text x="5" y="104">−0.5</text>');
  });
});
