import { describe, expect, it } from 'vitest';
import { problems } from '../../../generators/problems/index.ts';
import { validateDefinition } from '../../../src/atlas/validate-definition.ts';
import { mathSegments } from '../../../src/atlas/tex-check.ts';
import { systemOf } from '../../../src/atlas/system-of.ts';
import { parametersOf } from '../../../src/atlas/parameters-of.ts';
import { countSourceSchema } from '../../../src/atlas/source.ts';
import { figureItemSchema } from '../../../src/atlas/figure.ts';
import { sightSchema, spaceItemSchema } from '../../../src/atlas/space-figure.ts';
import { isSpaceDrawing } from '../../../src/atlas/definition.ts';
import { degree, multihomogeneousBound } from '../../../src/engine/index.ts';

// The Bézout bound of each formulation, product of the equation degrees read off the graph. These are our own
// derivations ("[derived]" in REFERENCES.md), recomputed by hand beside each row.
const expectedBezout: Record<string, number> = {
  'circles-tangent-to-three-circles': 8, // three quadrics in (D, E, F)
  'points-common-to-two-conics': 4, // 2 · 2
  'points-common-to-two-cubics': 9, // 3 · 3
  'conics-through-5-points': 1, // chart and five point conditions, all linear
  'conics-through-4-points-tangent-to-1-line': 2, // one tangency quadric
  'conics-through-3-points-tangent-to-2-lines': 4,
  'conics-through-2-points-tangent-to-3-lines': 8,
  'conics-through-1-point-tangent-to-4-lines': 16,
  'conics-tangent-to-5-lines': 32,
  'lines-on-a-cubic-surface': 81, // four cubics in (a, b, c, d)
  'lines-meeting-four-lines': 4, // two equations bilinear in (s, t)
  'flexes-of-a-plane-cubic': 9, // f and its Hessian, both cubics
  'bitangents-of-a-plane-quartic': 1080, // degrees 5, 6, 6, 6 (REFERENCES.md: 1080)
};

// Two-homogeneous bounds of the formulations that declare variable groups (our own derivations; REFERENCES.md
// lists 288 for the bitangents in two groups and 45 for the lines on a cubic surface).
const expectedMultihomogeneous: Record<string, number> = {
  'lines-meeting-four-lines': 2, // bidegree (1, 1) twice
  'lines-on-a-cubic-surface': 45, // bidegrees (3, 0), (2, 1), (1, 2), (0, 3)
  'bitangents-of-a-plane-quartic': 288, // bidegrees (4, 1), (4, 2), (4, 2), (4, 2)
};

describe('the problem registry', () => {
  it('has unique permanent slugs in lowercase-hyphen form', () => {
    const slugs = problems.map((p) => p.slug);
    expect(new Set(slugs).size).toBe(slugs.length);
    for (const s of slugs) expect(s).toMatch(/^[a-z0-9]+(?:-[a-z0-9]+)*$/);
  });

  describe.each(problems.map((p) => [p.slug, p] as const))('%s', (slug, definition) => {
    it('passes the definition validator (schema, names, square system, TeX renders with KaTeX)', () => {
      const check = validateDefinition(definition);
      expect(check.issues).toEqual([]);
    });

    it('keeps MDX-unsafe characters ({, }, <) out of the prose outside math', () => {
      const texts = [definition.title, definition.statement, definition.excessNote, definition.formulation.description, ...definition.instances.flatMap((i) => [i.label, i.description])];
      for (const text of texts) {
        let prose = '';
        let at = 0;
        for (const m of mathSegments(text)) { prose += text.slice(at, m.start); at = m.end; }
        prose += text.slice(at);
        expect(prose).not.toMatch(/[{}<]/);
      }
    });

    it('names its source in the count-source schema', () => {
      expect(countSourceSchema.safeParse(definition.trueCount.source).success).toBe(true);
    });

    it('has a generic instance with a seed and a demo instance with real data', () => {
      expect(definition.instances.some((i) => i.kind === 'generic')).toBe(true);
      const demos = definition.instances.filter((i) => i.kind === 'demo');
      expect(demos.length).toBeGreaterThan(0);
      for (const demo of demos) {
        const p = parametersOf(definition, demo);
        for (let j = 1; j < p.length; j += 2) expect(p[j]).toBe(0);
      }
    });

    it('draws each demo configuration with valid figure items inside a finite window', () => {
      if (!definition.drawing) return;
      for (const demo of definition.instances.filter((i) => i.kind === 'demo')) {
        const p = Object.fromEntries(Object.entries(demo.parameters ?? {}).map(([k, v]) => [k, typeof v === 'number' ? v : v[0]]));
        if (isSpaceDrawing(definition.drawing)) {
          const items = definition.drawing.configuration(p);
          for (const item of items) expect(spaceItemSchema.safeParse(item).success).toBe(true);
          expect(sightSchema.safeParse(definition.drawing.sight(p, items)).success).toBe(true);
          continue;
        }
        const items = definition.drawing.configuration(p);
        for (const item of items) expect(figureItemSchema.safeParse(item).success).toBe(true);
        const w = definition.drawing.window(p, items);
        expect(w.xMax).toBeGreaterThan(w.xMin);
        expect(w.yMax).toBeGreaterThan(w.yMin);
      }
    });
  });
});

// The bounds of the problems listed above (other helpers' problems carry their own checks).
describe.each(Object.entries(expectedBezout))('%s', (slug, bezout) => {
  const definition = problems.find((p) => p.slug === slug);

  it('is in the registry', () => {
    expect(definition).toBeDefined();
  });

  it(`has the Bézout bound ${bezout}, the product of its equations' degrees`, () => {
    const system = systemOf(definition!);
    expect(system.equations.reduce((b, e) => b * degree(e), 1)).toBe(bezout);
  });

  it('has the two-homogeneous bound of its variable groups, if it declares any', () => {
    const system = systemOf(definition!);
    expect(system.groups ? multihomogeneousBound(system) : null).toBe(expectedMultihomogeneous[slug] ?? null);
  });
});
