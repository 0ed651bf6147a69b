import { join } from 'node:path';
import { AtlasError } from './atlas-error.ts';
import { checked, displayPath, importModule, PROBLEMS_DIR, problemFiles, loadDefinitionFile, type LoadedDefinition } from './load-definition.ts';

/**
 * Loads and validates every definition of the registry (generators/problems/index.ts: an array of definitions as
 * its default export or as `problems`), each matched to its module file <family>/<slug>.ts for hashing. Throws
 * AtlasError('input') listing every problem: a missing registry, a duplicate slug, a definition without a module
 * file, a definition that fails validation.
 */
export async function loadRegistry(dir = PROBLEMS_DIR): Promise<LoadedDefinition[]> {
  const index = join(dir, 'index.ts');
  const shown = displayPath(index);
  const module = await importModule(index, shown);
  const list = module.default ?? module.problems;
  if (!Array.isArray(list)) throw new AtlasError('input', `${shown}: must export an array of problem definitions (default export or \`problems\`)`);
  const files = problemFiles(dir);
  const seen = new Set<string>();
  const loaded: LoadedDefinition[] = [];
  const errors: string[] = [];
  list.forEach((candidate: unknown, k) => {
    const slug = (candidate as { slug?: unknown } | null)?.slug;
    const file = typeof slug === 'string' ? files.get(slug) : undefined;
    if (!file) errors.push(`${shown}: [${k}] (slug ${JSON.stringify(slug)}): no module file named <slug>.ts under ${displayPath(dir)}`);
    else if (seen.has(file)) errors.push(`${shown}: [${k}]: slug "${slug}" appears twice`);
    else {
      seen.add(file);
      try {
        loaded.push(checked(candidate, file));
      } catch (error) {
        if (!(error instanceof AtlasError)) throw error;
        errors.push(error.message);
      }
    }
  });
  if (errors.length > 0) throw new AtlasError('input', errors.join('\n'));
  return loaded;
}

/** Whether a command-line target names a file (has a slash or a module extension) rather than a registry slug. */
export function isFileTarget(target: string): boolean {
  return /[\\/]/.test(target) || /\.(?:ts|js|mjs)$/.test(target);
}

/** Resolves `<slug | path/to/definition.ts>` to a loaded definition. Throws AtlasError('input') for an unknown slug. */
export async function loadTarget(target: string, dir = PROBLEMS_DIR): Promise<LoadedDefinition> {
  if (isFileTarget(target)) return loadDefinitionFile(target);
  const all = await loadRegistry(dir);
  const found = all.find((d) => d.definition.slug === target);
  if (!found) throw new AtlasError('input', `no problem with slug "${target}" (known: ${all.map((d) => d.definition.slug).join(', ') || 'none'})`);
  return found;
}
