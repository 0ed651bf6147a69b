import { exprBuilders, type ExprNode, type PolynomialSystem, type RandomSource } from '../../src/engine/index.ts';

const { add, constant, mul, pow, sub, unknown } = exprBuilders;

/** A polynomial in one variable u with expression coefficients (index = power of u). */
type UPoly = ExprNode[];

const mulU = (a: UPoly, b: UPoly): UPoly => {
  const out: ExprNode[][] = Array.from({ length: a.length + b.length - 1 }, () => []);
  a.forEach((ai, i) => b.forEach((bj, j) => out[i + j]!.push(mul(ai, bj))));
  return out.map((terms) => add(...terms));
};
const powU = (a: UPoly, e: number): UPoly => (e === 0 ? [constant(1)] : mulU(powU(a, e - 1), a));

/** Random complex coefficient c with independent standard normal parts. */
const gaussian = (random: RandomSource): ExprNode => constant(random.normal(), random.normal());

/** Exponents (i, j, k) with i + j + k ≤ d in `vars` variables (vars = 2 or 3), in a fixed order. */
function exponents(vars: 2 | 3, d: number): number[][] {
  const out: number[][] = [];
  for (let i = 0; i <= d; i++) for (let j = 0; i + j <= d; j++) {
    if (vars === 2) out.push([i, j]);
    else for (let k = 0; i + j + k <= d; k++) out.push([i, j, k]);
  }
  return out;
}

/** A dense random complex polynomial of degree d in the given unknowns (2 or 3 of them). */
export function randomDense(random: RandomSource, vars: readonly ExprNode[], d: number): ExprNode {
  return add(...exponents(vars.length as 2 | 3, d).map((e) => mul(gaussian(random), ...e.map((k, v) => pow(vars[v]!, k)))));
}

/** n random dense equations of degree d in n unknowns (Bézout: all d^n solutions finite and nonsingular). */
export function randomSystem(random: RandomSource, n: 2 | 3, d: number): PolynomialSystem {
  const names = ['x', 'y', 'z'].slice(0, n);
  const vars = names.map((s, i) => unknown(s, i));
  return { unknowns: names, parameters: [], equations: names.map(() => randomDense(random, vars, d)) };
}

/**
 * Lines (a + b·u, c + d·u, u) on a random cubic surface f(x, y, z) = 0: the four coefficients of f along the
 * line in u. Four cubics: Bézout 81, 27 lines (Cayley 1849, Salmon 1849); groups {a, c}, {b, d}.
 */
export function linesOnCubic(random: RandomSource): PolynomialSystem {
  const [a, b, c, d] = ['a', 'b', 'c', 'd'].map((s, i) => unknown(s, i)) as [ExprNode, ExprNode, ExprNode, ExprNode];
  const line: UPoly[] = [[a, b], [c, d], [constant(0), constant(1)]];
  const terms = exponents(3, 3).map((e) => {
    const coefficient = gaussian(random);
    return e.reduce((p, k, v) => mulU(p, powU(line[v]!, k)), [coefficient] as UPoly);
  });
  const equations = [0, 1, 2, 3].map((j) => add(...terms.map((t) => t[j] ?? constant(0))));
  return { unknowns: ['a', 'b', 'c', 'd'], parameters: [], equations, groups: [[0, 2], [1, 3]] };
}

/**
 * Bitangents y = m·x + k of a random quartic f: f(x, mx + k) = q₄(m)·(x² − s·x + p)², compared in the
 * coefficients of x³ … x⁰. Bézout 1080, two-homogeneous ({m, k}, {s, p}) 288; 28 bitangents (Plücker 1834).
 */
export function bitangents(random: RandomSource): PolynomialSystem {
  const [m, k, s, p] = ['m', 'k', 's', 'p'].map((n, i) => unknown(n, i)) as [ExprNode, ExprNode, ExprNode, ExprNode];
  const along: UPoly[] = [[constant(0), constant(1)], [k, m]];
  const terms = exponents(2, 4).map((e) => e.reduce((acc, kk, v) => mulU(acc, powU(along[v]!, kk)), [gaussian(random)] as UPoly));
  const g = [0, 1, 2, 3, 4].map((j) => add(...terms.map((t) => t[j] ?? constant(0))));
  const square = [mul(p, p), mul(-2, s, p), add(mul(s, s), mul(2, p)), mul(-2, s)];
  const equations = [3, 2, 1, 0].map((j) => sub(g[j]!, mul(g[4]!, square[j]!)));
  return { unknowns: ['m', 'k', 's', 'p'], parameters: [], equations, groups: [[0, 1], [2, 3]] };
}
