import type { Sight } from '../atlas/space-figure.ts';

const deg = (v: number) => `${Math.round(v * 10) / 10}°`;

/** One caption sentence naming a sight: the orthographic view's turn about the vertical z-axis and its tilt. */
export function sightWords(sight: Sight): string {
  const turn = ((sight.turn % 360) + 360) % 360;
  const tilt = sight.tilt === 0 ? 'seen level' : sight.tilt > 0 ? `tilted ${deg(sight.tilt)} to look down on it` : `tilted ${deg(-sight.tilt)} to look up at it`;
  return `Drawn in orthographic projection, the scene turned ${deg(turn)} about the vertical z-axis and ${tilt}; lines fade with distance from the viewer.`;
}
