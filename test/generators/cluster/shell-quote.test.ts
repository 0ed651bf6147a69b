import { execFileSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import { shellLine, shellQuote } from '../../../generators/cluster/shell-quote.ts';

// POSIX single-quote rules (IEEE Std 1003.1, Shell Command Language, 2.2.2), checked against bash itself.
describe('shell quoting', () => {
  it.each(['plain', '/a/b-c_d.ts', 'with space', "it's", '$HOME', 'a"b', '*', '', 'line\nbreak', '`x`'])('%j reaches the program unchanged', (word) => {
    const echoed = execFileSync('bash', ['-c', `printf '%s' ${shellQuote(word)}`], { encoding: 'utf8' });
    expect(echoed).toBe(word);
  });

  it('leaves safe words bare', () => {
    expect(shellLine(['node', '--seed', '7', '/x/y.ts'])).toBe('node --seed 7 /x/y.ts');
  });
});
