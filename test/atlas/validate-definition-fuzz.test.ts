import { describe, expect, it } from 'vitest';
import { createRandom, type RandomSource } from '../../src/engine/index.ts';
import { validateDefinition } from '../../src/atlas/validate-definition.ts';
import { formatIssues } from '../../src/atlas/validation-issue.ts';
import twoConics from '../generators/pipeline/fixtures/two-conics.ts';

// Generated malformed definitions: a valid definition mutated 1–3 times at random places (deterministic seeds).
// The validator must never throw, must name a field for each issue, and its messages must carry no stack trace.

const BAD_VALUES: (() => unknown)[] = [
  () => undefined, () => null, () => NaN, () => Infinity, () => -Infinity, () => -1, () => 0.5, () => 2 ** 40,
  () => '', () => 'Not A Slug', () => '$\\frac{$', () => [], () => [NaN, 1], () => ({}), () => true,
  () => () => 1, () => () => { throw new Error('boom'); }, () => () => [{ kind: 'div' }], () => () => [null, undefined],
  () => () => ({ length: 2 }), () => ({ kind: 'pow', base: { kind: 'const', re: 1, im: 0 }, exponent: -2 }),
  () => Object.create(null), () => [[['deep']]], () => 'x'.repeat(5000),
];

type Node = Record<string, unknown> | unknown[];

function clone(v: unknown): unknown {
  if (Array.isArray(v)) return v.map(clone);
  if (v && typeof v === 'object') return Object.fromEntries(Object.entries(v).map(([k, x]) => [k, clone(x)]));
  return v;
}

/** Every (container, key) pair of the tree, so a mutation can land anywhere. */
function places(root: Node): [Node, string | number][] {
  const out: [Node, string | number][] = [];
  const walk = (node: Node): void => {
    const keys = Array.isArray(node) ? node.map((_, i) => i) : Object.keys(node);
    for (const k of keys) {
      out.push([node, k]);
      const child = (node as Record<string | number, unknown>)[k];
      if (child && typeof child === 'object') walk(child as Node);
    }
  };
  walk(root);
  return out;
}

function pick<T>(random: RandomSource, items: readonly T[]): T {
  return items[Math.floor(random.next() * items.length)]!;
}

function mutant(seed: number): unknown {
  const random = createRandom(seed);
  const root = clone(twoConics) as Node;
  const count = 1 + Math.floor(random.next() * 3);
  for (let m = 0; m < count; m++) {
    const [node, key] = pick(random, places(root));
    const target = node as Record<string | number, unknown>;
    if (random.next() < 0.2 && !Array.isArray(node)) delete target[key];
    else target[key] = pick(random, BAD_VALUES)();
  }
  return root;
}

describe('1200 generated malformed definitions', () => {
  const seeds = Array.from({ length: 1200 }, (_, i) => 9000 + i);
  it('are each checked without a throw, every issue names a field, no message shows a stack trace', () => {
    let rejected = 0;
    for (const seed of seeds) {
      const check = validateDefinition(mutant(seed));
      if (!check.ok) rejected++;
      for (const issue of check.issues) {
        expect(issue.path.length, `seed ${seed}`).toBeGreaterThan(0);
        expect(typeof issue.message, `seed ${seed}`).toBe('string');
      }
      const text = formatIssues('fuzz.ts', check.issues);
      expect(text, `seed ${seed}`).not.toMatch(/\n\s+at .*[:(]/);
    }
    // Most random mutations break something; a few (an empty tag list, say) leave a valid definition.
    expect(rejected).toBeGreaterThan(seeds.length * 0.8);
  });
});
