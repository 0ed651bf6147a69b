import { mkdirSync, mkdtempSync, readFileSync, readdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, it } from 'vitest';
import { TWO_CONICS } from '../pipeline/fixtures/solved-fixture.ts';
import { runCli } from './run-cli.ts';

const VALID = readFileSync(TWO_CONICS, 'utf8');

/** The valid two-conics definition source with one textual edit; the edit must apply. */
function edited(find: string | RegExp, replace: string): string {
  const out = VALID.replace(find, replace);
  if (out === VALID) throw new Error(`edit did not apply: ${find}`);
  return out;
}

// Each malformed definition file, the field its error must name, and the words it must use.
const cases: [string, string, RegExp][] = [
  ['a title of the wrong type', edited("title: 'Points common to two conics (test)'", 'title: 42'), /: title: must be string, got 42/],
  ['a missing excess note', edited(/  excessNote: .*\n/, ''), /: excessNote: missing/],
  ['a non-square system', edited("unknowns: ['x', 'y']", "unknowns: ['x', 'y', 'z']"), /: formulation\.equations: the system must be square: 2 equations in 3 unknowns/],
  ['a NaN parameter', edited('f2: -9', 'f2: NaN'), /: instances\[1\]\.parameters\.f2: must be finite: a number or \[re, im\], got NaN/],
  ['an infinite parameter', edited('a1: 1,', 'a1: 1 / 0,'), /: instances\[1\]\.parameters\.a1: must be finite.*got Infinity/],
  ['a syntax error', edited("tags: ['conics', 'test'],", "tags: ['conics', 'test'],,"), /: syntax error \(.*line \d+\): /],
  ['an equation that is not a polynomial', edited('ops.mul(k(\'d\'), u.x),', "{ kind: 'sqrt', arg: u.x },"), /: formulation\.equations\[0\]\.terms\[3\]: node kind "sqrt" is not polynomial/],
  ['a default export that is missing', edited('export default {', 'export const problem = {'), /: default export: missing/],
];

describe('regenerating a malformed definition file', () => {
  it.concurrent.for(cases)('with %s exits 2 naming the file and the field, with no stack trace, and leaves content/ untouched', async ([, source, message], { expect }) => {
    const dir = mkdtempSync(join(tmpdir(), 'atlas-bad-'));
    const file = join(dir, 'bad-definition.ts');
    writeFileSync(file, source);
    const content = join(dir, 'content');
    mkdirSync(join(content, 'records'), { recursive: true });
    writeFileSync(join(content, 'records', 'keep.json'), '{"kept": true}\n');
    const run = await runCli(['regenerate', file, '--content', content]);
    expect(run.code, run.stderr).toBe(2);
    expect(run.stderr).toContain('bad-definition.ts');
    expect(run.stderr).toMatch(message);
    expect(run.stderr).not.toMatch(/\n\s+at .*[:(]/);
    expect(readdirSync(content, { recursive: true }).sort()).toEqual(['records', 'records/keep.json']);
    expect(readFileSync(join(content, 'records', 'keep.json'), 'utf8')).toBe('{"kept": true}\n');
  });
});
