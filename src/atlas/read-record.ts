import type { z } from 'astro/zod';
import { solveRecordSchema, type SolveRecord } from './record.ts';
import { fieldPath, type ValidationIssue } from './validation-issue.ts';

/** A parsed content file, or the issues (field path and message) that make it unreadable or invalid. */
export type ContentCheck<T> = { readonly ok: true; readonly value: T } | { readonly ok: false; readonly issues: readonly ValidationIssue[] };

/** Parses and validates the text of a solve record (content/records/<slug>.json); never throws. */
export function parseRecord(text: string): ContentCheck<SolveRecord> {
  return parseWith(solveRecordSchema, () => JSON.parse(text) as unknown);
}

/** Validates `read()`'s value with a zod schema, reporting a throw from `read` (bad JSON, bad YAML) as a root issue. */
export function parseWith<T>(schema: z.ZodType<T>, read: () => unknown): ContentCheck<T> {
  let data: unknown;
  try {
    data = read();
  } catch (error) {
    return { ok: false, issues: [{ path: '(root)', message: `cannot be parsed: ${error instanceof Error ? error.message : String(error)}` }] };
  }
  const parsed = schema.safeParse(data);
  if (parsed.success) return { ok: true, value: parsed.data };
  return { ok: false, issues: parsed.error.issues.map((i) => ({ path: fieldPath(i.path), message: i.message })) };
}
