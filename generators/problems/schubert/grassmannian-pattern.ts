import { grassmannianDegree } from './grassmannian-degree.ts';

/**
 * A Markdown paragraph showing where the count sits in the pattern of Grassmannian degrees, every number computed
 * by the hook length formula: for k = 2 the row deg G(2, n), n = 4 … 10 (the Catalan numbers C_{n−2}), and for
 * k = 3 the rows k = 2 and k = 3 with n − k = 3, the problem's own entry in bold.
 */
export function grassmannianPattern(k: number, n: number): string {
  const entry = (kk: number, nn: number) => {
    const value = grassmannianDegree(kk, nn).toString();
    return kk === k && nn === n ? `$\\mathbf{${value}}$` : `$${value}$`;
  };
  const row = (kk: number, from: number, to: number) => Array.from({ length: to - from + 1 }, (_, i) => `$G(${kk},${from + i})$: ${entry(kk, from + i)}`).join(', ');
  const own = `The answer is the degree of the Grassmannian $G(${k},${n})$ in its Plücker embedding, the number of standard Young tableaux of a ${k} × ${n - k} rectangle, which the hook length formula computes.`;
  if (k === 2) return `${own} For lines the degrees are the Catalan numbers $\\tfrac{1}{m+1}\\binom{2m}{m}$ with $m = n - 2$: ${row(2, 4, 10)}.`;
  return `${own} For lines they are the Catalan numbers (${row(2, 4, 8)}); for planes the rectangles have three rows: ${row(3, 5, 8)}, and $G(3,6)$ shares its degree $42$ with $G(2,7)$, whose rectangle is $2 \\times 5$.`;
}
