import { describe, expect, it } from 'vitest';
import { CURVE_TOLERANCE, figureScene, MARGIN, POINT_RADIUS, simplify } from '../../src/plots/figure-scene.ts';
import { cubicAt, type Cubic } from '../../src/plots/cubic-fit.ts';
import type { Figure } from '../../src/atlas/figure.ts';
import { fixtureRecord } from '../site/fixture-record.ts';

const W = { xMin: -2, xMax: 2, yMin: -1, yMax: 1 };

describe('figureScene', () => {
  // Apollonius: 8 circles tangent to three general circles (Viète 1600; Drechsler–Sterz 1999), all real in the demo.
  it('lays out the Apollonius fixture as 3 given and 8 solution circles, each solution numbered', () => {
    const demo = fixtureRecord('apollonius-circles').instances.find((i) => i.kind === 'demo')!;
    const scene = figureScene(demo.figure! as Figure, 640);
    const layer = (n: string) => scene.layers.find((l) => l.name === n)!.items;
    expect(scene.layers.map((l) => l.name)).toEqual(['given', 'solution', 'tangency']);
    expect(layer('given').filter((i) => i.tag === 'circle')).toHaveLength(3);
    expect(layer('solution').map((i) => i.solution)).toEqual([0, 1, 2, 3, 4, 5, 6, 7]);
    expect(layer('tangency')).toHaveLength(24);
  });

  it('maps circles to screen centre and radius, rounded to 0.01 px', () => {
    const fig: Figure = { window: W, items: [{ shape: 'circle', cx: 1, cy: 0.5, r: 0.5, layer: 'given' }] };
    const item = figureScene(fig, 400).layers[0]!.items[0]!;
    expect(item.attrs).toEqual({ cx: 300, cy: 50, r: 50 });
  });

  it('draws a point as a small circle of fixed screen radius', () => {
    const fig: Figure = { window: W, items: [{ shape: 'point', x: 0, y: 0, layer: 'solution', solution: 2 }] };
    const item = figureScene(fig, 400).layers[0]!.items[0]!;
    expect(item).toMatchObject({ tag: 'circle', kind: 'point', solution: 2, attrs: { cx: 200, cy: 100, r: POINT_RADIUS } });
  });

  it('clips a line to the window grown by MARGIN on each side, and keeps an empty path for a line that misses it', () => {
    expect(MARGIN).toBe(0.5);
    const fig: Figure = { window: W, items: [
      { shape: 'line', a: 0, b: 1, c: 0, layer: 'construction' },
      { shape: 'line', a: 0, b: 1, c: -5, layer: 'construction' },
    ] };
    const [inside, outside] = figureScene(fig, 400).layers[0]!.items;
    expect(['M-200,100L600,100', 'M600,100L-200,100']).toContain(inside!.attrs.d);
    expect(outside!.attrs.d).toBe('');
  });

  it('draws a polyline as a path with 2-decimal coordinates', () => {
    const fig: Figure = { window: W, items: [{ shape: 'polyline', points: [[-1, 0], [0, 0.5], [1, 0]], closed: false, layer: 'solution' }] };
    expect(figureScene(fig, 400).layers[0]!.items[0]!.attrs.d).toBe('M100,100L200,50L300,100');
  });

  it('draws an ellipse wholly inside as one closed run of a few cubic Béziers within the tolerance', () => {
    // x² + 4y² = 1 in the window [−2, 2] × [−1, 1] at 400 px: centre (200, 100), semi-axes 100 and 50 px.
    const fig: Figure = { window: W, items: [{ shape: 'conic', coefficients: [1, 0, 4, 0, 0, -1], layer: 'given' }] };
    const d = String(figureScene(fig, 400).layers[0]!.items[0]!.attrs.d);
    expect(d).toMatch(/^M[\d.]+,[\d.]+(C[-\d.]+,[-\d.]+,[-\d.]+,[-\d.]+,[-\d.]+,[-\d.]+)+Z$/);
    expect(d).not.toMatch(/\.\d{3}/);
    const numbers = d.slice(1, -1).split(/[C,]/).map(Number);
    const start: readonly [number, number] = [numbers[0]!, numbers[1]!];
    const cubics: Cubic[] = [];
    for (let k = 2, p = start; k < numbers.length; k += 6) {
      const c: Cubic = [p, [numbers[k]!, numbers[k + 1]!], [numbers[k + 2]!, numbers[k + 3]!], [numbers[k + 4]!, numbers[k + 5]!]];
      cubics.push(c);
      p = c[3];
    }
    expect(cubics.length).toBeLessThanOrEqual(16);
    // Distance to the ellipse ((x − 200)/100)² + ((y − 100)/50)² = 1, to first order: |F| / |∇F|; rounding adds ≤ 0.01 px.
    for (const c of cubics) for (let k = 0; k <= 16; k++) {
      const [x, y] = cubicAt(c, k / 16), u = (x - 200) / 100, v = (y - 100) / 50;
      const distance = Math.abs(u * u + v * v - 1) / Math.hypot((2 * u) / 100, (2 * v) / 50);
      expect(distance).toBeLessThan(CURVE_TOLERANCE + 0.01);
    }
  });

  it('gives ticks at least 12 px inside the frame, so their labels are not cut', () => {
    const scene = figureScene({ window: W, items: [] }, 400);
    expect(scene.xTicks.map((t) => t.value)).toContain(0);
    expect(scene.xTicks.map((t) => t.value)).not.toContain(-2);
    for (const t of scene.xTicks) expect(t.at > 12 && t.at < 388).toBe(true);
    for (const t of scene.yTicks) expect(t.at > 12 && t.at < 188).toBe(true);
  });
});

describe('figureScene on large figures', () => {
  const many = (n: number): Figure => ({ window: W, items: [
    { shape: 'circle', cx: 0, cy: 0, r: 0.5, layer: 'given' },
    ...Array.from({ length: n }, (_, k) => ({ shape: 'conic' as const, coefficients: [1, 0, 4, 0, 0, -(k + 1) / n] as [number, number, number, number, number, number], layer: 'solution', solution: k })),
  ] });
  it('draws only the first maxSolutions solutions and reports the rest', () => {
    const scene = figureScene(many(30), 400, 10);
    expect(scene.drawnSolutions).toBe(10);
    expect(scene.omittedSolutions).toBe(20);
    expect(scene.layers.find((l) => l.name === 'solution')!.items.map((i) => i.solution)).toEqual([0, 1, 2, 3, 4, 5, 6, 7, 8, 9]);
    expect(scene.layers.find((l) => l.name === 'given')!.items).toHaveLength(1);
  });
  it('keeps 200 drawn ellipses small: under 700 bytes of path each (each was about 6 KB as polylines)', () => {
    const scene = figureScene(many(200), 400);
    const bytes = scene.layers.flatMap((l) => l.items).reduce((s, i) => s + String(i.attrs.d ?? '').length, 0);
    expect(scene.omittedSolutions).toBe(0);
    expect(bytes).toBeLessThan(200 * 700);
  });
});

describe('simplify', () => {
  it('drops points on the line between their neighbours but keeps both ends', () => {
    expect(simplify([[0, 0], [0.1, 0], [0.2, 0], [1, 0], [1.1, 0]], 0.05)).toEqual([[0, 0], [1.1, 0]]);
  });
  it('keeps a corner farther than the tolerance and drops a wiggle within it', () => {
    expect(simplify([[0, 0], [1, 0.01], [2, 0], [3, 1], [4, 0]], 0.05)).toEqual([[0, 0], [2, 0], [3, 1], [4, 0]]);
  });
  it('leaves two-point runs alone', () => expect(simplify([[0, 0], [0, 0.1]], 0.5)).toEqual([[0, 0], [0, 0.1]]));
});
