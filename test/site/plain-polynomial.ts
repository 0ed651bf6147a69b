import Complex from 'complex.js';

/**
 * Evaluates a polynomial written in the atlas's plain notation (numbers, names, + − * ^, parentheses, I) at complex
 * values of its names, with complex.js doing the arithmetic. With `magnitude`, every number, value and I is replaced
 * by its absolute value and every − by +, which bounds Σ|cᵢ|·|xᵅⁱ| from above: a scale for the residual.
 * A small recursive-descent reader written for the tests, independent of the writer; throws on anything else.
 */
export function evaluatePlain(text: string, values: Readonly<Record<string, Complex>>, magnitude = false): Complex {
  const abs = (c: Complex) => (magnitude ? new Complex(c.abs(), 0) : c);
  let i = 0;
  const fail = (what: string): never => { throw new Error(`plain polynomial: ${what} at ${i} in ${JSON.stringify(text.slice(0, 80))}`); };
  const space = () => { while (text[i] === ' ') i++; };
  const atom = (): Complex => {
    space();
    if (text[i] === '(') { i++; const v = sum(); space(); if (text[i] !== ')') fail('expected )'); i++; return v; }
    const num = /^\d+(\.\d+)?/.exec(text.slice(i));
    if (num) { i += num[0].length; return new Complex(Number(num[0]), 0); }
    const name = /^[A-Za-z_][A-Za-z0-9_]*/.exec(text.slice(i));
    if (!name) return fail('expected a number, a name or (');
    i += name[0].length;
    if (name[0] === 'I') return abs(Complex.I);
    return abs(values[name[0]] ?? fail(`unknown name ${name[0]}`));
  };
  const power = (): Complex => {
    const base = atom();
    space();
    if (text[i] !== '^') return base;
    i++;
    const exp = /^\d+/.exec(text.slice(i));
    if (!exp) return fail('expected an integer exponent');
    i += exp[0].length;
    let out = Complex.ONE;
    for (let k = 0; k < Number(exp[0]); k++) out = out.mul(base);
    return out;
  };
  const product = (): Complex => {
    let v = power();
    for (space(); text[i] === '*'; space()) { i++; v = v.mul(power()); }
    return v;
  };
  const sum = (): Complex => {
    space();
    let sign = 1;
    if (text[i] === '-') { sign = magnitude ? 1 : -1; i++; }
    let v = product().mul(sign);
    for (space(); text[i] === '+' || text[i] === '-'; space()) {
      const s = text[i] === '+' || magnitude ? 1 : -1;
      i++;
      v = v.add(product().mul(s));
    }
    return v;
  };
  const value = sum();
  space();
  if (i !== text.length) fail('unexpected text');
  return value;
}
