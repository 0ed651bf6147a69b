import type { z } from 'astro/zod';
import type { PolynomialSystem } from '../engine/index.ts';
import type { ProblemDefinition } from './definition.ts';
import { instanceIssues, nameIssues, textIssues } from './definition-checks.ts';
import { definitionSchema } from './definition-schema.ts';
import { describeValue } from './slug.ts';
import { buildSystem } from './system-check.ts';
import { fieldPath, type ValidationIssue } from './validation-issue.ts';

/** The outcome of validating a candidate definition: the typed definition and its system when there are no issues. */
export type DefinitionCheck =
  | { readonly ok: true; readonly definition: ProblemDefinition; readonly system: PolynomialSystem; readonly issues: readonly [] }
  | { readonly ok: false; readonly issues: readonly ValidationIssue[] };

/**
 * Validates any value as a ProblemDefinition and never throws: the zod schema of its data fields, then unique and
 * disjoint names, groups that partition the unknowns, equations that build, are polynomial graphs, involve an
 * unknown and form a square system, demo instances that give every parameter a finite value, and TeX that KaTeX
 * renders. Each issue names the field path (`instances[1].parameters.r2`).
 */
export function validateDefinition(candidate: unknown): DefinitionCheck {
  try {
    const parsed = definitionSchema.safeParse(candidate, { reportInput: true });
    if (!parsed.success) return { ok: false, issues: parsed.error.issues.map(zodIssue) };
    const definition = candidate as ProblemDefinition;
    const issues = [...nameIssues(definition), ...instanceIssues(definition), ...textIssues(definition)];
    if (issues.length > 0) return { ok: false, issues };
    const built = buildSystem(definition);
    if ('issues' in built) return { ok: false, issues: built.issues };
    return { ok: true, definition, system: built.system, issues: [] };
  } catch (error) {
    return { ok: false, issues: [{ path: '(root)', message: `could not be checked: ${error instanceof Error ? error.message : String(error)}` }] };
  }
}

function zodIssue(issue: z.core.$ZodIssue): ValidationIssue {
  const path = fieldPath(issue.path);
  if (issue.code === 'invalid_type') {
    return { path, message: issue.input === undefined ? 'missing' : `must be ${issue.expected}, got ${describeValue(issue.input)}` };
  }
  return { path, message: issue.message };
}
