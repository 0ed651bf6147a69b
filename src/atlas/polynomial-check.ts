import type { ValidationIssue } from './validation-issue.ts';
import { describeValue } from './slug.ts';

const KINDS = 'const, unknown, param, add, mul, neg, pow';

/**
 * Walks one equation's expression graph (iteratively, each shared node once) and reports every node that does not
 * make it a polynomial in the named unknowns with complex constant coefficients: an unknown node kind, a
 * non-integer or negative exponent, a non-finite constant, an index or name that matches no unknown/parameter.
 */
export function polynomialIssues(
  root: unknown,
  path: string,
  unknowns: readonly string[],
  parameters: readonly string[],
): ValidationIssue[] {
  const issues: ValidationIssue[] = [];
  const seen = new Set<object>();
  const stack: [unknown, string][] = [[root, path]];
  const child = (node: unknown, at: string): void => void stack.push([node, at]);
  while (stack.length > 0 && issues.length < 20) {
    const [node, at] = stack.pop()!;
    if (typeof node !== 'object' || node === null) {
      issues.push({ path: at, message: `is not an expression node (got ${describeValue(node)}); build equations with the ops handed to equations()` });
      continue;
    }
    if (seen.has(node)) continue;
    seen.add(node);
    const n = node as Record<string, unknown>;
    const bad = (message: string): void => void issues.push({ path: at, message });
    switch (n.kind) {
      case 'const':
        if (!isFinite(n.re) || !isFinite(n.im)) bad(`constant must be finite, got ${describeValue(n.re)} + ${describeValue(n.im)}i`);
        break;
      case 'unknown':
      case 'param': {
        const names = n.kind === 'unknown' ? unknowns : parameters;
        if (!Number.isInteger(n.index) || (n.index as number) < 0 || (n.index as number) >= names.length || names[n.index as number] !== n.name) {
          bad(`${n.kind} ${describeValue(n.name)} (index ${describeValue(n.index)}) is not one of the formulation's ${n.kind === 'unknown' ? 'unknowns' : 'parameters'}`);
        }
        break;
      }
      case 'add':
      case 'mul': {
        const key = n.kind === 'add' ? 'terms' : 'factors';
        const items = n[key];
        if (!Array.isArray(items)) bad(`${n.kind} node needs an array of ${key}`);
        else for (let i = items.length - 1; i >= 0; i--) child(items[i], `${at}.${key}[${i}]`);
        break;
      }
      case 'neg':
        child(n.arg, `${at}.arg`);
        break;
      case 'pow':
        if (!Number.isInteger(n.exponent) || (n.exponent as number) < 0) bad(`exponent must be a non-negative integer (the equation must be a polynomial), got ${describeValue(n.exponent)}`);
        child(n.base, `${at}.base`);
        break;
      default:
        bad(`node kind ${describeValue(n.kind)} is not polynomial; allowed kinds: ${KINDS}`);
    }
  }
  return issues;
}

function isFinite(value: unknown): boolean {
  return typeof value === 'number' && Number.isFinite(value);
}
