import type { ProblemDefinition } from './definition.ts';
import { texIssues } from './tex-check.ts';
import type { ValidationIssue } from './validation-issue.ts';

// Cross-field checks of a definition whose data fields already fit definitionSchema.

function duplicates(names: readonly string[]): string[] {
  return names.filter((n, i) => names.indexOf(n) !== i);
}

/** Unique and disjoint unknown and parameter names; groups that partition the unknowns. */
export function nameIssues(d: ProblemDefinition): ValidationIssue[] {
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

/** Unique instance ids; demo instances giving exactly the formulation's parameters. */
export function instanceIssues(d: ProblemDefinition): ValidationIssue[] {
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

/** TeX that KaTeX renders in every prose field (title, statement, notes, labels). */
export function textIssues(d: ProblemDefinition): ValidationIssue[] {
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
