import { readdirSync, readFileSync } from 'node:fs';
import { dirname, join, relative, resolve, sep } from 'node:path';
import { describe, expect, it } from 'vitest';

const ROOT = resolve(import.meta.dirname, '../..');
const ENGINE = join(ROOT, 'src', 'engine');
const ENTRY = join(ENGINE, 'index.ts');
// Static imports and re-exports (`from '…'`), side-effect imports, dynamic imports and `typeof import('…')`.
const SPECIFIER = /(?:\bfrom\s*|\bimport\s*\(\s*|^\s*import\s+)(['"])(\.{1,2}\/[^'"]+)\1/gm;

/** Every .ts, .mjs and .astro file below `dir`, skipping node_modules and dot folders. */
function sourceFiles(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const full = join(dir, entry.name);
    if (entry.isDirectory()) return entry.name === 'node_modules' || entry.name.startsWith('.') ? [] : sourceFiles(full);
    return /\.(?:ts|mjs|astro)$/.test(entry.name) ? [full] : [];
  });
}

/** The files a file imports relatively (resolved paths), with whether the import is dynamic. */
function importsOf(file: string): { target: string; dynamic: boolean }[] {
  const text = readFileSync(file, 'utf8');
  return [...text.matchAll(SPECIFIER)].map((m) => ({ target: resolve(dirname(file), m[2]!), dynamic: /import\s*\(\s*$/.test(m[0].slice(0, m[0].length - m[2]!.length - 2)) }));
}

const rel = (file: string): string => relative(ROOT, file).split(sep).join('/');
const inEngine = (file: string): boolean => file.startsWith(ENGINE + sep);

/**
 * The engine's declared surface: code outside src/engine (the site, the atlas vocabulary, the generators and their
 * tests) imports the engine only through src/engine/index.ts. The engine's own unit tests (test/engine) test its
 * internals and are exempt. A rule of this project (DEVELOPERS.md, "Data flow"), no outside source.
 */
describe('the engine surface', () => {
  const outside = [...sourceFiles(join(ROOT, 'src')).filter((f) => !inEngine(f)), ...sourceFiles(join(ROOT, 'generators')), ...sourceFiles(join(ROOT, 'test')).filter((f) => !f.startsWith(join(ROOT, 'test', 'engine') + sep))];

  it('is reached from outside src/engine only through src/engine/index.ts', () => {
    const past = outside.flatMap((file) => importsOf(file).filter(({ target }) => inEngine(target) && target !== ENTRY).map(({ target }) => `${rel(file)} → ${rel(target)}`));
    expect(past).toEqual([]);
  });

  it('imports nothing from outside src/engine', () => {
    const engineFiles = sourceFiles(ENGINE);
    const out = engineFiles.flatMap((file) => importsOf(file).filter(({ target }) => !inEngine(target)).map(({ target }) => `${rel(file)} → ${rel(target)}`));
    expect(out).toEqual([]);
  });

  it('leaves no static import cycle in src/ or generators/', () => {
    const files = [...sourceFiles(join(ROOT, 'src')), ...sourceFiles(join(ROOT, 'generators'))];
    const known = new Set(files);
    const edges = new Map(files.map((f) => [f, importsOf(f).filter((i) => !i.dynamic && known.has(i.target)).map((i) => i.target)]));
    const cycles: string[] = [];
    const state = new Map<string, 'open' | 'done'>();
    const stack: string[] = [];
    const visit = (file: string): void => {
      state.set(file, 'open');
      stack.push(file);
      for (const next of edges.get(file) ?? []) {
        if (state.get(next) === 'open') cycles.push([...stack.slice(stack.indexOf(next)), next].map(rel).join(' → '));
        else if (!state.has(next)) visit(next);
      }
      stack.pop();
      state.set(file, 'done');
    };
    for (const f of files) if (!state.has(f)) visit(f);
    expect(cycles).toEqual([]);
  });
});
