import { describe, expect, it } from 'vitest';
import { texWords } from '../../../src/site/math/tex-words.ts';

// The plain form is our own convention (common practice, no source): Unicode symbols and scripts where they exist.
describe('texWords', () => {
  it.each([
    ['ax^2 + bxy + cy^2 + dx + ey + f = 0', 'ax² + bxy + cy² + dx + ey + f = 0'],
    ['a_i x^2 + b_i xy', 'aᵢ x² + bᵢ xy'],
    ['(x_j, y_j)', '(xⱼ, yⱼ)'],
    ['\\mathbb{P}^5', 'ℙ⁵'],
    ['6^{5} = 7776', '6⁵ = 7776'],
    ['\\tfrac12 d(d - 2)', 'tfrac12 d(d − 2)'],
    ['\\frac{1}{2}d(d-2)(d-3)(d+3)', '(1)/(2)d(d−2)(d−3)(d+3)'],
    ['(\\alpha x + \\beta y + \\gamma)^2', '(α x + β y + γ)²'],
    ['\\det(sA + tU)', 'det(sA + tU)'],
    ['p = 5, \\dots, 0', 'p = 5, …, 0'],
    ['\\sum c_{ijk} x^i y^j z^k', 'Σ cᵢⱼₖ xⁱ y^(j) z^(k)'],
    ['i + j + k \\le 3', 'i + j + k ≤ 3'],
    ['\\operatorname{rank} M', 'rank M'],
    ['x^{n+1}', 'xⁿ⁺¹'],
    ['2^{(n+1)}', '2^((n+1))'],
  ])('reads %s as %s', (tex, words) => expect(texWords(tex)).toBe(words));
});
