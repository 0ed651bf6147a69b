// A toy second family for the stored-set module: the points common to a plane conic and a plane cubic, 2 · 3 = 6 of
// them for general coefficients (Bézout's theorem, 1779; W. Fulton, Algebraic Curves, 1969, ch. 5), solved by
// parameter homotopy from a stored set found by monodromy. It supplies only its formulation, a seed builder and its
// shape; loading, checking, polishing, rebuilding and caching are the shared module's.
import type { ProblemDefinition } from '../../../../src/atlas/definition.ts';
import { systemOf } from '../../../../src/atlas/system-of.ts';
import { COMPILED_LEG_MODULE, compileSystem, createCompiledLegHomotopy, type CompiledLegConstants } from '../../../../src/engine/index.ts';
import { coefficientNames, monomialExponents } from '../../../../generators/problems/shared/monomials.ts';
import { storedSetSolver, type StoredSetSpec } from '../../../../generators/problems/shared/stored-set.ts';

const CONIC = monomialExponents(2, 2), CUBIC = monomialExponents(2, 3);
const conicNames = coefficientNames('p', 2, 2), cubicNames = coefficientNames('q', 2, 3);

/** The toy as a definition (its solver is filled in by toyDefinition). */
function toyBase(): Omit<ProblemDefinition, 'solver'> {
  return {
    slug: 'toy-conic-meets-cubic',
    title: 'Points common to a conic and a cubic (toy)',
    family: 'intersections',
    tags: ['test'],
    statement: 'Find the points where a plane conic and a plane cubic meet.',
    formulation: {
      unknowns: ['x', 'y'],
      parameters: [...conicNames, ...cubicNames],
      equations: (u, p, ops) => [[CONIC, conicNames], [CUBIC, cubicNames]].map(([exps, names]) =>
        ops.add(...(exps as number[][]).map(([i, j], m) => ops.mul(p[(names as string[])[m]!]!, ops.pow(u.x!, i!), ops.pow(u.y!, j!))))),
      description: 'Affine coordinates $(x, y)$.',
    },
    trueCount: { value: 6, source: { kind: 'published', authors: ['William Fulton'], year: 1969, title: 'Algebraic Curves', venue: 'W. A. Benjamin, New York' } },
    excessNote: 'None.',
    instances: [{ id: 'generic', kind: 'generic', label: 'Random complex data', description: 'Random.', seed: 1 }],
  };
}

/** The toy's stored-set spec: committed sets in `dir`, seed `seed`; no chart (affine coordinates). */
export function toySpec(dir: string, seed: number): StoredSetSpec {
  const compiled = compileSystem(systemOf({ ...toyBase() } as ProblemDefinition));
  const constants: CompiledLegConstants = { source: compiled.source, shape: { neq: compiled.neq, n: compiled.n, np: compiled.np } };
  return {
    name: 'toy-conic-cubic',
    shape: { first: 2, second: 3 },
    sizes: { unknowns: 2, parameters: CONIC.length + CUBIC.length, chart: 0 },
    dir,
    seed,
    expected: 6,
    homotopy: { url: COMPILED_LEG_MODULE, create: (args) => createCompiledLegHomotopy(args as unknown as Parameters<typeof createCompiledLegHomotopy>[0]), constants: () => ({ ...constants }) },
    // Solution-first: a random point, random coefficients, and each constant term chosen so that the curve passes through the point.
    seedBuilder: (random) => {
      const point = new Float64Array(2 * 2), parameters = new Float64Array(2 * (CONIC.length + CUBIC.length));
      random.gaussianComplex(point, 0);
      random.gaussianComplex(point, 2);
      for (let m = 0; m < parameters.length / 2; m++) random.gaussianComplex(parameters, 2 * m);
      [[CONIC, 0], [CUBIC, CONIC.length]].forEach(([exps, offset]) => {
        const list = exps as number[][], base = offset as number;
        let re = 0, im = 0;
        list.forEach(([i, j], m) => {
          if (i === 0 && j === 0) return;
          const [mr, mi] = monomialAt(point, i!, j!), cr = parameters[2 * (base + m)]!, ci = parameters[2 * (base + m) + 1]!;
          re += cr * mr - ci * mi; im += cr * mi + ci * mr;
        });
        const last = base + list.length - 1; // the constant term comes last
        parameters[2 * last] = -re; parameters[2 * last + 1] = -im;
      });
      return { chart: new Float64Array(0), parameters, solution: point };
    },
  };
}

/** xⁱyʲ at a packed complex point (x, y). */
function monomialAt(point: Float64Array, i: number, j: number): [number, number] {
  let re = 1, im = 0;
  const times = (zr: number, zi: number): void => { [re, im] = [re * zr - im * zi, re * zi + im * zr]; };
  for (let k = 0; k < i; k++) times(point[0]!, point[1]!);
  for (let k = 0; k < j; k++) times(point[2]!, point[3]!);
  return [re, im];
}

/** The toy definition solved from the spec's stored set (shown = working coordinates). */
export function toyDefinition(spec: StoredSetSpec): ProblemDefinition {
  return { ...toyBase(), solver: storedSetSolver(spec, { toShown: (x) => x }) };
}

/** Coefficients (toy parameter order, real) of a product of affine linear forms a·x + b·y + c. */
export function productOfLines(lines: readonly (readonly [number, number, number])[]): number[] {
  let poly = new Map<string, number>([['0,0', 1]]);
  for (const [a, b, c] of lines) {
    const next = new Map<string, number>();
    for (const [key, v] of poly) {
      const [i, j] = key.split(',').map(Number) as [number, number];
      for (const [di, dj, w] of [[1, 0, a], [0, 1, b], [0, 0, c]] as const) {
        const k = `${i + di},${j + dj}`;
        next.set(k, (next.get(k) ?? 0) + v * w);
      }
    }
    poly = next;
  }
  return monomialExponents(2, lines.length).map(([i, j]) => poly.get(`${i},${j}`) ?? 0);
}
