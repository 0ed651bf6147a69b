import { describe, expect, it } from 'vitest';
import { numberWords } from '../../src/site/number-words.ts';

// English number names, short scale, no "and" (common practice, no source).
describe('numberWords', () => {
  it.each([
    [0, 'zero'], [9, 'nine'], [13, 'thirteen'], [27, 'twenty-seven'], [28, 'twenty-eight'], [40, 'forty'],
    [100, 'one hundred'], [184, 'one hundred eighty-four'], [816, 'eight hundred sixteen'],
    [3264, 'three thousand two hundred sixty-four'], [7776, 'seven thousand seven hundred seventy-six'],
    [1_000_001, 'one million one'], [2_000_000_000, 'two billion'],
  ])('%d is %s', (n, words) => expect(numberWords(n)).toBe(words));
  it.each([-1, 1.5, 1e15, Number.NaN])('refuses %d', (n) => expect(() => numberWords(n)).toThrow(RangeError));
});
