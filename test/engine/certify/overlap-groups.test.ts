import { describe, expect, it } from 'vitest';
import { boxesMeet, overlapGroups } from '../../../src/engine/certify/overlap-groups.ts';
import { createRandom } from '../../../src/engine/random.ts';

// Reference: brute-force pairwise comparison with union–find (common practice, no source); the sweep must find
// the same groups while comparing only boxes whose projections overlap.
const box1 = (reLo: number, reHi: number, imLo = 0, imHi = 1): Float64Array => Float64Array.from([reLo, reHi, imLo, imHi]);

describe('overlap groups of boxes', () => {
  it.each([
    ['disjoint boxes stay apart', [box1(0, 1), box1(2, 3)], [0, 1]],
    ['touching closed boxes meet', [box1(0, 1), box1(1, 2)], [0, 0]],
    ['a chain joins through its middle box', [box1(0, 1), box1(4, 5), box1(0.9, 4.1)], [0, 0, 0]],
    ['boxes apart in the imaginary part only stay apart', [box1(0, 1, 0, 1), box1(0, 1, 2, 3)], [0, 1]],
  ] as [string, Float64Array[], number[]][])('%s', (_name, boxes, expected) => {
    expect(Array.from(overlapGroups(boxes, 1))).toEqual(expected);
  });

  it('agrees with brute force on 400 random boxes in 3 complex dimensions', () => {
    const random = createRandom(77);
    const boxes = Array.from({ length: 400 }, () => {
      const b = new Float64Array(12);
      for (let k = 0; k < 6; k++) {
        const centre = random.next() * 4, radius = random.next() * 0.6;
        b[2 * k] = centre - radius; b[2 * k + 1] = centre + radius;
      }
      return b;
    });
    const parent = boxes.map((_, i) => i);
    const find = (i: number): number => (parent[i] === i ? i : (parent[i] = find(parent[i]!)));
    for (let i = 0; i < boxes.length; i++) for (let j = i + 1; j < boxes.length; j++) {
      if (boxesMeet(boxes[i]!, boxes[j]!)) {
        const [a, b] = [find(i), find(j)];
        if (a !== b) parent[Math.max(a, b)] = Math.min(a, b);
      }
    }
    const groups = overlapGroups(boxes, 3);
    expect(Array.from(groups)).toEqual(boxes.map((_, i) => find(i)));
    expect(new Set(groups).size).toBeGreaterThan(1);
    expect(new Set(groups).size).toBeLessThan(400);
  });
});
