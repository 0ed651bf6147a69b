import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { fixtureRecord } from './fixture-record.ts';

// The fixture records stand in for real content in site builds; they must be true solutions, not placeholders.
describe('fixture content', () => {
  const record = fixtureRecord('apollonius-circles');
  // Tangency of x² + y² + Dx + Ey + F = 0 to the circle (a, b; r): (aD + bE + F + a² + b² − r²)² = r²(D² + E² − 4F),
  // one quadric per given circle; 8 solutions for general circles (Viète 1600; Drechsler–Sterz 1999).
  it.each(record.instances.map((i) => [i.id, i] as const))('instance %s: 8 distinct solutions satisfy the 3 tangency quadrics', (_, inst) => {
    const p = (k: string) => inst.parameters[k]!;
    const mul = (x: readonly number[], y: readonly number[]) => [x[0]! * y[0]! - x[1]! * y[1]!, x[0]! * y[1]! + x[1]! * y[0]!];
    const add = (...xs: readonly (readonly number[])[]) => [xs.reduce((s, x) => s + x[0]!, 0), xs.reduce((s, x) => s + x[1]!, 0)];
    const neg = (x: readonly number[]) => [-x[0]!, -x[1]!];
    expect(inst.solutions).toHaveLength(8);
    for (const s of inst.solutions) {
      const [D, E, F] = s.values as [[number, number], [number, number], [number, number]];
      for (const i of [1, 2, 3]) {
        const a = p(`a${i}`), b = p(`b${i}`), r = p(`r${i}`);
        const L = add(mul(a, D), mul(b, E), F, mul(a, a), mul(b, b), neg(mul(r, r)));
        const rhs = mul(mul(r, r), add(mul(D, D), mul(E, E), mul([-4, 0], F)));
        const res = add(mul(L, L), neg(rhs));
        const size = Math.max(1, ...[D, E, F].map((v) => Math.hypot(v[0], v[1])));
        expect(Math.hypot(res[0]!, res[1]!) / size ** 2).toBeLessThan(1e-9);
      }
    }
    const keys = new Set(inst.solutions.map((s) => s.values.flat().map((v) => v.toFixed(6)).join(',')));
    expect(keys.size).toBe(8);
  });
  it('marks itself as a fixture', () => {
    expect(record.engineVersion).toMatch(/fixture/);
    expect(readFileSync(new URL('../fixtures/content/problems/apollonius-circles.mdx', import.meta.url), 'utf8')).toMatch(/FIXTURE/);
  });
  // Two conics x²/4 + y² = 1 and x² − y² = 1 meet where x² = 8/5, y² = 3/5 (solved by hand; Bézout: 4 points).
  it('two-conics fixture: 4 real points on both conics', () => {
    const conics = fixtureRecord('two-conics');
    for (const s of conics.instances[0]!.solutions) {
      const [[x], [y]] = s.values as [[number, number], [number, number]];
      expect(x * x / 4 + y * y).toBeCloseTo(1, 10);
      expect(x * x - y * y).toBeCloseTo(1, 10);
    }
  });
});
