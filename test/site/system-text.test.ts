import { describe, expect, it } from 'vitest';
import { instanceEquations, systemText } from '../../src/site/system-text.ts';
import { fixtureRecord } from './fixture-record.ts';

describe('systemText', () => {
  // Two conics meet in 4 points (Bézout); the fixture's demo is x² + y² = 4 and x² + 9y² = 9 (our own numbers).
  const record = fixtureRecord('two-conics');
  const systems = {
    slug: record.slug, unknowns: ['x', 'y'],
    instances: record.instances.map((i) => ({ id: i.id, parameters: { a1: [1, 0] as [number, number], b1: [0.5, -2] as [number, number] }, equations: ['x^2 + y^2 - 4', 'x^2 + 9*y^2 - 9'] })),
  };
  const text = systemText(record, systems, 'https://atlas.example/problems/two-conics/', 3);
  it('starts with comment lines naming the page, the notation and the unknowns', () => {
    const lines = text.split('\n');
    expect(lines[0]).toBe(`# Enumerative Atlas: ${record.title}`);
    expect(lines[1]).toBe(`# https://atlas.example/problems/two-conics/ · record version 3 · engine ${record.engineVersion}`);
    expect(text).toContain('# Unknowns: x, y\n');
  });
  it('gives each instance its parameters and one polynomial per line, every other line a comment', () => {
    expect(text).toContain('# Parameters substituted: a1 = 1, b1 = 0.5 - 2*I\nx^2 + y^2 - 4\nx^2 + 9*y^2 - 9\n');
    const polynomials = text.split('\n').filter((l) => l && !l.startsWith('#'));
    expect(polynomials).toHaveLength(2 * record.instances.length);
  });
  it('refuses a systems file without one of the record\'s instances', () => {
    expect(() => systemText(record, { ...systems, instances: [] }, 'u', 1)).toThrow(/has no instance/);
  });
  it('gives one instance\'s equations alone', () => {
    expect(instanceEquations(systems, record.instances[0]!.id)).toBe('x^2 + y^2 - 4\nx^2 + 9*y^2 - 9\n');
    expect(instanceEquations(systems, 'nope')).toBeNull();
  });
});
