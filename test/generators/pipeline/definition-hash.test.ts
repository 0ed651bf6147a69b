import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { definitionHash } from '../../../generators/pipeline/definition-hash.ts';

/** A folder holding a definition that imports a helper, and the hash after an optional edit. */
function hashOf(files: Record<string, string>): string {
  const dir = mkdtempSync(join(tmpdir(), 'atlas-hash-'));
  for (const [name, text] of Object.entries(files)) writeFileSync(join(dir, name), text);
  return definitionHash(join(dir, 'problem.ts'));
}

const base = { 'problem.ts': "import { h } from './helper.ts';\nexport default h;\n", 'helper.ts': 'export const h = 1;\n' };

describe('the definition hash', () => {
  it('is 64 hex digits and does not depend on where the folder is', () => {
    expect(hashOf(base)).toMatch(/^[0-9a-f]{64}$/);
    expect(hashOf(base)).toBe(hashOf(base));
  });

  it.each([
    ['the definition is edited', { ...base, 'problem.ts': `${base['problem.ts']}// edited\n` }],
    ['a helper it imports is edited', { ...base, 'helper.ts': 'export const h = 2;\n' }],
  ])('changes when %s', (_name, files) => {
    expect(hashOf(files)).not.toBe(hashOf(base));
  });

  it.each([
    ['a file it reads changes', 'stored.bin', new Uint8Array([1, 2, 4])],
    ['a file it reads goes missing', 'other.bin', null],
  ])('changes when %s', (_name, file, bytes) => {
    const dir = mkdtempSync(join(tmpdir(), 'atlas-hash-'));
    for (const [name, text] of Object.entries(base)) writeFileSync(join(dir, name), text);
    writeFileSync(join(dir, 'stored.bin'), new Uint8Array([1, 2, 3]));
    const reads = [join(dir, 'stored.bin')];
    const before = definitionHash(join(dir, 'problem.ts'), reads);
    expect(before).not.toBe(definitionHash(join(dir, 'problem.ts')));
    if (bytes) writeFileSync(join(dir, file), bytes);
    expect(definitionHash(join(dir, 'problem.ts'), bytes ? reads : [join(dir, file)])).not.toBe(before);
  });

  it('does not change when an unrelated file in the folder changes', () => {
    expect(hashOf({ ...base, 'other.ts': 'x' })).toBe(hashOf(base));
  });
});
