import { type ExprNode, exprBuilders as ops, type PolynomialSystem } from '../engine/index.ts';
import type { ProblemDefinition } from './definition.ts';

/**
 * Builds the engine's PolynomialSystem from a definition's formulation: unknown i and parameter j get the
 * indices of their names' positions; groups are translated from names to indices. Throws an Error naming the
 * problem and the field when a name is unknown or the equations are not an array of nodes.
 */
export function systemOf(definition: ProblemDefinition): PolynomialSystem {
  const f = definition.formulation;
  const where = `problem "${definition.slug}", formulation`;
  const u: Record<string, ExprNode> = {};
  f.unknowns.forEach((name, i) => (u[name] = ops.unknown(name, i)));
  const p: Record<string, ExprNode> = {};
  f.parameters.forEach((name, j) => (p[name] = ops.param(name, j)));
  const equations = f.equations(Object.freeze(u), Object.freeze(p), ops);
  if (!Array.isArray(equations)) throw new Error(`${where}.equations: must return an array of expressions`);
  const groups = f.groups?.map((group, g) =>
    group.map((name) => {
      const i = f.unknowns.indexOf(name);
      if (i < 0) throw new Error(`${where}.groups[${g}]: "${name}" is not an unknown`);
      return i;
    }),
  );
  return groups ? { unknowns: [...f.unknowns], parameters: [...f.parameters], equations, groups } : { unknowns: [...f.unknowns], parameters: [...f.parameters], equations };
}
