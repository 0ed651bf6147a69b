import { defineCollection } from 'astro:content';
import { glob } from 'astro/loaders';
import { solveRecordSchema } from './atlas/record.ts';
import { pageFrontmatterSchema } from './atlas/page-frontmatter.ts';
import { contentDir } from './site/content-dir.ts';

const root = contentDir();

/** content/records/<slug>.json: one solve record per problem, validated by the record schema. */
const records = defineCollection({
  loader: glob({ base: `${root}/records`, pattern: '*.json' }),
  schema: solveRecordSchema,
});

/** content/problems/<slug>.mdx: the generated prose of each problem page; the one frontmatter schema the writer checks too. */
const problems = defineCollection({
  loader: glob({ base: `${root}/problems`, pattern: '*.mdx' }),
  schema: pageFrontmatterSchema,
});

export const collections = { records, problems };
