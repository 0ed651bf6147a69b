import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { explorationSchema } from '../../src/atlas/exploration.ts';
import { parseWith } from '../../src/atlas/read-record.ts';
import type { SolveRecord } from '../../src/atlas/record.ts';
import { formatIssues } from '../../src/atlas/validation-issue.ts';
import { displayPath } from '../pipeline/load-definition.ts';
import { explorationPath } from './content-paths.ts';

/**
 * Every exploration under <root>/explorations/ checked: it parses and fits its schema, its slug matches its file name,
 * and a record of that slug exists. One message per file (file, field path, why).
 */
export function checkExplorations(root: string, records: ReadonlyMap<string, SolveRecord>): string[] {
  const dir = join(root, 'explorations');
  if (!existsSync(dir)) return [];
  const errors: string[] = [];
  for (const name of readdirSync(dir).filter((n) => n.endsWith('.json') && !n.startsWith('.')).sort()) {
    const slug = name.slice(0, -'.json'.length);
    const file = explorationPath(root, slug);
    const parsed = parseWith(explorationSchema, () => JSON.parse(readFileSync(file, 'utf8')));
    if (!parsed.ok) errors.push(formatIssues(displayPath(file), parsed.issues));
    else if (parsed.value.slug !== slug) errors.push(`${displayPath(file)}: slug: "${parsed.value.slug}" does not match the file name`);
    else if (!records.has(slug)) errors.push(`${displayPath(file)}: has no record of the problem ${slug}`);
  }
  return errors;
}
