import { mkdtempSync, readFileSync, readdirSync, statSync, existsSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import type { SolveRecord } from '../../../src/atlas/record.ts';
import { parseRecord } from '../../../src/atlas/read-record.ts';
import { pagePath, recordPath } from '../../../generators/write/content-paths.ts';
import { publish } from '../../../generators/write/publish.ts';
import { fakeRecord } from '../pipeline/fixtures/solved-fixture.ts';

const SLUG = 'two-test-conics';
const fresh = (): string => mkdtempSync(join(tmpdir(), 'atlas-publish-'));
const bytes = (root: string): [string, string] => [readFileSync(recordPath(root, SLUG), 'utf8'), readFileSync(pagePath(root, SLUG), 'utf8')];

describe('publishing a solve record', () => {
  let solved: SolveRecord;
  beforeAll(async () => {
    solved = await fakeRecord();
  });

  it('writes a schema-valid record and its page on first publication, with one dated history entry', async () => {
    const root = fresh();
    const outcome = publish(root, await fakeRecord(), { date: '2026-01-02' });
    expect(outcome.status).toBe('created');
    const parsed = parseRecord(bytes(root)[0]);
    expect(parsed.ok && parsed.value.history).toEqual([
      { date: '2026-01-02', engineVersion: 'fake-1', change: expect.stringMatching(/^first published; generic: found 4 of 4/) },
    ]);
    expect(bytes(root)[1]).toMatch(/^---\nslug: "two-test-conics"\n[\s\S]*recordVersion: 1\n/);
  });

  it('gives byte-identical content when the same solve is published twice, and leaves the files untouched', async () => {
    const root = fresh();
    publish(root, await fakeRecord(), { date: '2026-01-02' });
    const first = bytes(root);
    const mtime = statSync(recordPath(root, SLUG)).mtimeMs;
    const again = publish(root, await fakeRecord(), { date: '2027-05-06' });
    expect(again.status).toBe('unchanged');
    expect(bytes(root)).toEqual(first);
    expect(statSync(recordPath(root, SLUG)).mtimeMs).toBe(mtime);
  });

  it('refuses a record with fewer found and certified solutions, says why, and keeps the published bytes', async () => {
    const root = fresh();
    publish(root, await fakeRecord(), { date: '2026-01-02' });
    const before = bytes(root);
    const outcome = publish(root, await fakeRecord({ lose: 1, version: 'fake-2' }), { date: '2026-02-03' });
    expect(outcome.status).toBe('refused');
    expect(outcome.status === 'refused' && outcome.reasons).toContain('instance "generic": found 3 < published 4');
    expect(outcome.status === 'refused' && outcome.reasons).toContain('instance "garden-beds": certified 3 < published 4');
    expect(bytes(root)).toEqual(before);
  });

  it('accepts the worse record with force, adding a dated history entry that says what changed', async () => {
    const root = fresh();
    publish(root, await fakeRecord(), { date: '2026-01-02' });
    const outcome = publish(root, await fakeRecord({ lose: 1, version: 'fake-2' }), { date: '2026-02-03', force: true });
    expect(outcome.status).toBe('replaced');
    const parsed = parseRecord(bytes(root)[0]);
    expect(parsed.ok).toBe(true);
    const history = parsed.ok ? parsed.value.history : [];
    expect(history).toHaveLength(2);
    expect(history[1]).toMatchObject({ date: '2026-02-03', engineVersion: 'fake-2' });
    expect(history[1]!.change).toMatch(/^engine fake-1 → fake-2; generic: found 4 → 3/);
    expect(bytes(root)[1]).toMatch(/recordVersion: 2\n/);
  });

  it('refuses a first record in which an instance found nothing although its count is positive', async () => {
    const root = fresh();
    const outcome = publish(root, await fakeRecord({ lose: 4 }), { date: '2026-01-02' });
    expect(outcome.status).toBe('refused');
    expect(outcome.status === 'refused' && outcome.reasons[0]).toMatch(/instance "generic": found no solution where the published count is 4 \(0 singular, 0 at infinity, 4 failed paths/);
    expect(existsSync(join(root, 'records'))).toBe(false);
  });

  it('accepts a better record without force and keeps the earlier history', async () => {
    const root = fresh();
    publish(root, await fakeRecord({ lose: 2 }), { date: '2026-01-02' });
    publish(root, await fakeRecord({ lose: 1, version: 'fake-2' }), { date: '2026-01-03' });
    const outcome = publish(root, await fakeRecord({ version: 'fake-3' }), { date: '2026-01-04' });
    expect(outcome.status).toBe('replaced');
    const parsed = parseRecord(bytes(root)[0]);
    expect(parsed.ok && parsed.value.history.map((h) => h.date)).toEqual(['2026-01-02', '2026-01-03', '2026-01-04']);
  });

  it('leaves the published record readable and unchanged when the write fails between temporary file and rename', async () => {
    const root = fresh();
    publish(root, await fakeRecord({ lose: 1 }), { date: '2026-01-02' });
    const before = bytes(root);
    const crash = (): void => { throw new Error('simulated crash before rename'); };
    expect(() => publish(root, solved, { date: '2026-01-03', beforeRename: crash })).toThrow(/simulated crash/);
    expect(bytes(root)).toEqual(before);
    expect(parseRecord(before[0]).ok).toBe(true);
    expect(readdirSync(join(root, 'records')).filter((n) => n.endsWith('.tmp'))).toEqual([]);
  });

  it('refuses to overwrite an unreadable published record unless forced, naming the file and field', async () => {
    const root = fresh();
    publish(root, await fakeRecord(), { date: '2026-01-02' });
    const file = recordPath(root, SLUG);
    const broken = readFileSync(file, 'utf8').replace('"found": 4', '"found": "four"');
    (await import('node:fs')).writeFileSync(file, broken);
    expect(() => publish(root, solved)).toThrow(/two-test-conics\.json: instances\[0\]\.counts\.found: .*\n.*pass --force/);
    expect(readFileSync(file, 'utf8')).toBe(broken);
    expect(publish(root, solved, { force: true }).status).toBe('created');
    expect(existsSync(pagePath(root, SLUG))).toBe(true);
  });
});

