import { createRandom, exprBuilders, type ExprNode, type PolynomialSystem } from '../../src/engine/index.ts';

const { add, mul, param, unknown } = exprBuilders;

/**
 * A square system of n dense quadrics (every monomial of degree ≤ 2, coefficients as parameters) with `count` chosen
 * solutions: random complex points are placed first, then each equation's coefficients are a random vector in the null
 * space of the points' monomial matrix (solution-first construction). Needs count < 1 + n + n(n+1)/2.
 */
export function quadricsWithKnownSolutions(n: number, count: number, seed: number): { system: PolynomialSystem; parameters: Float64Array; solutions: Float64Array[] } {
  const random = createRandom(seed);
  const x = Array.from({ length: n }, (_, j) => unknown(`x${j}`, j));
  const monomials: (ExprNode | null)[] = [null, ...x];
  for (let j = 0; j < n; j++) for (let k = j; k < n; k++) monomials.push(mul(x[j]!, x[k]!));
  const m = monomials.length;
  if (!(count < m)) throw new RangeError(`known-solution quadrics: ${count} solutions need more than ${m} monomials`);
  const solutions = Array.from({ length: count }, () => {
    const point = new Float64Array(2 * n);
    for (let j = 0; j < n; j++) random.gaussianComplex(point, 2 * j);
    return point;
  });
  // rows: monomials evaluated at each solution (packed complex)
  const rows = solutions.map((p) => {
    const row = new Float64Array(2 * m);
    row[0] = 1;
    for (let j = 0; j < n; j++) { row[2 + 2 * j] = p[2 * j]!; row[3 + 2 * j] = p[2 * j + 1]!; }
    let c = 1 + n;
    for (let j = 0; j < n; j++) for (let k = j; k < n; k++, c++) {
      row[2 * c] = p[2 * j]! * p[2 * k]! - p[2 * j + 1]! * p[2 * k + 1]!;
      row[2 * c + 1] = p[2 * j]! * p[2 * k + 1]! + p[2 * j + 1]! * p[2 * k]!;
    }
    return row;
  });
  const pivots = reduceRows(rows, m);
  const parameters = new Float64Array(2 * n * m);
  const names: string[] = [];
  const equations = Array.from({ length: n }, (_, i) => {
    const coefficients = new Float64Array(2 * m);
    for (let c = 0; c < m; c++) if (!pivots.includes(c)) random.gaussianComplex(coefficients, 2 * c);
    pivots.forEach((c, r) => {
      // pivot variable c = −Σ_free R[r][f]·coefficient_f (rows are reduced: unit pivot, zeros in other pivot columns)
      let re = 0, im = 0;
      for (let f = 0; f < m; f++) {
        if (pivots.includes(f)) continue;
        const a = rows[r]![2 * f]!, b = rows[r]![2 * f + 1]!, u = coefficients[2 * f]!, v = coefficients[2 * f + 1]!;
        re -= a * u - b * v; im -= a * v + b * u;
      }
      coefficients[2 * c] = re; coefficients[2 * c + 1] = im;
    });
    parameters.set(coefficients, 2 * m * i);
    return add(...monomials.map((mono, c) => {
      names.push(`c${i}_${c}`);
      const coefficient = param(`c${i}_${c}`, m * i + c);
      return mono === null ? coefficient : mul(coefficient, mono);
    }));
  });
  return { system: { unknowns: x.map((_, j) => `x${j}`), parameters: names, equations }, parameters, solutions };
}

/** Reduced row echelon form in place (partial pivoting by |re| + |im|); returns the pivot column of each row. */
function reduceRows(rows: Float64Array[], m: number): number[] {
  const pivots: number[] = [];
  let col = 0;
  for (let r = 0; r < rows.length; r++) {
    let best = -1, bestRow = r;
    for (; col < m; col++) {
      best = -1;
      for (let s = r; s < rows.length; s++) {
        const size = Math.abs(rows[s]![2 * col]!) + Math.abs(rows[s]![2 * col + 1]!);
        if (size > best) { best = size; bestRow = s; }
      }
      if (best > 1e-12) break;
    }
    if (col === m) throw new Error('known-solution quadrics: the monomial matrix is rank deficient (draw another seed)');
    [rows[r], rows[bestRow]] = [rows[bestRow]!, rows[r]!];
    const row = rows[r]!;
    const pr = row[2 * col]!, pi = row[2 * col + 1]!, d = pr * pr + pi * pi;
    const qr = pr / d, qi = -pi / d;
    for (let c = 0; c < m; c++) {
      const a = row[2 * c]!, b = row[2 * c + 1]!;
      row[2 * c] = a * qr - b * qi; row[2 * c + 1] = a * qi + b * qr;
    }
    for (let s = 0; s < rows.length; s++) {
      if (s === r) continue;
      const other = rows[s]!, fr = other[2 * col]!, fi = other[2 * col + 1]!;
      if (fr === 0 && fi === 0) continue;
      for (let c = 0; c < m; c++) {
        const a = row[2 * c]!, b = row[2 * c + 1]!;
        other[2 * c] = other[2 * c]! - (fr * a - fi * b);
        other[2 * c + 1] = other[2 * c + 1]! - (fr * b + fi * a);
      }
    }
    pivots.push(col);
    col++;
  }
  return pivots;
}
