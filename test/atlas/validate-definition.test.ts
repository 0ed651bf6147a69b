import { describe, expect, it } from 'vitest';
import { validateDefinition } from '../../src/atlas/validate-definition.ts';
import twoConics from '../generators/pipeline/fixtures/two-conics.ts';

type Mutable = Record<string, any>;

/** A deep copy of a definition that keeps its functions, changed by `edit`. */
function mutated(edit: (d: Mutable) => void): Mutable {
  const copy = (v: unknown): unknown =>
    Array.isArray(v) ? v.map(copy) : v && typeof v === 'object' ? Object.fromEntries(Object.entries(v).map(([k, x]) => [k, copy(x)])) : v;
  const d = copy(twoConics) as Mutable;
  edit(d);
  return d;
}

describe('a valid definition', () => {
  it('passes and yields its square system', () => {
    const check = validateDefinition(twoConics);
    expect(check.issues).toEqual([]);
    expect(check.ok && check.system.equations.length).toBe(2);
  });
});

// Each malformed definition gets an issue naming the field path and saying why.
const malformed: [string, (d: Mutable) => void, string, RegExp][] = [
  ['a missing title', (d) => delete d.title, 'title', /missing/],
  ['a title of the wrong type', (d) => (d.title = 42), 'title', /must be string, got 42/],
  ['a slug with capitals', (d) => (d.slug = 'Two Conics'), 'slug', /lowercase words joined by hyphens/],
  ['a missing formulation', (d) => delete d.formulation, 'formulation', /missing/],
  ['equations that are not a function', (d) => (d.formulation.equations = [1, 2]), 'formulation.equations', /must be a function/],
  ['a duplicate unknown', (d) => (d.formulation.unknowns = ['x', 'x']), 'formulation.unknowns', /"x" appears twice/],
  ['a parameter that is also an unknown', (d) => d.formulation.parameters.push('x'), 'formulation.parameters', /also an unknown/],
  ['a non-square system (3 equations, 2 unknowns)', (d) => { const f = d.formulation.equations; d.formulation.equations = (u: any, p: any, ops: any) => [...f(u, p, ops), ops.sub(u.x, u.y)]; }, 'formulation.equations', /must be square: 3 equations in 2 unknowns/],
  ['a non-polynomial node (division)', (d) => (d.formulation.equations = (u: any) => [{ kind: 'div', num: u.x, den: u.y }, u.y]), 'formulation.equations[0]', /node kind "div" is not polynomial/],
  ['a fractional exponent', (d) => (d.formulation.equations = (u: any) => [{ kind: 'pow', base: u.x, exponent: 0.5 }, u.y]), 'formulation.equations[0]', /exponent must be a non-negative integer/],
  ['a builder that throws on a negative power', (d) => (d.formulation.equations = (u: any, _p: any, ops: any) => [ops.pow(u.x, -1), u.y]), 'formulation.equations', /threw while building the equations: RangeError: exponent/],
  ['a NaN constant in an equation', (d) => (d.formulation.equations = (u: any) => [{ kind: 'add', terms: [u.x, { kind: 'const', re: NaN, im: 0 }] }, u.y]), 'formulation.equations[0].terms[1]', /constant must be finite/],
  ['an equation with no unknown', (d) => (d.formulation.equations = (u: any, p: any) => [p.a1, u.y]), 'formulation.equations[0]', /involves no unknown/],
  ['a NaN demo parameter', (d) => (d.instances[1].parameters.f2 = NaN), 'instances[1].parameters.f2', /must be finite: a number or \[re, im\], got NaN/],
  ['an infinite demo parameter', (d) => (d.instances[1].parameters.a1 = Infinity), 'instances[1].parameters.a1', /must be finite.*got Infinity/],
  ['a complex parameter with an infinite part', (d) => (d.instances[1].parameters.b2 = [0, -Infinity]), 'instances[1].parameters.b2', /must be finite/],
  ['a missing demo parameter', (d) => delete d.instances[1].parameters.c2, 'instances[1].parameters.c2', /missing/],
  ['an unknown demo parameter', (d) => (d.instances[1].parameters.zz = 1), 'instances[1].parameters.zz', /not a parameter of the formulation/],
  ['a negative seed', (d) => (d.instances[0].seed = -1), 'instances[0].seed', /./],
  ['a duplicate instance id', (d) => (d.instances[1].id = 'generic'), 'instances', /id "generic" appears twice/],
  ['no instances', (d) => (d.instances = []), 'instances', /at least one instance/],
  ['a true count that is not an integer', (d) => (d.trueCount.value = 4.5), 'trueCount.value', /./],
  ['a published source without authors', (d) => delete d.trueCount.source.authors, 'trueCount.source.authors', /missing/],
  ['bad TeX in the statement', (d) => (d.statement = 'Meet at $\\frac{1}{$ points.'), 'statement', /TeX error/],
  ['an unclosed dollar in the excess note', (d) => (d.excessNote = 'Costs $5 to fix.'), 'excessNote', /unclosed \$/],
  ['a group naming a non-unknown', (d) => (d.formulation.groups = [['x'], ['z']]), 'formulation.groups[1][0]', /"z" is not an unknown/],
  ['a drawing without its solution function', (d) => delete d.drawing.solution, 'drawing.solution', /missing|must be a function/],
  ['a plane drawing without its window', (d) => delete d.drawing.window, 'drawing.window', /missing/],
  ['a drawing in 3-space without its sight', (d) => (d.drawing.kind = 'space'), 'drawing.sight', /missing .*3-space/],
];

describe.each(malformed)('a definition with %s', (_name, edit, path, message) => {
  it(`is rejected at ${path}`, () => {
    const check = validateDefinition(mutated(edit));
    expect(check.ok).toBe(false);
    const issue = check.issues.find((i) => i.path === path);
    expect(issue, JSON.stringify(check.issues)).toBeDefined();
    expect(issue!.message).toMatch(message);
  });
});

describe.each([null, 7, 'text', [], () => 1])('a definition that is %s', (value) => {
  it('is rejected without a throw', () => {
    expect(validateDefinition(value).ok).toBe(false);
  });
});
