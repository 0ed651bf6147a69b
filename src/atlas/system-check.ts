import { degree, type PolynomialSystem } from '../engine/index.ts';
import type { ProblemDefinition } from './definition.ts';
import { polynomialIssues } from './polynomial-check.ts';
import { systemOf } from './system-of.ts';
import type { ValidationIssue } from './validation-issue.ts';

/**
 * Builds the definition's system and checks it: the equations build without a throw, are polynomial graphs in the
 * named unknowns and parameters, form a square system, and each involves an unknown. Issues name the field path.
 */
export function buildSystem(d: ProblemDefinition): { system: PolynomialSystem } | { issues: ValidationIssue[] } {
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
