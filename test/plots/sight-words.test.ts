import { describe, expect, it } from 'vitest';
import { sightWords } from '../../src/plots/sight-words.ts';

describe('sightWords', () => {
  it.each([
    [{ turn: 35, tilt: 30 }, /turned 35° about the vertical z-axis and tilted 30° to look down on it/],
    [{ turn: -90, tilt: 0 }, /turned 270° .* seen level/],
    [{ turn: 10, tilt: -12.5 }, /tilted 12.5° to look up at it/],
  ])('names sight %o', (sight, words) => {
    expect(sightWords(sight)).toMatch(words);
    expect(sightWords(sight)).toMatch(/^Drawn in orthographic projection/);
  });
});
