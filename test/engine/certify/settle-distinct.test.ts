import { describe, expect, it } from 'vitest';
import { settleDistinct } from '../../../src/engine/certify/settle-distinct.ts';
import type { PointCertificate } from '../../../src/engine/certify/certify-point.ts';

// Reference: the logic of the certificate (Krawczyk 1969: a passing box holds exactly one solution, and so does its
// image K(X) ⊂ X): disjoint enclosures are different solutions; overlapping ones are the same exactly when a box
// around both passes the test; otherwise they count once (at least one solution, possibly two).
const certificate = (box: number[], enclosure: number[], real = false): PointCertificate => ({
  certified: true, certifiedReal: real, radius: 1, box: Float64Array.from(box), enclosure: Float64Array.from(enclosure),
});
const refused: PointCertificate = { certified: false, certifiedReal: false, radius: 0, box: new Float64Array(0), enclosure: new Float64Array(0), reason: 'refused' };

describe('settling distinct solutions', () => {
  it.each([
    ['disjoint boxes: two solutions', [certificate([0, 1, 0, 1], [0.4, 0.6, 0.4, 0.6]), certificate([2, 3, 0, 1], [2.4, 2.6, 0.4, 0.6])], false, 2, [undefined, undefined], 0],
    ['overlapping boxes, disjoint enclosures: still two', [certificate([0, 2, 0, 1], [0.1, 0.2, 0.4, 0.6]), certificate([1, 3, 0, 1], [2.4, 2.6, 0.4, 0.6])], false, 2, [undefined, undefined], 0],
    ['overlapping enclosures, hull passes: the same solution', [certificate([0, 1, 0, 1], [0.4, 0.6, 0.4, 0.6]), certificate([0.2, 1.2, 0, 1], [0.5, 0.7, 0.4, 0.6])], true, 1, [undefined, 0], 1],
    ['overlapping enclosures, hull fails: counted once, not proven the same', [certificate([0, 1, 0, 1], [0.4, 0.6, 0.4, 0.6]), certificate([0.2, 1.2, 0, 1], [0.5, 0.7, 0.4, 0.6])], false, 1, [undefined, undefined], 1],
    ['refused points are not counted', [refused, certificate([0, 1, 0, 1], [0.4, 0.6, 0.4, 0.6])], false, 1, [undefined, undefined], 0],
  ] as [string, PointCertificate[], boolean, number, (number | undefined)[], number][])('%s', (_name, certificates, hullPasses, distinct, sameAs, hullTests) => {
    let hullCalls = 0;
    const report = settleDistinct(certificates, 1, () => { hullCalls++; return hullPasses; }, 0);
    expect(report.certifiedDistinct).toBe(distinct);
    expect(report.solutions.map((s) => s.sameAs)).toEqual(sameAs);
    expect(hullCalls).toBe(hullTests);
  });

  it('counts a group with a real-certified member as one real solution', () => {
    const report = settleDistinct([certificate([0, 1, -1, 1], [0.4, 0.6, -0.1, 0.1], true), certificate([0.2, 1.2, -1, 1], [0.5, 0.7, -0.1, 0.1])], 1, () => true, 0);
    expect([report.certified, report.certifiedDistinct, report.certifiedReal]).toEqual([2, 1, 1]);
  });
});
