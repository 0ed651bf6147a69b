import { describe, expect, it } from 'vitest';
import { grassmannianDegree } from '../../../../generators/problems/schubert/grassmannian-degree.ts';

describe('the degree of the Grassmannian G(k, n)', () => {
  it.each([
    // Lines in P^3 meeting four lines: 2 (Schubert, Kalkül der abzählenden Geometrie, 1879).
    [2, 4, 2n],
    // Lines in 4-space meeting six planes: 5; G(2,n) gives the Catalan numbers 2, 5, 14, 42, 132, 429, 1430
    // (Schubert 1886; Fulton, Young Tableaux, Cambridge 1997, hook length formula).
    [2, 5, 5n], [2, 6, 14n], [2, 7, 42n], [2, 8, 132n], [2, 9, 429n], [2, 10, 1430n],
    // 2-planes in P^5 meeting nine 2-planes: 42; and G(3,7), G(3,8), G(4,8) (Fulton, Young Tableaux, 1997, hook length formula).
    [3, 6, 42n], [3, 7, 462n], [3, 8, 6006n], [4, 8, 24024n],
  ])('G(%i, %i) has degree %s', (k, n, degree) => {
    expect(grassmannianDegree(k, n)).toBe(degree);
  });

  it.each([[1, 5], [4, 5], [0, 3], [3, 3]])('G(%i, %i) is a projective space or a point: degree 1', (k, n) => {
    // Projective spaces are linearly embedded; common practice, no source.
    expect(grassmannianDegree(k, n)).toBe(1n);
  });

  it('is symmetric under duality, G(k, n) ≅ G(n − k, n)', () => {
    for (let n = 2; n <= 10; n++) for (let k = 0; k <= n; k++) expect(grassmannianDegree(k, n)).toBe(grassmannianDegree(n - k, n));
  });

  it.each([[-1, 4], [5, 4], [1.5, 4]])('refuses k = %s, n = %s', (k, n) => {
    expect(() => grassmannianDegree(k, n)).toThrow(RangeError);
  });
});
