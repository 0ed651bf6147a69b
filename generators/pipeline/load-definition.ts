import { existsSync, readdirSync, statSync } from 'node:fs';
import { isAbsolute, join, relative, resolve, basename } from 'node:path';
import { pathToFileURL } from 'node:url';
import type { ProblemDefinition } from '../../src/atlas/definition.ts';
import type { PolynomialSystem } from '../../src/engine/index.ts';
import { validateDefinition } from '../../src/atlas/validate-definition.ts';
import { formatIssues } from '../../src/atlas/validation-issue.ts';
import { AtlasError } from './atlas-error.ts';
import { definitionHash } from './definition-hash.ts';

/** The folder of the atlas's own problem definitions (one module per problem: <family>/<slug>.ts). */
export const PROBLEMS_DIR = resolve(import.meta.dirname, '../problems');

/** A validated definition with its engine system, its module file (as shown in messages) and its hash. */
export interface LoadedDefinition {
  readonly definition: ProblemDefinition;
  readonly system: PolynomialSystem;
  readonly file: string;
  readonly hash: string;
}

/** How a file is named in messages: relative to the working directory when inside it, else absolute. */
export function displayPath(file: string): string {
  const rel = relative(process.cwd(), file);
  return rel.startsWith('..') || isAbsolute(rel) ? file : rel;
}

/**
 * Loads one definition module by path (any .ts/.js file; its default export is the definition) and validates it.
 * Throws AtlasError('input') naming the file, and the line for a syntax error, or the field for a bad definition.
 */
export async function loadDefinitionFile(path: string): Promise<LoadedDefinition> {
  const file = resolve(path);
  const shown = displayPath(file);
  if (!existsSync(file) || !statSync(file).isFile()) throw new AtlasError('input', `${shown}: no such definition file`);
  const module = await importModule(file, shown);
  if (!('default' in module)) throw new AtlasError('input', `${shown}: default export: missing (write \`export default { slug: …, … }\`)`);
  return checked(module.default, file);
}

/** Validates a definition value that came from `file`; throws AtlasError('input') listing every issue. */
export function checked(candidate: unknown, file: string): LoadedDefinition {
  const check = validateDefinition(candidate);
  if (!check.ok) throw new AtlasError('input', formatIssues(displayPath(file), check.issues));
  return { definition: check.definition, system: check.system, file, hash: definitionHash(file, check.definition.reads) };
}

/** Imports a module, turning a load failure (syntax error, missing import) into AtlasError('input') with the file and line. */
export async function importModule(file: string, shown: string): Promise<Record<string, unknown>> {
  try {
    return (await import(pathToFileURL(file).href)) as Record<string, unknown>;
  } catch (error) {
    const e = error as Error & { code?: string };
    const at = typeof e.stack === 'string' ? /^(\/[^\n]*?):(\d+)\n/.exec(e.stack) : null;
    const line = at ? ` (${displayPath(at[1]!)} line ${at[2]})` : '';
    const what = e instanceof SyntaxError ? 'syntax error' : 'cannot be loaded';
    throw new AtlasError('input', `${shown}: ${what}${line}: ${String(e?.message ?? e).split('\n')[0]}`);
  }
}

/** Every module file under the problems folder by its base name (the slug), skipping index.ts and data folders. */
export function problemFiles(dir = PROBLEMS_DIR): Map<string, string> {
  const out = new Map<string, string>();
  const walk = (d: string): void => {
    for (const entry of readdirSync(d, { withFileTypes: true }).sort((a, b) => (a.name < b.name ? -1 : 1))) {
      const full = join(d, entry.name);
      if (entry.isDirectory()) walk(full);
      else if (/\.ts$/.test(entry.name) && full !== join(dir, 'index.ts')) out.set(basename(entry.name, '.ts'), full);
    }
  };
  if (existsSync(dir)) walk(dir);
  return out;
}
