import { describe, expect, it } from 'vitest';
import { groupConclusion, groupedDigits, publishedComparison, publishedSize } from '../../src/site/group-words.ts';
import type { MonodromyGroup } from '../../src/atlas/record.ts';

const base: MonodromyGroup = {
  seed: 7, loops: 9, closedLoops: 8, degree: 27, order: '51840', verdict: 'order', transitive: true, primitive: true,
  primeCycle: null, oddLoop: false, cycleTypes: [{ type: '9³', count: 3 }],
};

describe('words for a monodromy group', () => {
  it.each([
    ['51840', '51 840'],
    ['1451520', '1 451 520'],
    ['216', '216'],
  ])('groups the digits of %s as %s', (digits, text) => {
    expect(groupedDigits(digits).replace(/\u2009/g, ' ')).toBe(text);
  });

  it.each([
    ['symmetric', 'full symmetric group'],
    ['alternating', 'alternating group'],
    ['intransitive', 'intransitive'],
    ['order', 'smaller than the full symmetric group'],
    ['undecided', 'verdict stays open'],
  ] as const)('says what a %s verdict means', (verdict, words) => {
    const sentence = groupConclusion({ ...base, verdict });
    expect(sentence).toContain(words);
    expect(sentence).toContain('8 of 9 random loops closed on the 27 solutions');
  });

  it('says no group is claimed when no loop closed', () => {
    expect(groupConclusion({ ...base, verdict: 'undecided', closedLoops: 0, loops: 8, order: null })).toBe('None of the 8 random loops closed on the 27 solutions (on each, some route failed or met another), so no group is claimed.');
  });

  it('compares with the published order only when both are known', () => {
    const published = { name: 'W(E₆)', order: '51840', citation: 'Jordan 1870' };
    expect(publishedComparison(base, published)).toBe('match');
    expect(publishedComparison({ ...base, order: '25920' }, published)).toBe('differs');
    expect(publishedComparison({ ...base, order: null }, published)).toBe('none');
    expect(publishedComparison(undefined, published)).toBe('none');
    expect(publishedComparison(base, undefined)).toBe('none');
  });

  it.each([
    ['symmetric', 3264, 'match'],
    ['symmetric', 3263, 'differs'],
    ['alternating', 3264, 'differs'],
    ['order', 3264, 'differs'],
    ['undecided', 3264, 'none'],
  ] as const)('compares a %s verdict on %i solutions with a published S₃₂₆₄ as %s', (verdict, degree, expected) => {
    // Harris 1979 (Duke Math. J. 46): the conics tangent to five general conics have the full symmetric group S₃₂₆₄
    const published = { name: 'S₃₂₆₄', symmetricOn: 3264, citation: 'Harris 1979' };
    expect(publishedComparison({ ...base, verdict, degree, order: null }, published)).toBe(expected);
  });

  it('writes a published order with grouped digits and a published symmetric group as n!', () => {
    expect(publishedSize({ name: 'W(E₆)', order: '51840', citation: 'Jordan 1870' }).replace(/\u2009/g, ' ')).toBe('51 840');
    expect(publishedSize({ name: 'S₃₂₆₄', symmetricOn: 3264, citation: 'Harris 1979' })).toBe('3264! (the full symmetric group on 3264 letters)');
  });
});
