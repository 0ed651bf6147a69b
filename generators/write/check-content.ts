import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { pageFrontmatterSchema } from '../../src/atlas/page-frontmatter.ts';
import { parseRecord, parseWith } from '../../src/atlas/read-record.ts';
import type { SolveRecord } from '../../src/atlas/record.ts';
import { formatIssues } from '../../src/atlas/validation-issue.ts';
import { displayPath } from '../pipeline/load-definition.ts';
import { pagePath, recordPath } from './content-paths.ts';
import { readFrontmatter, renderPage } from './render-page.ts';
import { checkSidecars } from './check-sidecars.ts';
import { checkExplorations } from './check-explorations.ts';

/**
 * Every problem with content under the root, checked: each record parses and fits the schema with the slug of its
 * file name; each page's frontmatter fits its schema and the page is exactly what its record renders to; no page
 * lacks a record and no record lacks a page; the files beside the records agree with them (checkSidecars); every
 * exploration fits its schema and has a record (checkExplorations). Returns
 * one message per problem (file, field path, why) and the slugs.
 */
export function checkContent(root: string): { errors: string[]; slugs: string[] } {
  const errors: string[] = [];
  const records = new Map<string, SolveRecord>();
  for (const slug of filesIn(join(root, 'records'), '.json')) {
    const file = recordPath(root, slug);
    const parsed = parseRecord(readFileSync(file, 'utf8'));
    if (!parsed.ok) errors.push(formatIssues(displayPath(file), parsed.issues));
    else if (parsed.value.slug !== slug) errors.push(`${displayPath(file)}: slug: "${parsed.value.slug}" does not match the file name`);
    else records.set(slug, parsed.value);
  }
  const pages = filesIn(join(root, 'problems'), '.mdx');
  for (const slug of pages) {
    const file = pagePath(root, slug);
    const text = readFileSync(file, 'utf8');
    const front = parseWith(pageFrontmatterSchema, () => readFrontmatter(text));
    const record = records.get(slug);
    if (!front.ok) errors.push(formatIssues(displayPath(file), front.issues));
    else if (front.value.slug !== slug) errors.push(`${displayPath(file)}: slug: "${front.value.slug}" does not match the file name`);
    else if (!existsSync(recordPath(root, slug))) errors.push(`${displayPath(file)}: has no record ${displayPath(recordPath(root, slug))}`);
    else if (record && renderPage(record) !== text) errors.push(`${displayPath(file)}: differs from what its record renders (run refresh to rewrite it)`);
  }
  for (const slug of records.keys()) if (!pages.includes(slug)) errors.push(`${displayPath(recordPath(root, slug))}: has no page ${displayPath(pagePath(root, slug))} (run refresh)`);
  errors.push(...checkSidecars(root, records));
  errors.push(...checkExplorations(root, records));
  return { errors, slugs: [...records.keys()] };
}

function filesIn(dir: string, ext: string): string[] {
  if (!existsSync(dir)) return [];
  return readdirSync(dir).filter((n) => n.endsWith(ext) && !n.startsWith('.')).map((n) => n.slice(0, -ext.length)).sort();
}
