import { describe, expect, it } from 'vitest';
import { canonicalJson } from '../../src/atlas/canonical-json.ts';

describe('canonical JSON', () => {
  it.each([
    ['sorts keys at every depth', { b: 1, a: { d: [1, { z: 0, y: 1 }], c: null } }, '{\n  "a": {\n    "c": null,\n    "d": [\n      1,\n      {\n        "y": 1,\n        "z": 0\n      }\n    ]\n  },\n  "b": 1\n}\n'],
    ['writes −0 as 0 and drops undefined properties', { x: -0, y: undefined }, '{\n  "x": 0\n}\n'],
    ['ends with one newline', [], '[]\n'],
  ])('%s', (_name, value, text) => {
    expect(canonicalJson(value)).toBe(text);
  });

  it('gives the same bytes whatever the insertion order of keys', () => {
    expect(canonicalJson({ a: 1, b: [2, 3] })).toBe(canonicalJson({ b: [2, 3], a: 1 }));
  });

  it.each([
    ['NaN', { a: [1, NaN] }, /\$\.a\[1\]: number must be finite, got NaN/],
    ['Infinity', { a: Infinity }, /\$\.a: number must be finite/],
    ['a function', { f: () => 1 }, /\$\.f: function is not JSON data/],
    ['undefined in an array', [1, undefined], /\$\[1\]: undefined inside an array/],
  ])('refuses %s, naming its path', (_name, value, message) => {
    expect(() => canonicalJson(value)).toThrow(message);
  });
});
