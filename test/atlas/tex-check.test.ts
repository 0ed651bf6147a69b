import { describe, expect, it } from 'vitest';
import { mathSegments, texIssues } from '../../src/atlas/tex-check.ts';

describe('finding math in Markdown', () => {
  it.each([
    ['inline and display math', 'a $x^2$ and $$\\frac{1}{2}$$ b', [['x^2', false], ['\\frac{1}{2}', true]]],
    ['an escaped dollar is not math', 'costs \\$5 and $y$', [['y', false]]],
    ['no math', 'plain words', []],
  ])('%s', (_name, text, expected) => {
    expect(mathSegments(text as string).map((s) => [s.tex, s.display])).toEqual(expected);
  });
});

describe('checking TeX with KaTeX', () => {
  it.each([
    ['a valid formula', 'the count $\\binom{5}{2} = 10$', 0],
    ['an unbalanced brace', 'oops $\\frac{1}{$', 1],
    ['an unknown command', 'see $\\notacommand x$', 1],
    ['an unclosed dollar', 'a $x', 1],
    ['accented text in math, which the site renders in strict mode and refuses', 'the letter $é$', 1],
  ])('%s gives %i issues', (_name, text, count) => {
    const issues = texIssues(text, 'statement');
    expect(issues).toHaveLength(count);
    for (const issue of issues) expect(issue.path).toBe('statement');
  });
});
