import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCli } from '../../generators/cli/run-cli.ts';

// A new user's own systems, written outside the repository the way the README describes (`npm run -s solve --
// /path/to/file.ts --json --seed N`): a default-exported definition with no imports, whose equations are built with
// the expression builders it is handed. Three dense sextics in x, y, z with Gaussian complex coefficients drawn by the
// generic instance from the seed, in changed coordinates: unknowns scaled by 40 (x ↦ x/40 inside every monomial,
// every solution 40 times larger), or a random complex linear change x ↦ A·x (A drawn as parameters too). Neither
// changes the count: 6·6·6 = 216, all finite and nonsingular (Bézout's theorem for generic dense systems; Cox, Little,
// O'Shea, Using Algebraic Geometry, 2nd ed. 2005, ch. 3).

/** The text of a user's definition file: `coordinates` is JS source building `X` (the nodes put in place of x, y, z). */
function definitionFile(slug: string, words: string, extraParameters: string, coordinates: string): string {
  return `// @ts-nocheck: a user's file, untyped and without imports.
const monomials = [];
for (let i = 0; i <= 6; i++) for (let j = 0; i + j <= 6; j++) for (let k = 0; i + j + k <= 6; k++) monomials.push([i, j, k]);
const coefficient = (e, m) => \`c\${e}_\${m.join('')}\`;
const equationsUsed = [0, 1, 2];

export default {
  slug: '${slug}',
  title: 'Three dense sextics, ${words}',
  family: 'stress',
  tags: ['dense', 'test'],
  statement: 'Solve three dense random sextic equations in three unknowns, ${words}.',
  formulation: {
    unknowns: ['x', 'y', 'z'],
    parameters: [...equationsUsed.flatMap((e) => monomials.map((m) => coefficient(e, m)))${extraParameters}],
    equations: (u, p, ops) => {
      ${coordinates}
      return equationsUsed.map((e) => ops.add(...monomials.map((m) => ops.mul(p[coefficient(e, m)], ...m.map((power, v) => ops.pow(X[v], power))))));
    },
    description: 'Every monomial of degree at most six, each with its own coefficient.',
  },
  trueCount: {
    value: 216,
    source: { kind: 'published', authors: ['David A. Cox', 'John Little', "Donal O'Shea"], year: 2005, title: 'Using Algebraic Geometry', venue: 'Springer, 2nd edition' },
  },
  excessNote: 'None: for general coefficients all 216 solutions are finite and nonsingular.',
  instances: [{ id: 'generic', kind: 'generic', label: 'Random complex coefficients', description: 'Drawn from the seed.', seed: 1 }],
};
`;
}

const FILES = [
  {
    label: 'unknowns scaled by 40',
    seed: 3,
    text: definitionFile('dense-sextics-scaled', 'unknowns scaled by 40', '', 'const X = [u.x, u.y, u.z].map((v) => ops.mul(1 / 40, v));'),
  },
  {
    label: 'a random complex linear change of coordinates',
    seed: 4,
    text: definitionFile(
      'dense-sextics-linear-change',
      'after a linear change of coordinates',
      ", ...['a11', 'a12', 'a13', 'a21', 'a22', 'a23', 'a31', 'a32', 'a33']",
      "const X = [1, 2, 3].map((r) => ops.dot([1, 2, 3].map((c) => p[`a${r}${c}`]), [u.x, u.y, u.z]));",
    ),
  },
];

describe('solving dense sextics written by a user outside the repository, in changed coordinates', () => {
  it.each(FILES)('$label: the command finds all 216 solutions with no failed path and exits 0', async ({ text, seed }) => {
    const dir = mkdtempSync(join(tmpdir(), 'atlas-stress-'));
    const file = join(dir, 'my-sextics.ts');
    writeFileSync(file, text);
    const run = await runCli(['solve', file, '--json', '--seed', String(seed)], { ATLAS_CONTENT_DIR: join(dir, 'content') });
    const summary = JSON.parse(run.stdout.trim() || '{}');
    // Bézout: 6·6·6 = 216 (Cox–Little–O'Shea 2005, ch. 3)
    expect({ code: run.code, bezoutBound: summary.bezoutBound, found: summary.found, failed: summary.paths?.failed }, run.stderr.slice(-2000))
      .toEqual({ code: 0, bezoutBound: 216, found: 216, failed: 0 });
  });
});
