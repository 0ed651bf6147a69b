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

describe('canonicalJson with compactNumberArrays', () => {
  it('writes arrays of numbers (and of such arrays) on one line, the rest indented, keys sorted', () => {
    const text = canonicalJson({ z: [[1, 2], null, [[0.5, -0, 3, 4]]], a: ['x'], m: { b: [1e-300] } }, { compactNumberArrays: true });
    expect(text).toBe('{\n  "a": [\n    "x"\n  ],\n  "m": {\n    "b": [1e-300]\n  },\n  "z": [\n    [1,2],\n    null,\n    [[0.5,0,3,4]]\n  ]\n}\n');
    expect(JSON.parse(text)).toEqual({ a: ['x'], m: { b: [1e-300] }, z: [[1, 2], null, [[0.5, 0, 3, 4]]] });
  });
  it('is the plain canonical form without the option', () => {
    expect(canonicalJson({ a: [1, 2] })).toBe('{\n  "a": [\n    1,\n    2\n  ]\n}\n');
  });
});
