import { describe, expect, it } from 'vitest';
import { relatedProblems } from '../../src/site/related-problems.ts';
import type { SolveRecord } from '../../src/atlas/record.ts';
import { fixtureRecord } from './fixture-record.ts';

// Link rules are our own (common practice, no source); the ladder values are Chasles's (see the conic pages).
const base = fixtureRecord('two-conics');
const make = (slug: string, o: Partial<SolveRecord>): SolveRecord => ({ ...base, slug, title: slug, ...o });
const ladder = { id: 'points-lines', title: 'Conics through p points tangent to 5 − p lines' };
const all = [
  make('p5', { family: 'conics', trueCount: 1, ladders: [{ ...ladder, rung: 5 }, { id: 'points-conics', title: 'conic ladder', rung: 5 }] }),
  make('p4', { family: 'conics', trueCount: 2, ladders: [{ ...ladder, rung: 4 }] }),
  make('p3', { family: 'conics', trueCount: 4, ladders: [{ ...ladder, rung: 3 }] }),
  make('q4', { family: 'conics', trueCount: 6, ladders: [{ id: 'points-conics', title: 'conic ladder', rung: 4 }] }),
  make('lines', { family: 'schubert', trueCount: 2 }),
  make('other-conic', { family: 'conics', trueCount: 9 }),
];

describe('relatedProblems', () => {
  it('lists every rung of each ladder, most points first, marking the page itself', () => {
    const r = relatedProblems(all, all[1]!);
    expect(r.ladders.map((l) => l.rungs.map((x) => [x.slug, x.rung, x.current]))).toEqual([[['p5', 5, false], ['p4', 4, true], ['p3', 3, false]]]);
  });
  it('lists the family without the ladder rungs, and the problems with the same count', () => {
    const r = relatedProblems(all, all[1]!);
    expect(r.family.map((x) => x.slug)).toEqual(['other-conic', 'q4']);
    expect(r.sameCount.map((x) => x.href)).toEqual(['/problems/lines/']);
  });
  it('follows a problem on two ladders onto both', () => {
    expect(relatedProblems(all, all[0]!).ladders.map((l) => l.rungs.length)).toEqual([3, 2]);
  });
  it('lists no same-count problems when the count is unknown', () => {
    expect(relatedProblems(all, make('unknown', { trueCount: null })).sameCount).toEqual([]);
  });
});
