import { spawnSync } from 'node:child_process';
import { cpSync, mkdtempSync, readFileSync, readdirSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { beforeAll, describe, expect, inject, it } from 'vitest';

// The problem: two general plane curves of degree 18 meet in 324 points (Bézout's theorem; W. Fulton, Algebraic
// Curves, 1969), so each run tracks 324 paths; the fixture's seed 1 finds all of them.
const PROJECT = resolve(import.meta.dirname, '../..');
const FIXTURE = join(import.meta.dirname, 'fixtures/two-curves-of-degree-18.ts');
const SLUG = 'two-curves-of-degree-18';
const FILES = [`records/${SLUG}.json`, `problems/${SLUG}.mdx`, `systems/${SLUG}.json`, `certificates/${SLUG}.json`];
const scratch = mkdtempSync(join(tmpdir(), 'atlas-slurm-test-'));

/** Runs the maintainer's command in the project with the cluster's environment (plus `env`). */
function command(args: string[], env: Record<string, string> = {}) {
  const r = spawnSync(process.execPath, ['--experimental-strip-types', 'generators/cli.ts', ...args], {
    cwd: PROJECT, encoding: 'utf8', env: { ...process.env, ...inject('slurmEnv'), ...env }, timeout: 150_000,
  });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}

const bytes = (root: string): string[] => FILES.map((f) => readFileSync(join(root, f), 'utf8'));
const single = join(scratch, 'single');

describe('a solve spread over a Slurm job array', () => {
  beforeAll(() => {
    const run = command(['regenerate', FIXTURE, '--content', single]);
    expect(run.code, run.stderr).toBe(0);
  });

  it.each([
    ['every batch succeeds at once', {}, []],
    ['batch 2 fails its first attempt on purpose and is resubmitted', { ATLAS_CLUSTER_TEST_FAIL: '2/1' }, [/batch 2 failed on attempt 1 .*; resubmitted once/]],
  ] as const)('publishes the single-machine record byte for byte when %s', (_name, env, messages) => {
    const content = join(scratch, `content-${Object.keys(env).length}`);
    const run = command(['regenerate', FIXTURE, '--slurm', '--shards', '2', '--workdir', join(scratch, 'runs'), '--content', content], env);
    expect(run.code, run.stderr).toBe(0);
    expect(run.stderr).toMatch(/2\/2 parts written \(100%\)/);
    for (const m of messages) expect(run.stderr).toMatch(m);
    expect(bytes(content)).toEqual(bytes(single));
  });

  it('leaves the published record untouched and names the batch whose part never arrived', () => {
    const content = join(scratch, 'content-missing');
    cpSync(single, content, { recursive: true });
    const before = FILES.map((f) => statSync(join(content, f)).mtimeMs);
    const run = command(['regenerate', FIXTURE, '--slurm', '--shards', '2', '--force', '--workdir', join(scratch, 'runs'), '--content', content], { ATLAS_CLUSTER_TEST_FAIL: '2/2' });
    expect(run.code).toBe(1);
    expect(run.stderr).toMatch(/the parts of batch 2 of 2 never arrived; nothing merged, the published record is untouched/);
    expect(bytes(content)).toEqual(bytes(single));
    expect(FILES.map((f) => statSync(join(content, f)).mtimeMs)).toEqual(before);
  });

  it('solve --slurm --detach returns at once with the three job ids', () => {
    const run = command(['solve', FIXTURE, '--slurm', '--shards', '2', '--detach', '--workdir', join(scratch, 'runs-detached')]);
    expect(run.code, run.stderr).toBe(0);
    const ids = JSON.parse(run.stdout) as Record<string, unknown>;
    expect(ids).toMatchObject({ slug: SLUG, shards: 2, batches: expect.stringMatching(/^\d+$/), retry: expect.stringMatching(/^\d+$/), merge: expect.stringMatching(/^\d+$/) });
    expect(readdirSync(join(String(ids.run), 'parts')).length).toBeLessThan(2);
    spawnSync('scancel', [String(ids.batches), String(ids.retry), String(ids.merge)], { env: { ...process.env, ...inject('slurmEnv') } });
  });
});
