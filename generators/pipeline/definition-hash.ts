import { existsSync, readFileSync } from 'node:fs';
import { createHash } from 'node:crypto';
import { dirname, relative, resolve, sep } from 'node:path';
import { sha256Hex } from '../../src/atlas/hash.ts';
import { RECORD_SCHEMA_VERSION } from '../../src/atlas/record.ts';

const SRC_DIR = resolve(import.meta.dirname, '../../src');
const RELATIVE_IMPORT = /(?:\bfrom\s*|\bimport\s*\(?\s*)(['"])(\.{1,2}\/[^'"]+)\1/g;

/**
 * The definition hash stored in a record (64 hex digits): SHA-256 over a format tag, the record schema version, and
 * the source text of the definition module and of every module it reaches through relative imports, each under its
 * path relative to the definition's folder, in sorted order. Imports into src/ (engine, atlas) are left out: the
 * engine is tracked by the record's engineVersion. Editing a definition or a helper it imports makes it stale.
 * `reads` (the definition's data files read at run time) add, in sorted order, each file's relative path and the
 * SHA-256 of its bytes (or "missing"), so changing a stored solution set makes the problems that read it stale.
 */
export function definitionHash(file: string, reads: readonly string[] = []): string {
  const base = dirname(file);
  const texts = new Map<string, string>();
  const queue = [resolve(file)];
  while (queue.length > 0) {
    const path = queue.pop()!;
    if (texts.has(path)) continue;
    const text = readFileSync(path, 'utf8');
    texts.set(path, text);
    for (const match of text.matchAll(RELATIVE_IMPORT)) {
      const target = resolve(dirname(path), match[2]!);
      if (!target.startsWith(SRC_DIR + sep) && /\.(?:ts|js|mjs|json)$/.test(target)) queue.push(target);
    }
  }
  const parts = [...texts].map(([path, text]) => [relative(base, path).split(sep).join('/'), text] as const).sort(([a], [b]) => (a < b ? -1 : 1));
  const data = [...new Set(reads)].map((path) => [relative(base, path).split(sep).join('/'), bytesDigest(path)] as const).sort(([a], [b]) => (a < b ? -1 : 1));
  return sha256Hex('atlas-definition-hash/1', String(RECORD_SCHEMA_VERSION), ...parts.flat(), ...(data.length > 0 ? ['reads', ...data.flat()] : []));
}

/** SHA-256 of a file's bytes as hex, or "missing". */
function bytesDigest(path: string): string {
  return existsSync(path) ? createHash('sha256').update(readFileSync(path)).digest('hex') : 'missing';
}
