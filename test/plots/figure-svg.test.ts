import { describe, expect, it } from 'vitest';
import { figureScene } from '../../src/plots/figure-scene.ts';
import { figureSvg } from '../../src/plots/figure-svg.ts';
import { standaloneFigureCss } from '../../src/site/figure-export-css.ts';
import { fixtureRecord } from '../site/fixture-record.ts';
import type { Figure } from '../../src/atlas/figure.ts';
import { readFileSync } from 'node:fs';

const css = (name: string) => readFileSync(new URL(`../../src/styles/${name}`, import.meta.url), 'utf8');

describe('figureSvg', () => {
  // Apollonius fixture: 8 circles tangent to three circles (Viète 1600; Drechsler–Sterz 1999), all real in the demo.
  const figure = fixtureRecord('apollonius-circles').instances.find((i) => i.kind === 'demo')!.figure! as Figure;
  const scene = figureScene(figure, 640);

  it('writes one item per scene item, each with its layer, solution and title, inside the viewport', () => {
    const svg = figureSvg(scene, { id: 'f', window: figure.window, labelledBy: 'f-caption' });
    expect(svg.match(/data-layer="solution"/g)).toHaveLength(8);
    expect(svg).toContain('data-solution="7"');
    expect(svg).toContain('<title>Solutions: solution 1</title>');
    expect(svg).toMatch(/^<svg [^>]*role="img" aria-labelledby="f-caption"/);
    expect(svg.indexOf('class="viewport"')).toBeLessThan(svg.indexOf('data-layer="given"'));
  });
  it('is deterministic', () => {
    expect(figureSvg(scene, { id: 'f', window: figure.window })).toBe(figureSvg(figureScene(figure, 640), { id: 'f', window: figure.window }));
  });
  it('stands alone with a title, a size and its own styles when asked', () => {
    const svg = figureSvg(scene, { id: 'x', window: figure.window, standalone: { title: 'Three ponds & a park', css: standaloneFigureCss(css('tokens.css'), css('figure.css')) } });
    expect(svg).toMatch(/width="640" height="\d+"/);
    expect(svg).toContain('<title>Three ponds &amp; a park</title>');
    expect(svg).toMatch(/<style>svg \{ --paper: #[0-9a-f]{6};.*\.figure-svg \.layer-solution \{ color: var\(--mark\); \}/);
  });
});

describe('standaloneFigureCss', () => {
  it('refuses tokens without a :root block', () => expect(() => standaloneFigureCss('body {}', '')).toThrow(/no :root block/));
  it('keeps the light palette only (the dark one is a media query) and drops comments', () => {
    const out = standaloneFigureCss(css('tokens.css'), css('figure.css'));
    expect(out).not.toMatch(/prefers-color-scheme|\/\*/);
    expect(out.match(/--surface:/g)).toHaveLength(1);
  });
});
