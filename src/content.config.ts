import { defineCollection } from 'astro:content';
import { glob } from 'astro/loaders';
import { z } from 'astro/zod';
import { solveRecordSchema } from './atlas/record.ts';
import { contentDir } from './site/content-dir.ts';

const root = contentDir();

/** content/records/<slug>.json: one solve record per problem, validated by the record schema. */
const records = defineCollection({
  loader: glob({ base: `${root}/records`, pattern: '*.json' }),
  schema: solveRecordSchema,
});

/** content/problems/<slug>.mdx: the generated prose of each problem page. */
const problems = defineCollection({
  loader: glob({ base: `${root}/problems`, pattern: '*.mdx' }),
  schema: z.object({
    slug: z.string().regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/),
    title: z.string().min(1),
    family: z.string().min(1),
    tags: z.array(z.string()).default([]),
    bezoutBound: z.number().int().positive(),
    trueCount: z.number().int().nonnegative().nullable(),
    recordVersion: z.number().int().positive(),
    engineVersion: z.string().min(1),
  }),
});

export const collections = { records, problems };
