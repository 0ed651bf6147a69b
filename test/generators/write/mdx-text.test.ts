import { describe, expect, it } from 'vitest';
import { mdxText } from '../../../generators/write/mdx-text.ts';

describe('making prose safe for MDX', () => {
  it.each([
    ['escapes braces and < in prose', 'sets {a, b} with a < b', 'sets \\{a, b\\} with a \\< b'],
    ['keeps inline math byte for byte', 'the $\\binom{n}{k} < 2^n$ bound', 'the $\\binom{n}{k} < 2^n$ bound'],
    ['keeps display math byte for byte', 'see $$\\{x : x^2 < 1\\}$$ {here}', 'see $$\\{x : x^2 < 1\\}$$ \\{here\\}'],
    ['keeps code spans byte for byte', 'call `f({x: 1})` on {y}', 'call `f({x: 1})` on \\{y\\}'],
    ['leaves existing escapes alone', 'a literal \\$ and \\{', 'a literal \\$ and \\{'],
    ['normalises line endings and trims', '  line one\r\nline two \n', 'line one\nline two'],
  ])('%s', (_name, input, output) => {
    expect(mdxText(input)).toBe(output);
  });
});
