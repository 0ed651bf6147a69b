import { copyFileSync, existsSync, mkdirSync, mkdtempSync, readFileSync, writeFileSync, appendFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCommand } from '../../../generators/command/run-command.ts';
import { recordPath } from '../../../generators/write/content-paths.ts';
import { fakeEngine } from '../pipeline/fixtures/fake-engine.ts';
import { TWO_CONICS } from '../pipeline/fixtures/solved-fixture.ts';
import { fakeContext } from './command-context.ts';

/** A problems folder with a registry holding the two-conics test problem, and an empty content root. */
function workspace(): { problems: string; content: string; definition: string } {
  const dir = mkdtempSync(join(tmpdir(), 'atlas-cmd-'));
  const problems = join(dir, 'problems');
  mkdirSync(join(problems, 'intersections'), { recursive: true });
  const definition = join(problems, 'intersections', 'two-test-conics.ts');
  copyFileSync(TWO_CONICS, definition);
  writeFileSync(join(problems, 'index.ts'), "import p from './intersections/two-test-conics.ts';\nexport const problems = [p];\n");
  return { problems, content: join(dir, 'content'), definition };
}

describe('refresh', () => {
  it('solves a problem without a record, then loads no engine while nothing is stale', async () => {
    const w = workspace();
    const first = fakeContext({ problemsDir: w.problems });
    expect(await runCommand(['refresh', '--content', w.content], first.ctx)).toBe(0);
    expect(first.stderr.text).toMatch(/two-test-conics: stale \(no record yet\); solving/);
    const second = fakeContext({ problemsDir: w.problems });
    expect(await runCommand(['refresh', '--content', w.content], second.ctx)).toBe(0);
    expect(second.loads()).toBe(0);
    expect(second.stderr.text).toMatch(/1 problems, 0 re-solved, 1 fresh/);
  });

  it.each([
    ['the engine version changed', (_w: ReturnType<typeof workspace>) => ({ engine: () => fakeEngine({ version: 'fake-2' }) }), /stale \(engine fake-1 → fake-2\)/],
    ['the definition was edited', (w: ReturnType<typeof workspace>) => (appendFileSync(w.definition, '// a comment\n'), {}), /stale \(definition changed\)/],
  ])('re-solves when %s', async (_name, change, reason) => {
    const w = workspace();
    await runCommand(['refresh', '--content', w.content], fakeContext({ problemsDir: w.problems }).ctx);
    const next = fakeContext({ problemsDir: w.problems, ...change(w) });
    expect(await runCommand(['refresh', '--content', w.content], next.ctx)).toBe(0);
    expect(next.stderr.text).toMatch(reason);
    expect(next.loads()).toBe(1);
  });
});

describe('refresh with data files read at run time', () => {
  it('re-solves a problem when a stored set it reads changes, and only then', async () => {
    const w = workspace();
    const stored = join(w.problems, 'intersections', 'data', 'stored.f32');
    mkdirSync(join(w.problems, 'intersections', 'data'));
    writeFileSync(stored, new Uint8Array([0, 0, 128, 63]));
    writeFileSync(w.definition, readFileSync(w.definition, 'utf8').replace('export default {', "export default {\n  reads: [new URL('./data/stored.f32', import.meta.url).pathname],"));
    await runCommand(['refresh', '--content', w.content], fakeContext({ problemsDir: w.problems }).ctx);
    const unchanged = fakeContext({ problemsDir: w.problems });
    expect(await runCommand(['refresh', '--content', w.content], unchanged.ctx)).toBe(0);
    expect(unchanged.loads()).toBe(0);
    writeFileSync(stored, new Uint8Array([0, 0, 0, 64]));
    const changed = fakeContext({ problemsDir: w.problems });
    expect(await runCommand(['refresh', '--content', w.content], changed.ctx)).toBe(0);
    expect(changed.stderr.text).toMatch(/two-test-conics: stale \(definition changed\); solving/);
    expect(changed.loads()).toBe(1);
  });
});

describe('check', () => {
  it('passes fresh content, and notes a stale record without failing', async () => {
    const w = workspace();
    await runCommand(['refresh', '--content', w.content], fakeContext({ problemsDir: w.problems }).ctx);
    const fresh = fakeContext({ problemsDir: w.problems });
    expect(await runCommand(['check', '--content', w.content], fresh.ctx)).toBe(0);
    expect(fresh.stderr.text).toMatch(/check: 1 records, 0 content problems; 1 definitions\n$/);
    const later = fakeContext({ problemsDir: w.problems, engine: () => fakeEngine({ version: 'fake-9' }) });
    expect(await runCommand(['check', '--content', w.content], later.ctx)).toBe(0);
    expect(later.stderr.text).toMatch(/note: two-test-conics: stale \(engine fake-1 → fake-9\)/);
  });
});

describe('regenerate', () => {
  it('refuses a worse result with exit 1 and says why, then accepts it with --force', async () => {
    const w = workspace();
    expect(await runCommand(['regenerate', '--all', '--content', w.content], fakeContext({ problemsDir: w.problems }).ctx)).toBe(0);
    const published = readFileSync(recordPath(w.content, 'two-test-conics'), 'utf8');
    const worse = fakeContext({ problemsDir: w.problems, engine: () => fakeEngine({ lose: 2, version: 'fake-2' }) });
    expect(await runCommand(['regenerate', 'two-test-conics', '--content', w.content], worse.ctx)).toBe(1);
    expect(worse.stderr.text).toMatch(/refused to write the new record[\s\S]*found 2 < published 4[\s\S]*pass --force/);
    expect(readFileSync(recordPath(w.content, 'two-test-conics'), 'utf8')).toBe(published);
    const forced = fakeContext({ problemsDir: w.problems, engine: () => fakeEngine({ lose: 2, version: 'fake-2' }) });
    // forced, the honest record is published, never as complete, and the command still says how many are missing
    expect(await runCommand(['regenerate', 'two-test-conics', '--force', '--content', w.content], forced.ctx)).toBe(1);
    expect(forced.stderr.text).toMatch(/two-test-conics: instance "garden-beds": found 2 of 4 \(2 missing\) — published, not as complete/);
    const record = JSON.parse(readFileSync(recordPath(w.content, 'two-test-conics'), 'utf8'));
    expect(record.history).toHaveLength(2);
    expect(record.instances.every((i: { counts: { complete: boolean } }) => !i.counts.complete)).toBe(true);
  });
});

describe('solve', () => {
  it('writes nothing without --write, and publishes through the guard with it', async () => {
    const w = workspace();
    const dry = fakeContext();
    expect(await runCommand(['solve', w.definition, '--json', '--content', w.content], dry.ctx)).toBe(0);
    expect(existsSync(w.content)).toBe(false);
    const wet = fakeContext();
    expect(await runCommand(['solve', w.definition, '--write', '--content', w.content], wet.ctx)).toBe(0);
    expect(wet.stderr.text).toMatch(/two-test-conics: record and page written/);
    expect(existsSync(recordPath(w.content, 'two-test-conics'))).toBe(true);
  });
});

describe('command-line mistakes and failures', () => {
  it.each([
    [['frobnicate'], 2, /unknown command "frobnicate"/],
    [[], 2, /usage:/],
    [['regenerate'], 2, /name the problems to regenerate, or --all/],
    [['solve', 'a', 'b'], 2, /solve takes one problem, got 2/],
    [['solve', TWO_CONICS, '--shard', '3/2', '--out', 'x.json'], 2, /--shard: must be k\/n with 1 ≤ k ≤ n/],
    [['solve', TWO_CONICS, '--workers', '0'], 2, /--workers: must be an integer ≥ 1/],
    [['solve', TWO_CONICS, '--colour'], 2, /Unknown option '--colour'/],
    [['solve', 'no-such-problem'], 2, /no problem with slug "no-such-problem"/],
  ])('%j exits %i with a clear message', async (argv, code, message) => {
    const { ctx, stderr } = fakeContext({ problemsDir: workspace().problems });
    expect(await runCommand(argv, ctx)).toBe(code);
    expect(stderr.text).toMatch(message);
  });

  it('reports an unexpected error as internal (exit 4) without a stack trace, and with one under --debug', async () => {
    const boom = (): never => { throw new TypeError('engine exploded'); };
    const plain = fakeContext({ engine: boom });
    expect(await runCommand(['solve', TWO_CONICS], plain.ctx)).toBe(4);
    expect(plain.stderr.text).toMatch(/^internal error: engine exploded\n\(rerun with --debug/);
    expect(plain.stderr.text).not.toMatch(/\n\s+at /);
    const debug = fakeContext({ engine: boom });
    await runCommand(['solve', TWO_CONICS, '--debug'], debug.ctx);
    expect(debug.stderr.text).toMatch(/\n\s+at /);
  });

  it('prints a text summary with each instance ladder and notes by default; a shortfall exits 1 with one line per instance', async () => {
    const { ctx, stdout, stderr } = fakeContext({ engine: () => fakeEngine({ lose: 1 }) });
    expect(await runCommand(['solve', TWO_CONICS], ctx)).toBe(1);
    expect(stderr.text).toMatch(/^two-test-conics: instance "garden-beds": found 3 of 4 \(1 missing\)$/m);
    expect(stdout.text).toMatch(/garden-beds \(demo, seed 5\): Bézout 4 · true 4 · found 3 ·/);
    expect(stdout.text).toMatch(/note: found 3 of 4: 1 path failed/);
  });
});
