import type { PageFrontmatter } from '../../src/atlas/page-frontmatter.ts';
import type { SolveRecord } from '../../src/atlas/record.ts';
import { mdxText } from './mdx-text.ts';

/** The frontmatter of a record's page: recordVersion = number of history entries (1 on first publication); bound and count of the first instance. */
export function pageFrontmatter(record: SolveRecord): PageFrontmatter {
  return {
    slug: record.slug,
    title: record.title,
    family: record.family,
    tags: [...record.tags],
    bezoutBound: record.instances[0]!.counts.bezoutBound,
    trueCount: record.trueCount,
    recordVersion: Math.max(1, record.history.length),
    engineVersion: record.engineVersion,
  };
}

/**
 * The MDX page of a record (content/problems/<slug>.mdx), a pure function of the record: YAML frontmatter (one
 * `key: JSON value` line per field, in the schema's order; JSON scalars and flow lists are valid YAML), then a
 * caution paragraph when the record has one, "## The problem", "## Formulation", "## Where the naive count goes".
 */
export function renderPage(record: SolveRecord): string {
  const front = Object.entries(pageFrontmatter(record)).map(([k, v]) => `${k}: ${JSON.stringify(v)}`);
  const body = [
    ...(record.caution ? [`**Caution.** ${mdxText(record.caution)}`] : []),
    '## The problem',
    mdxText(record.statement),
    '## Formulation',
    mdxText(record.formulation.description),
    '## Where the naive count goes',
    mdxText(record.excessNote),
  ];
  return `---\n${front.join('\n')}\n---\n\n${body.join('\n\n')}\n`;
}

/** Reads the frontmatter block written by renderPage back into data (each line `key: JSON`); throws on other shapes. */
export function readFrontmatter(page: string): Record<string, unknown> {
  const match = /^---\n([\s\S]*?)\n---\n/.exec(page.replace(/\r\n?/g, '\n'));
  if (!match) throw new Error('no frontmatter block between --- lines at the top');
  const out: Record<string, unknown> = {};
  for (const line of match[1]!.split('\n')) {
    const m = /^([A-Za-z][\w-]*):\s*(.*)$/.exec(line);
    if (!m) throw new Error(`frontmatter line is not "key: value": ${JSON.stringify(line)}`);
    try {
      out[m[1]!] = JSON.parse(m[2]!);
    } catch {
      throw new Error(`frontmatter ${m[1]}: value is not a JSON scalar or list: ${m[2]}`);
    }
  }
  return out;
}
