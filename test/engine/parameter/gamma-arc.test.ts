import { describe, expect, it } from 'vitest';
import { gammaArc } from '../../../src/engine/parameter/gamma-arc.ts';
import { reverseLeg, routeThrough } from '../../../src/engine/parameter/route.ts';
import { createRandom } from '../../../src/engine/random.ts';

const tau = (t: number, g: readonly [number, number]): Float64Array => {
  const out = new Float64Array(4);
  gammaArc(t, 0, g[0], g[1], out);
  return out;
};

describe('the gamma arc τ(t) = t / (γ(1 − t) + t) (Morgan 1987; Sommese–Wampler 2005)', () => {
  const g = [0.28, -0.96] as const;
  it('runs from 0 at t = 0 to 1 at t = 1', () => {
    expect(Array.from(tau(0, g).subarray(0, 2))).toEqual([0, 0]);
    const end = tau(1, g);
    expect(end[0]).toBeCloseTo(1, 15);
    expect(end[1]).toBeCloseTo(0, 15);
  });
  it('leaves the real segment strictly inside (0, 1) for non-real γ', () => {
    for (const t of [0.1, 0.5, 0.9]) expect(Math.abs(tau(t, g)[1]!)).toBeGreaterThan(1e-3);
  });
  it('has the derivative γ / (γ(1 − t) + t)² (central differences)', () => {
    const h = 1e-6, t = 0.3, d = tau(t, g);
    expect((tau(t + h, g)[0]! - tau(t - h, g)[0]!) / (2 * h)).toBeCloseTo(d[2]!, 6);
    expect((tau(t + h, g)[1]! - tau(t - h, g)[1]!) / (2 * h)).toBeCloseTo(d[3]!, 6);
  });
  it('is traced backwards by the reversed leg: 1 − τ(t) = τ′(1 − t) with γ′ = 1/γ', () => {
    const leg = reverseLeg({ from: new Float64Array(2), to: new Float64Array(2), gamma: g });
    for (const t of [0.2, 0.7]) {
      const forward = tau(t, g), backward = tau(1 - t, leg.gamma);
      expect(1 - forward[0]!).toBeCloseTo(backward[0]!, 14);
      expect(-forward[1]!).toBeCloseTo(backward[1]!, 14);
    }
  });
});

describe('parameter routes', () => {
  it('detour through a random complex point: two legs that meet there', () => {
    const from = new Float64Array([1, 0, 2, 0]), to = new Float64Array([3, 0, -1, 0]);
    const legs = routeThrough(from, to, createRandom(1));
    expect(legs).toHaveLength(2);
    expect(legs[0]!.from).toBe(from);
    expect(legs[1]!.to).toBe(to);
    expect(legs[0]!.to).toBe(legs[1]!.from);
    expect(Math.abs(legs[0]!.to[1]!)).toBeGreaterThan(0);
  });
  it('rejects parameter vectors of different lengths', () => {
    expect(() => routeThrough(new Float64Array(4), new Float64Array(6), createRandom(1))).toThrow(/lengths 4 and 6/);
  });
});
