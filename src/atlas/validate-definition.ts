import type { z } from 'astro/zod';
import type { PolynomialSystem } from '../engine/expr/node.ts';
import { degree } from '../engine/expr/degree.ts';
import type { ProblemDefinition } from './definition.ts';
import { definitionSchema } from './definition-schema.ts';
import { polynomialIssues } from './polynomial-check.ts';
import { describeValue } from './slug.ts';
import { systemOf } from './system-of.ts';
import { texIssues } from './tex-check.ts';
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

function duplicates(names: readonly string[]): string[] {
  return names.filter((n, i) => names.indexOf(n) !== i);
}

function nameIssues(d: ProblemDefinition): ValidationIssue[] {
  const f = d.formulation;
  const issues: ValidationIssue[] = [];
  for (const n of duplicates(f.unknowns)) issues.push({ path: 'formulation.unknowns', message: `"${n}" appears twice` });
  for (const n of duplicates(f.parameters)) issues.push({ path: 'formulation.parameters', message: `"${n}" appears twice` });
  for (const n of f.parameters.filter((p) => f.unknowns.includes(p))) issues.push({ path: 'formulation.parameters', message: `"${n}" is also an unknown` });
  if (f.groups) {
    const grouped = f.groups.flat();
    f.groups.forEach((g, i) => g.forEach((n, j) => {
      if (!f.unknowns.includes(n)) issues.push({ path: `formulation.groups[${i}][${j}]`, message: `"${n}" is not an unknown` });
    }));
    for (const n of duplicates(grouped)) issues.push({ path: 'formulation.groups', message: `"${n}" is in more than one group` });
    for (const n of f.unknowns.filter((u) => !grouped.includes(u))) issues.push({ path: 'formulation.groups', message: `unknown "${n}" is in no group` });
  }
  return issues;
}

function instanceIssues(d: ProblemDefinition): ValidationIssue[] {
  const issues: ValidationIssue[] = [];
  const ids = d.instances.map((i) => i.id);
  for (const id of duplicates(ids)) issues.push({ path: 'instances', message: `id "${id}" appears twice` });
  d.instances.forEach((instance, k) => {
    if (instance.kind !== 'demo') return;
    const given = instance.parameters ?? {};
    for (const p of d.formulation.parameters) {
      if (!(p in given)) issues.push({ path: `instances[${k}].parameters.${p}`, message: 'missing (a demo instance gives every parameter)' });
    }
    for (const p of Object.keys(given)) {
      if (!d.formulation.parameters.includes(p)) issues.push({ path: `instances[${k}].parameters.${p}`, message: 'is not a parameter of the formulation' });
    }
  });
  return issues;
}

function textIssues(d: ProblemDefinition): ValidationIssue[] {
  const fields: [string, string | undefined][] = [
    ['title', d.title],
    ['statement', d.statement],
    ['excessNote', d.excessNote],
    ['caution', d.caution],
    ['formulation.description', d.formulation.description],
    ...d.instances.flatMap((i, k): [string, string][] => [[`instances[${k}].label`, i.label], [`instances[${k}].description`, i.description]]),
  ];
  return fields.flatMap(([path, value]) => (value === undefined ? [] : texIssues(value, path)));
}

function buildSystem(d: ProblemDefinition): { system: PolynomialSystem } | { issues: ValidationIssue[] } {
  const f = d.formulation;
  let system: PolynomialSystem;
  try {
    system = systemOf(d);
  } catch (error) {
    const message = error instanceof Error ? `${error.name}: ${error.message}` : String(error);
    return { issues: [{ path: 'formulation.equations', message: `threw while building the equations: ${message}` }] };
  }
  const equations: readonly unknown[] = system.equations;
  const issues = equations.flatMap((e, i) => polynomialIssues(e, `formulation.equations[${i}]`, f.unknowns, f.parameters));
  if (issues.length > 0) return { issues };
  if (equations.length !== f.unknowns.length) {
    return { issues: [{ path: 'formulation.equations', message: `the system must be square: ${equations.length} equations in ${f.unknowns.length} unknowns (${f.unknowns.join(', ')})` }] };
  }
  system.equations.forEach((e, i) => {
    if (degree(e) === 0) issues.push({ path: `formulation.equations[${i}]`, message: 'involves no unknown (degree 0)' });
  });
  return issues.length > 0 ? { issues } : { system };
}
