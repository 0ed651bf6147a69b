import type { APIRoute } from 'astro';
import { atlasEntries, type AtlasEntry } from '../../../site/atlas-entries.ts';
import type { InstanceResult } from '../../../atlas/record.ts';
import { figureScene } from '../../../plots/figure-scene.ts';
import { figureSvg } from '../../../plots/figure-svg.ts';
import { spacePayload } from '../../../plots/space-payload.ts';
import { spaceSvg } from '../../../plots/space-svg.ts';
import { sightWords } from '../../../plots/sight-words.ts';
import { isSpaceFigure } from '../../../atlas/space-figure.ts';
import { standaloneFigureCss } from '../../../site/figure-export-css.ts';
import tokens from '../../../styles/tokens.css?raw';
import figureRules from '../../../styles/figure.css?raw';

/** /problems/<slug>/figure-<instance>.svg: the figure as first drawn on the page (a space figure in its static sight), in one file with its own styles (for slides). */
export async function getStaticPaths() {
  return (await atlasEntries()).flatMap((entry) => entry.record.instances.filter((i) => i.figure).map((instance) => ({
    params: { slug: entry.record.slug, instance: instance.id }, props: { entry, instance },
  })));
}

export const GET: APIRoute = ({ props }) => {
  const { entry, instance } = props as { entry: AtlasEntry; instance: InstanceResult };
  const figure = instance.figure!;
  const title = `${entry.record.title}: ${instance.label}${figure.projection ? `. ${figure.projection}` : ''}`;
  const css = standaloneFigureCss(tokens, figureRules);
  const svg = isSpaceFigure(figure)
    ? spaceSvg(spacePayload(figure), figure.sight, { standalone: { title: `${title} ${sightWords(figure.sight)}`, css } })
    : figureSvg(figureScene(figure, 640), { id: `export-${instance.id}`, window: figure.window, standalone: { title, css } });
  return new Response(`<?xml version="1.0" encoding="UTF-8"?>\n${svg}\n`, { headers: { 'Content-Type': 'image/svg+xml; charset=utf-8' } });
};
