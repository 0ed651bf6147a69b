import { copyFileSync, mkdtempSync, readFileSync, readdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { TWO_CONICS } from '../pipeline/fixtures/solved-fixture.ts';
import { runCli } from './run-cli.ts';

/** Every file under a folder with its bytes, sorted by path. */
function snapshot(dir: string): [string, string][] {
  return readdirSync(dir, { recursive: true, withFileTypes: true })
    .filter((e) => e.isFile())
    .map((e) => join(e.parentPath, e.name))
    .sort()
    .map((f) => [f.slice(dir.length), readFileSync(f, 'utf8')]);
}

describe('regenerating with the real engine', () => {
  it('gives byte-identical content twice (record, page, system and certificates), with or without workers, and a sharded solve merged gives the same files as a single run', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'atlas-regen-'));
    const file = join(dir, 'two-conics.ts');
    copyFileSync(TWO_CONICS, file);
    const single = join(dir, 'single'), sharded = join(dir, 'sharded'), pooled = join(dir, 'pooled');
    const [first, part1, part2, withWorkers] = await Promise.all([
      runCli(['regenerate', file, '--content', single]),
      runCli(['solve', file, '--shard', '1/2', '--out', join(dir, 'part-1.json')]),
      runCli(['solve', file, '--shard', '2/2', '--out', join(dir, 'part-2.json')]),
      runCli(['regenerate', file, '--content', pooled, '--workers', '2']),
    ]);
    for (const run of [first, part1, part2, withWorkers]) expect(run.code, run.stderr).toBe(0);
    const once = snapshot(single);
    expect(once.map(([f]) => f)).toEqual(['/certificates/two-test-conics.json', '/problems/two-test-conics.mdx', '/records/two-test-conics.json', '/systems/two-test-conics.json']);
    const [second, merged] = await Promise.all([
      runCli(['regenerate', file, '--content', single]),
      runCli(['merge', join(dir, 'part-2.json'), join(dir, 'part-1.json'), '--content', sharded]),
    ]);
    expect(second.code, second.stderr).toBe(0);
    expect(second.stderr).toMatch(/unchanged/);
    expect(snapshot(single)).toEqual(once);
    expect(merged.code, merged.stderr).toBe(0);
    expect(snapshot(sharded)).toEqual(once);
    expect(snapshot(pooled)).toEqual(once);
  });

  it('reports a corrupt record with its file and field and exit code 3 from check', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'atlas-check-'));
    const file = join(dir, 'two-conics.ts');
    copyFileSync(TWO_CONICS, file);
    const content = join(dir, 'content');
    expect((await runCli(['regenerate', file, '--content', content])).code).toBe(0);
    const record = join(content, 'records', 'two-test-conics.json');
    writeFileSync(record, readFileSync(record, 'utf8').replace(/"tracked": 4/, '"tracked": -4'));
    const run = await runCli(['check', '--content', content]);
    expect(run.code).toBe(3);
    expect(run.stderr).toMatch(/records\/two-test-conics\.json: instances\[0\]\.paths\.tracked: /);
    expect(run.stderr).not.toMatch(/\n\s+at .*[:(]/);
  });
});
