/** Symbols written as TeX commands, as the characters a reader sees. */
const SYMBOLS: Readonly<Record<string, string>> = {
  alpha: 'α', beta: 'β', gamma: 'γ', delta: 'δ', epsilon: 'ε', lambda: 'λ', mu: 'μ', sigma: 'σ', pi: 'π', theta: 'θ',
  ell: 'ℓ', partial: '∂', infty: '∞', dots: '…', ldots: '…', cdots: '⋯', cdot: '·', times: '×', le: '≤', leq: '≤',
  ge: '≥', geq: '≥', ne: '≠', neq: '≠', pm: '±', sum: 'Σ', prod: 'Π', to: '→', mapsto: '↦', in: '∈', subset: '⊂',
  det: 'det', deg: 'deg', quad: ' ', qquad: ' ', ',': ' ', ';': ' ', '!': '', left: '', right: '', big: '', Big: '',
};
const DOUBLE_STRUCK: Readonly<Record<string, string>> = { P: 'ℙ', C: 'ℂ', R: 'ℝ', Z: 'ℤ', N: 'ℕ', Q: 'ℚ' };
const SUPER: Readonly<Record<string, string>> = {
  '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹', '+': '⁺', '-': '⁻', '−': '⁻', n: 'ⁿ', i: 'ⁱ',
};
const SUB: Readonly<Record<string, string>> = {
  '0': '₀', '1': '₁', '2': '₂', '3': '₃', '4': '₄', '5': '₅', '6': '₆', '7': '₇', '8': '₈', '9': '₉', '+': '₊', '-': '₋',
  a: 'ₐ', e: 'ₑ', h: 'ₕ', i: 'ᵢ', j: 'ⱼ', k: 'ₖ', l: 'ₗ', m: 'ₘ', n: 'ₙ', o: 'ₒ', p: 'ₚ', r: 'ᵣ', s: 'ₛ', t: 'ₜ', u: 'ᵤ', v: 'ᵥ', x: 'ₓ',
};

/** The braced group at `i` (text[i] === '{') and the index after it, or the single character at `i`. */
function group(text: string, i: number): [string, number] {
  if (text[i] !== '{') return [text[i] ?? '', i + 1];
  let depth = 0;
  for (let j = i; j < text.length; j++) {
    if (text[j] === '{') depth++;
    else if (text[j] === '}' && --depth === 0) return [text.slice(i + 1, j), j + 1];
  }
  return [text.slice(i + 1), text.length];
}

/** A script in Unicode super- or subscript characters when every character has one, else "^(…)" / "_(…)". */
function script(inner: string, table: Readonly<Record<string, string>>, mark: string): string {
  const chars = [...inner.replace(/\s+/g, '')];
  return chars.length > 0 && chars.every((c) => table[c]) ? chars.map((c) => table[c]).join('') : `${mark}(${inner})`;
}

/**
 * A formula as the plain text a reader would type or say, for the search index and its excerpts: commands become
 * their symbols (\alpha → α, \mathbb{P} → ℙ, \le → ≤), fonts and \operatorname keep their letters, scripts become
 * super- and subscript characters where Unicode has them (x^2 → x², a_i → aᵢ, else x^(n+1)), \frac{a}{b} → (a)/(b),
 * braces and alignment marks disappear, "-" becomes "−", and white space is collapsed.
 */
export function texWords(tex: string): string {
  let out = '';
  let i = 0;
  while (i < tex.length) {
    const ch = tex[i]!;
    if (ch === '\\') {
      const name = /^[a-zA-Z]+/.exec(tex.slice(i + 1))?.[0] ?? tex[i + 1] ?? '';
      i += 1 + name.length;
      if (name === '\\') { out += '; '; continue; }
      if (name === 'mathbb') { const [g, next] = group(tex, i); out += [...g].map((c) => DOUBLE_STRUCK[c] ?? c).join(''); i = next; continue; }
      if (['operatorname', 'mathsf', 'mathrm', 'mathit', 'mathbf', 'text', 'textrm'].includes(name)) { const [g, next] = group(tex, i); out += texWords(g); i = next; continue; }
      if (name === 'frac') { const [a, n1] = group(tex, i); const [b, n2] = group(tex, n1); out += `(${texWords(a)})/(${texWords(b)})`; i = n2; continue; }
      if (name === 'sqrt') { const [a, n1] = group(tex, i); out += `√(${texWords(a)})`; i = n1; continue; }
      if (name === 'begin' || name === 'end') { i = group(tex, i)[1]; continue; }
      out += SYMBOLS[name] ?? name;
      continue;
    }
    if (ch === '^' || ch === '_') {
      const [g, next] = group(tex, i + 1);
      out += ch === '^' ? script(texWords(g), SUPER, '^') : script(texWords(g), SUB, '_');
      i = next;
      continue;
    }
    out += ch === '{' || ch === '}' ? '' : ch === '&' ? ' ' : ch === '-' ? '−' : ch === '~' ? ' ' : ch;
    i += 1;
  }
  return out.replace(/\s+/g, ' ').trim();
}
