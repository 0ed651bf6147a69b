import { copyFileSync, existsSync, mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { TWO_CONICS } from '../pipeline/fixtures/solved-fixture.ts';
import { runCli } from './run-cli.ts';

describe('solving a definition file outside the repository with one command', () => {
  it('prints one JSON summary of the first demo instance: two conics meet in 4 points, all 4 real for the demo', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'atlas-user-'));
    const file = join(dir, 'my-conics.ts');
    copyFileSync(TWO_CONICS, file);
    const run = await runCli(['solve', file, '--json'], { ATLAS_CONTENT_DIR: join(dir, 'content') });
    expect(run.code, run.stderr).toBe(0);
    const lines = run.stdout.trim().split('\n');
    expect(lines).toHaveLength(1);
    const summary = JSON.parse(lines[0]!);
    expect(Object.keys(summary)).toEqual(['slug', 'bezoutBound', 'trueCount', 'found', 'certified', 'real', 'certifiedReal', 'paths', 'seconds']);
    expect(Object.keys(summary.paths)).toEqual(['tracked', 'nonsingular', 'singular', 'atInfinity', 'excess', 'failed']);
    // Bézout's theorem: two general conics meet in 2·2 = 4 points (Fulton, Algebraic Curves, 1969). The demo circle
    // x² + y² = 4 and ellipse x² + 9y² = 9 meet in the 4 real points (±√(27/8), ±√(5/8)) (worked by hand).
    expect(summary).toMatchObject({ slug: 'two-test-conics', bezoutBound: 4, trueCount: 4, found: 4, real: 4 });
    expect(summary.certified).toBeLessThanOrEqual(4);
    const p = summary.paths;
    expect(p.nonsingular + p.singular + p.atInfinity + p.excess + p.failed).toBe(p.tracked);
    expect(summary.seconds).toBeGreaterThanOrEqual(0);
    // solve writes nothing without --write
    expect(existsSync(join(dir, 'content'))).toBe(false);
  });
});
