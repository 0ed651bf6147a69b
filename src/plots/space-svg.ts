// Shared by the build and the browser: the markup of a space figure for one sight.
import type { Sight } from '../atlas/space-figure.ts';
import { escapeHtml } from '../site/escape-html.ts';
import { layerClass, layerLabel } from './layer-names.ts';
import { spacePieces, type SpacePiece } from './space-pieces.ts';
import { sightBasis } from './space-view.ts';
import type { SpacePayload } from './space-payload.ts';

/** Radius in px of a drawn dot. */
export const DOT_RADIUS = 4.5;
/** Opacity of the farthest piece (the nearest is opaque): fading with depth is the figure's depth cue. */
const FAR_OPACITY = 0.4;
/** The axis marker: its corner offset and arm length in px. */
const GIZMO_AT = 40, GIZMO_ARM = 26;

function pieceTitle(p: SpacePiece): string {
  return p.label ?? (p.solution !== null ? `${layerLabel(p.layer)}: solution ${p.solution + 1}` : layerLabel(p.layer));
}

/** Opacity for a depth in [−radius, radius]: FAR_OPACITY at the back, 1 at the front, 2 decimals. */
export function depthOpacity(depth: number, radius: number): number {
  const t = radius > 0 ? Math.min(1, Math.max(0, (depth / radius + 1) / 2)) : 1;
  return Math.round((FAR_OPACITY + (1 - FAR_OPACITY) * t) * 100) / 100;
}

/**
 * The pieces of the figure for a sight, far to near, as SVG elements: dots as <circle>, runs as <path>, each with
 * class shape-<kind> and its layer's class, data-layer, data-solution, an opacity fading with depth and a <title>.
 */
export function spaceSceneMarkup(payload: SpacePayload, sight: Sight, hidden: ReadonlySet<string> = new Set()): string {
  return spacePieces(payload.items, sight, payload.placement, payload.piece, hidden).map((p) => {
    const data = ` class="shape-${p.kind} ${layerClass(p.layer)}" data-layer="${escapeHtml(p.layer)}"${p.solution !== null ? ` data-solution="${p.solution}"` : ''} opacity="${depthOpacity(p.depth, payload.radius)}"`;
    const title = `<title>${escapeHtml(pieceTitle(p))}</title>`;
    if (p.kind === 'dot') return `<circle cx="${p.points[0]![0]}" cy="${p.points[0]![1]}" r="${DOT_RADIUS}"${data}>${title}</circle>`;
    return `<path d="M${p.points.map(([x, y]) => `${x} ${y}`).join('L')}"${data}>${title}</path>`;
  }).join('');
}

/** The axis marker in the lower left corner: the world's x, y and z directions for the sight, labelled. */
export function sightGizmoMarkup(payload: SpacePayload, sight: Sight): string {
  const b = sightBasis(sight);
  const ox = GIZMO_AT, oy = payload.height - GIZMO_AT;
  const r2 = (v: number) => Math.round(v * 100) / 100;
  return (['x', 'y', 'z'] as const).map((name, k) => {
    const dx = b.across[k]!, dy = -b.up[k]!;
    const ex = r2(ox + GIZMO_ARM * dx), ey = r2(oy + GIZMO_ARM * dy);
    const tx = r2(ox + (GIZMO_ARM + 9) * dx), ty = r2(oy + (GIZMO_ARM + 9) * dy + 4);
    return `<line x1="${ox}" y1="${oy}" x2="${ex}" y2="${ey}"/><text x="${tx}" y="${ty}" text-anchor="middle">${name}</text>`;
  }).join('');
}

/** How to write a space figure's SVG: what labels it on the page, or the standalone extras for a file of its own. */
export interface SpaceSvgOptions {
  readonly labelledBy?: string;
  readonly standalone?: { readonly title: string; readonly css: string };
}

/**
 * A space figure for one sight as SVG text, complete without JavaScript: background, g.scene (the pieces, far to
 * near), g.gizmo (the axis marker). data-sight holds "turn tilt" in degrees. Deterministic for given inputs.
 */
export function spaceSvg(payload: SpacePayload, sight: Sight, options: SpaceSvgOptions = {}): string {
  const { width, height } = payload;
  const s = options.standalone;
  const head = s ? `<title>${escapeHtml(s.title)}</title><style>${s.css}</style>` : '';
  const size = s ? ` width="${width}" height="${height}"` : '';
  const label = options.labelledBy ? ` role="img" aria-labelledby="${escapeHtml(options.labelledBy)}"` : ' role="img"';
  return `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${width} ${height}"${size} class="figure-svg space-svg"${label} data-sight="${sight.turn} ${sight.tilt}">` +
    `${head}<rect class="plot-bg" width="${width}" height="${height}"/>` +
    `<g class="scene">${spaceSceneMarkup(payload, sight)}</g>` +
    `<g class="gizmo" aria-hidden="true">${sightGizmoMarkup(payload, sight)}</g></svg>`;
}
